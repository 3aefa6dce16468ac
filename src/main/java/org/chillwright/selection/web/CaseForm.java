package org.chillwright.selection.web;

import jakarta.validation.constraints.AssertTrue;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.PositiveOrZero;
import jakarta.validation.constraints.Size;
import java.util.EnumSet;
import java.util.Set;
import org.chillwright.catalog.Lifecycle;
import org.chillwright.physics.CoolingCase;
import org.chillwright.physics.ParasiticLoad;
import org.chillwright.physics.Units;
import org.chillwright.selection.CaseSpec;
import org.chillwright.selection.Objective;
import org.chillwright.selection.RankingCase;
import org.chillwright.web.PowerUnit;
import org.chillwright.web.TemperatureUnit;
import org.springframework.web.util.UriComponentsBuilder;

/**
 * The cooling case as a person types it, in the units they chose. It travels in the query string, so a
 * ranking, a candidate and a comparison each have a link a colleague can open.
 */
public record CaseForm(
        TemperatureUnit temperatureUnit,
        PowerUnit powerUnit,
        @NotNull(message = "enter the temperature the object must be held at") Double setPointTemperature,
        @NotNull(message = "enter the hottest ambient the design must survive") Double ambientTemperature,
        Double coldestAmbientTemperature,
        @NotNull(message = "enter the heat the object dissipates (0 if none)") @PositiveOrZero Double activeLoad,
        @PositiveOrZero @DecimalMax("1000") Double convectionWPerM2K,
        @PositiveOrZero @DecimalMax("10000") Double exposedAreaCm2,
        @PositiveOrZero @DecimalMax("1") Double emissivity,
        @PositiveOrZero @DecimalMax("10000") Double leadConductanceMWPerK,
        Boolean sizeSink,
        @PositiveOrZero @DecimalMax("100") Double sinkResistanceKPerW,
        @Positive @DecimalMax("100") Double sinkRiseK,
        @PositiveOrZero @DecimalMax("100") Double coldInterfaceKPerW,
        @PositiveOrZero @DecimalMax("100") Double hotInterfaceKPerW,
        @Positive @DecimalMax("1000") Double supplyMaxV,
        @Positive @DecimalMax("1000") Double supplyMaxA,
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100") Double relativeHumidityPct,
        @Min(1) @Max(8) Integer maxModules,
        Objective objective,
        @Size(max = 200) String supplier,
        Set<Lifecycle> lifecycles,
        Long listId,
        @PositiveOrZero @DecimalMax("200") Double minMarginK,
        @DecimalMin(value = "1") @DecimalMax("100") Double maxImaxPct,
        @Min(1) @Max(10_000_000) Integer costQuantity,
        @Min(1) @Max(500) Integer limit) {

    private static final double SQUARE_METRES_PER_CM2 = 1e-4;
    private static final double WATTS_PER_MILLIWATT = 1e-3;

    /** A starting point a newcomer can rank at once: a small laser module held at 25 °C in a 45 °C box. */
    public static CaseForm example() {
        return new CaseForm(TemperatureUnit.C, PowerUnit.W, 25.0, 45.0, null, 4.0, 8.0, 6.0, 0.5, 5.0, false, 0.4, 10.0,
                0.1, 0.05, 12.0, 5.0, 50.0, 4, Objective.COP, null, EnumSet.complementOf(EnumSet.of(Lifecycle.OBSOLETE)),
                null, 0.0, 100.0, 100, 50);
    }

    public TemperatureUnit temperatureUnit() {
        return temperatureUnit == null ? TemperatureUnit.C : temperatureUnit;
    }

    public PowerUnit powerUnit() {
        return powerUnit == null ? PowerUnit.W : powerUnit;
    }

    public boolean sizesSink() {
        return Boolean.TRUE.equals(sizeSink);
    }

    @AssertTrue(message = "enter the heat-sink resistance, or tick 'size the heat sink for me'")
    public boolean isSinkResistanceGiven() {
        return sizesSink() ? sinkRiseK != null : sinkResistanceKPerW != null;
    }

    @AssertTrue(message = "the object must be above absolute zero")
    public boolean isSetPointAboveAbsoluteZero() {
        return setPointTemperature == null || temperatureUnit().toCelsius(setPointTemperature) > -273.15;
    }

    @AssertTrue(message = "the ambient must be above absolute zero")
    public boolean isAmbientTemperatureAboveAbsoluteZero() {
        return ambientTemperature == null || temperatureUnit().toCelsius(ambientTemperature) > -273.15;
    }

    @AssertTrue(message = "the coldest ambient must be above absolute zero and below the set-point")
    public boolean isColdestAmbientTemperatureSensible() {
        return coldestAmbientTemperature == null || setPointTemperature == null
                || (temperatureUnit().toCelsius(coldestAmbientTemperature) > -273.15
                && coldestAmbientTemperature < setPointTemperature);
    }

    public double setPointC() {
        return temperatureUnit().toCelsius(setPointTemperature);
    }

    public double ambientC() {
        return temperatureUnit().toCelsius(ambientTemperature);
    }

    /** The leaks the helper describes, in SI (areas typed in cm², lead conductance in mW/K). */
    private ParasiticLoad leaks() {
        return new ParasiticLoad(orZero(convectionWPerM2K), orZero(exposedAreaCm2) * SQUARE_METRES_PER_CM2,
                orZero(emissivity), orZero(leadConductanceMWPerK) * WATTS_PER_MILLIWATT);
    }

    /** Parasitic heat leaking into the object from the ambient, W (0 when no helper values are given). */
    public double parasiticW() {
        return leaks().totalW(Units.kelvinFromCelsius(setPointC()), Units.kelvinFromCelsius(ambientC()));
    }

    public double activeLoadW() {
        return powerUnit().toWatts(activeLoad);
    }

    /** Active plus parasitic load, W; a leak out of a warm object lowers the load but never below zero. */
    public double heatLoadW() {
        return Math.max(0, activeLoadW() + parasiticW());
    }

    /**
     * The heating check on the coldest day: the object keeps dissipating its active load and loses heat
     * to the cold ambient through the same leaks, so the module must make up the difference.
     */
    public CaseSpec.ColdestDay coldestDay() {
        if (coldestAmbientTemperature == null) {
            return null;
        }
        double coldK = Units.kelvinFromCelsius(temperatureUnit().toCelsius(coldestAmbientTemperature));
        double netInW = activeLoadW() + leaks().totalW(Units.kelvinFromCelsius(setPointC()), coldK);
        return new CaseSpec.ColdestDay(coldK, -netInW);
    }

    public CaseSpec toSpec() {
        var coolingCase = new CoolingCase(Units.kelvinFromCelsius(setPointC()), Units.kelvinFromCelsius(ambientC()),
                heatLoadW(), sizesSink() ? 0 : sinkResistanceKPerW, orZero(coldInterfaceKPerW),
                orZero(hotInterfaceKPerW),
                relativeHumidityPct == null ? Double.NaN : Units.fractionFromPercent(relativeHumidityPct));
        var rankingCase = new RankingCase(coolingCase, sizesSink() ? sinkRiseK : Double.NaN,
                supplyMaxV == null ? Double.NaN : supplyMaxV, supplyMaxA == null ? Double.NaN : supplyMaxA,
                maxModules == null ? 4 : maxModules, objective == null ? Objective.COP : objective,
                orZero(minMarginK), maxImaxPct == null ? 1 : Units.fractionFromPercent(maxImaxPct),
                costQuantity == null ? 1 : costQuantity, limit == null ? 50 : limit);
        return new CaseSpec(rankingCase, supplier, lifecycles, listId, coldestDay());
    }

    /** The form as a query string, for links to the ranking, a candidate and a comparison. */
    public String toQuery() {
        var uri = UriComponentsBuilder.newInstance();
        add(uri, "temperatureUnit", temperatureUnit());
        add(uri, "powerUnit", powerUnit());
        add(uri, "setPointTemperature", setPointTemperature);
        add(uri, "ambientTemperature", ambientTemperature);
        add(uri, "coldestAmbientTemperature", coldestAmbientTemperature);
        add(uri, "activeLoad", activeLoad);
        add(uri, "convectionWPerM2K", convectionWPerM2K);
        add(uri, "exposedAreaCm2", exposedAreaCm2);
        add(uri, "emissivity", emissivity);
        add(uri, "leadConductanceMWPerK", leadConductanceMWPerK);
        add(uri, "sizeSink", sizesSink() ? Boolean.TRUE : null);
        add(uri, "sinkResistanceKPerW", sinkResistanceKPerW);
        add(uri, "sinkRiseK", sinkRiseK);
        add(uri, "coldInterfaceKPerW", coldInterfaceKPerW);
        add(uri, "hotInterfaceKPerW", hotInterfaceKPerW);
        add(uri, "supplyMaxV", supplyMaxV);
        add(uri, "supplyMaxA", supplyMaxA);
        add(uri, "relativeHumidityPct", relativeHumidityPct);
        add(uri, "maxModules", maxModules);
        add(uri, "objective", objective);
        add(uri, "supplier", supplier == null || supplier.isBlank() ? null : supplier);
        if (lifecycles != null) {
            lifecycles.stream().sorted().forEach(l -> uri.queryParam("lifecycles", l.name()));
        }
        add(uri, "listId", listId);
        add(uri, "minMarginK", minMarginK);
        add(uri, "maxImaxPct", maxImaxPct);
        add(uri, "costQuantity", costQuantity);
        add(uri, "limit", limit);
        return uri.build().encode().getQuery();
    }

    private static void add(UriComponentsBuilder uri, String name, Object value) {
        if (value != null) {
            uri.queryParam(name, value instanceof Double d && d == Math.rint(d) && Math.abs(d) < 1e15
                    ? String.valueOf(d.longValue()) : String.valueOf(value));
        }
    }

    private static double orZero(Double value) {
        return value == null ? 0 : value;
    }
}
