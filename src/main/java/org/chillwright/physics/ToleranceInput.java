package org.chillwright.physics;

/** The inputs a tolerance analysis varies, in the order of its sensitivity ranking's ties. */
public enum ToleranceInput {
    /** Module Seebeck coefficient S (mean over the modules of an array). */
    SEEBECK,
    /** Module resistance R. */
    RESISTANCE,
    /** Module thermal conductance K. */
    CONDUCTANCE,
    /** Heat-sink resistance. */
    SINK_RESISTANCE,
    /** Cold-side interface resistance. */
    COLD_INTERFACE,
    /** Hot-side interface resistance. */
    HOT_INTERFACE,
    /** Ambient temperature. */
    AMBIENT,
    /** Supply limits. */
    SUPPLY
}
