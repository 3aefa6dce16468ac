package org.chillwright.physics;

/**
 * A risk at a feasible operating point or of its drive. All thresholds are common practice (no source),
 * each named beside its constant.
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
         * Generator: the hot junction with the load disconnected (its hottest state) above the module's stated
         * maximum temperature. A cooler's hot face above that limit is infeasible instead
         * ({@link Reason#HOT_SIDE_ABOVE_LIMIT}).
         */
        HOT_SIDE_ABOVE_LIMIT,
        /** Generator: the module states no maximum temperature, so its hot junction cannot be checked. */
        HOT_SIDE_LIMIT_UNCHECKED,
        /**
         * Cooler at a fixed current or voltage beyond the capacity peak: dQc/dI &lt; 0 at the point, so more
         * current would cool less (and less current more).
         */
        OVER_DRIVEN,
        /** Cooler at a fixed current or voltage: the cooled part settles warmer than the ambient. */
        COOLED_PART_ABOVE_AMBIENT,
        /** Cold face below the ambient dew point + 2 K (dew point at or above 0 °C; 4 K when extrapolated). */
        CONDENSATION_RISK,
        /** Cold face below the ambient frost point + 2 K, when the dew point is below 0 °C (4 K when extrapolated). */
        FROST_RISK,
        /** The array's voltage is above 60 V DC ({@link SafetyLimits#SHOCK_HAZARD_ABOVE_V}). */
        SHOCK_HAZARD_VOLTAGE,
        /** The drive's ripple or pulses cost more than 10 % of the capacity or the COP of a steady current. */
        DRIVE_LOSS,
        /** Unfiltered PWM below the tens of kHz usually used. */
        SLOW_PWM,
        /** The drive's peak current is above the rated Imax. */
        PEAK_ABOVE_IMAX
    }
}
