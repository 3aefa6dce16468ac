package org.chillwright.harvest.api;

/** A generator's point on the chosen (or best) load, and its optima. SI with °C. */
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
        double maxEfficiencyLoadOhm) {
}
