package org.chillwright.harvest.web;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.PositiveOrZero;
import jakarta.validation.constraints.Size;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import org.chillwright.catalog.Lifecycle;
import org.chillwright.harvest.HarvestCase;
import org.chillwright.harvest.HarvestObjective;
import org.chillwright.harvest.HarvestSpec;
import org.chillwright.physics.GeneratorCase;
import org.chillwright.physics.Units;
import org.chillwright.web.TemperatureUnit;

/**
 * A harvest case as a person types it, temperatures in the unit they chose. It travels in the query string,
 * so a ranking and a design each have a link a colleague can open.
 */
public record HarvestForm(
        TemperatureUnit temperatureUnit,
        @NotNull(message = "enter the temperature of the heat source") Double hotSource,
        @NotNull(message = "enter the temperature of the cold sink (air, water, ground)") Double coldSink,
        @NotNull(message = "enter the source-to-module resistance (0 for a module clamped on the source)")
        @PositiveOrZero @DecimalMax("1000") Double hotResistanceKPerW,
        @NotNull(message = "enter the module-to-sink resistance, usually the heat sink's")
        @PositiveOrZero @DecimalMax("1000") Double coldResistanceKPerW,
        @Min(1) @Max(8) Integer maxModules,
        HarvestObjective objective,
        @PositiveOrZero @DecimalMax("10000") Double minLoadVoltageV,
        @Size(max = 200) String supplier,
        Set<Lifecycle> lifecycles,
        @Min(1) @Max(10_000_000) Integer costQuantity,
        @Min(1) @Max(500) Integer limit) {

    /**
     * Hottest source the pages accept, °C, as the API: exhaust, furnace and stove generators with materials other
     * than bismuth telluride see such sources. Whether a module survives is the design's warning, not a refusal.
     */
    static final double HOTTEST_SOURCE_C = 1500;
    static final int DEFAULT_MAX_MODULES = 4;
    static final int DEFAULT_LIMIT = 50;

    public TemperatureUnit temperatureUnit() {
        return temperatureUnit == null ? TemperatureUnit.C : temperatureUnit;
    }

    public double hotSourceC() {
        return temperatureUnit().toCelsius(hotSource);
    }

    public double coldSinkC() {
        return temperatureUnit().toCelsius(coldSink);
    }

    /** What Bean Validation cannot see: the temperatures against each other and absolute zero, by field. */
    Map<String, String> crossFieldProblems() {
        var problems = new LinkedHashMap<String, String>();
        if (coldSink != null && !(coldSinkC() > -273.15)) {
            problems.put("coldSink", "the sink must be above absolute zero");
        }
        if (hotSource != null && hotSourceC() > HOTTEST_SOURCE_C) {
            problems.put("hotSource", "the source must be at most " + HOTTEST_SOURCE_C + " °C");
        } else if (hotSource != null && coldSink != null && !(hotSourceC() > coldSinkC())) {
            problems.put("hotSource", "the source must be warmer than the sink for the module to generate");
        }
        return problems;
    }

    HarvestSpec toSpec() {
        var generatorCase = new GeneratorCase(Units.kelvinFromCelsius(hotSourceC()),
                Units.kelvinFromCelsius(coldSinkC()), hotResistanceKPerW, coldResistanceKPerW);
        var harvestCase = new HarvestCase(generatorCase, maxModules == null ? DEFAULT_MAX_MODULES : maxModules,
                objective, minLoadVoltageV == null ? 0 : minLoadVoltageV, costQuantity == null ? 1 : costQuantity,
                limit == null ? DEFAULT_LIMIT : limit);
        return new HarvestSpec(harvestCase, supplier, lifecycles);
    }
}
