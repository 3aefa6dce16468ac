package org.chillwright.physics;

import java.util.List;

/**
 * What a drive costs against a linear supply at the same design point (see {@link RippleAnalysis}).
 *
 * @param drive                the drive
 * @param jouleFactor          Irms²/Iavg² of the drive
 * @param linear               the design point on a steady current
 * @param driven               the design point on this drive: {@code currentA} is the average current,
 *                             {@code voltageV} the average terminal voltage S·ΔT + R·Iavg and {@code powerW} the true
 *                             average power S·ΔT·Iavg + R·Irms², so powerW ≥ currentA × voltageV here; or
 *                             {@link Infeasible} when the drive cannot hold the set-point within the limits
 * @param capacityLossFraction 1 − (most heat removable at the set-point on this drive)/(on a steady current), 0..1;
 *                             NaN when a steady current cannot hold the set-point at all
 * @param copLossFraction      1 − COP on this drive / COP on a steady current at the design load, 0..1; NaN unless
 *                             both points are feasible
 * @param rmsCurrentA          RMS current on this drive, A; NaN when infeasible
 * @param peakCurrentA         peak current on this drive, A; NaN when infeasible
 * @param peakVoltageV         terminal voltage at the peak current, S·ΔT + R·Ipeak, V; NaN when infeasible
 * @param warnings             {@link Warning.Code#DRIVE_LOSS}, {@link Warning.Code#SLOW_PWM},
 *                             {@link Warning.Code#PEAK_ABOVE_IMAX}; empty when none
 */
public record RippleEffect(Drive drive, double jouleFactor, OperatingPoint linear, OperatingPoint driven,
                           double capacityLossFraction, double copLossFraction, double rmsCurrentA,
                           double peakCurrentA, double peakVoltageV, List<Warning> warnings) {

    public RippleEffect {
        warnings = List.copyOf(warnings);
    }

    /** Whether a warning of this kind was raised. */
    public boolean hasWarning(Warning.Code code) {
        return warnings.stream().anyMatch(w -> w.code() == code);
    }
}
