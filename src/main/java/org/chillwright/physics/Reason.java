package org.chillwright.physics;

/** Why no operating point exists: a result the solvers return with a sentence, not an exception. */
public enum Reason {
    /** The load is above the most the module pumps at the required cold face with this heat sink (e.1). */
    LOAD_ABOVE_CAPACITY,
    /** The temperature difference cannot be held even at zero load, or the cold face would be at or below 0 K (e.2). */
    DELTA_T_BEYOND_REACH,
    /** No steady hot-side temperature: the Peltier heat grows with Th faster than the hot path rejects it (e.3). */
    HEAT_SINK_RUNAWAY,
    /** The current needed is above the rated Imax (e.5). */
    CURRENT_ABOVE_IMAX,
    /** The voltage needed is above the supply's maximum (e.5). */
    SUPPLY_VOLTAGE_EXCEEDED,
    /** The current needed is above the supply's maximum (e.5). */
    SUPPLY_CURRENT_EXCEEDED,
    /** A two-stage cascade has no interstage temperature between its cold and hot sides (h). */
    INTERSTAGE_OUT_OF_RANGE,
    /** The hot face would pass the module's stated maximum temperature. */
    HOT_SIDE_ABOVE_LIMIT,
    /**
     * The hot face would pass 250 °C, beyond any use of a module that states no maximum temperature
     * ({@link SafetyLimits#HOT_FACE_WITHOUT_STATED_LIMIT_K}).
     */
    HOT_SIDE_BEYOND_USE
}
