package org.chillwright.harvest;

/** What a harvest ranking puts first. Every design is judged on the load that gives it the most power. */
public enum HarvestObjective {
    /** Most electrical power into the load. */
    POWER,
    /** Highest efficiency (power into the load per watt of heat drawn from the source) at that load. */
    EFFICIENCY,
    /** Lowest array cost per watt delivered; designs without a price come last. */
    COST_PER_WATT
}
