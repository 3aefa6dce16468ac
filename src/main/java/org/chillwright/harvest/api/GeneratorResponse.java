package org.chillwright.harvest.api;

import jakarta.annotation.Nullable;
import java.util.List;

/**
 * A generator's point on the chosen (or best) load, and its optima. SI with °C. {@code maxHotSideC} is null
 * when the module states no maximum temperature (then the warnings say that the limit is unchecked).
 */
public record GeneratorResponse(
        double openCircuitV,
        double loadOhm,
        double currentA,
        double voltageV,
        double powerW,
        double efficiency,
        double hotJunctionC,
        double coldJunctionC,
        double heatInW,
        double maxPowerW,
        double maxPowerLoadOhm,
        double maxEfficiency,
        double maxEfficiencyLoadOhm,
        double openCircuitHotJunctionC,
        @Nullable Double maxHotSideC,
        List<WarningJson> warnings) {

    /** A risk of the design: a stable code and a sentence with the numbers. */
    public record WarningJson(String code, String message) {
    }
}
