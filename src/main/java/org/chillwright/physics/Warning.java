package org.chillwright.physics;

/**
 * A risk at a feasible operating point. All thresholds are common practice (no source), each named
 * beside its constant.
 *
 * @param code     machine-readable kind
 * @param sentence plain-English sentence with the numbers
 */
public record Warning(Code code, String sentence) {

    /** Kinds of warning. */
    public enum Code {
        /** Current above 0.8 × rated Imax. */
        NEAR_IMAX,
        /** ΔT above 0.7 × ΔTmax at the solved hot-side temperature. */
        NEAR_DTMAX,
        /**
         * Hot face above the module's stated maximum temperature; for a generator, the hot junction with the
         * load disconnected (its hottest state).
         */
        HOT_SIDE_ABOVE_LIMIT,
        /** Generator: the module states no maximum temperature, so its hot junction cannot be checked. */
        HOT_SIDE_LIMIT_UNCHECKED,
        /** Cold face below the ambient dew point + 2 K. */
        CONDENSATION_RISK,
        /** The array's voltage is above 60 V DC ({@link SafetyLimits#SHOCK_HAZARD_ABOVE_V}). */
        SHOCK_HAZARD_VOLTAGE
    }
}
