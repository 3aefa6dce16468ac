package org.chillwright.physics;

/**
 * A risk at a feasible operating point or of its drive. All thresholds are common practice (no source), see
 * physics.md sections k and l.
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
        /** Hot face above the module's maximum temperature. */
        HOT_SIDE_ABOVE_LIMIT,
        /** Cold face below the ambient dew point + 2 K. */
        CONDENSATION_RISK,
        /** The drive's ripple or pulses cost more than 10 % of the capacity or the COP of a steady current. */
        DRIVE_LOSS,
        /** Unfiltered PWM below the tens of kHz usually used. */
        SLOW_PWM,
        /** The drive's peak current is above the rated Imax. */
        PEAK_ABOVE_IMAX
    }
}
