package org.chillwright.physics;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The capacity and COP a drive loses against a linear supply at a design point. The design point is solved twice
 * with {@link OperatingPointSolver}: on a steady current, and with the Joule term scaled by the drive's
 * Irms²/Iavg² (derived in {@link Drive}): the solver's module then has R·Irms²/Iavg² in place of R, which scales
 * exactly the two ½I²R terms of Qc and Qh and the I²R of the power, while the Peltier and conduction terms follow
 * the average current. The average voltage and the peaks are put back from the unscaled R. Capacity is the most
 * heat removable while holding the set-point with the case's heat sink (as {@link Solved#maxHeatLoadW()}).
 *
 * <p>The supply must deliver the drive's peaks: a peak voltage above the supply's maximum, or a peak current above
 * its current limit, makes the driven point infeasible; the rated Imax is checked against the average current, and
 * a peak above it is a warning. Common practice (no source): a loss of capacity or COP above 10 % is worth a
 * warning (common practice, no source: keep ripple below about 10 %, which costs well under 1 %), and PWM is switched at tens of
 * kHz behind an LC filter, so unfiltered PWM below {@value #SLOW_PWM_HZ} Hz is flagged.
 */
public final class RippleAnalysis {

    /** Warn above this loss of capacity or COP: common practice (no source). */
    static final double LOSS_WARNING_FRACTION = 0.10;
    /** Warn for PWM switched below this, Hz: common practice (no source), tens of kHz with an LC filter. */
    static final double SLOW_PWM_HZ = 20_000;

    private final OperatingPointSolver solver = new OperatingPointSolver();

    /**
     * @param array       the modules and their wiring
     * @param coolingCase the design case
     * @param limits      limits at the terminals
     * @param drive       the drive to compare with a linear supply
     */
    public RippleEffect analyse(ModuleArray array, CoolingCase coolingCase, DriveLimits limits, Drive drive) {
        if (array == null || coolingCase == null || limits == null || drive == null) {
            String field = array == null ? "array" : coolingCase == null ? "coolingCase" : limits == null ? "limits"
                    : "drive";
            throw new InvalidQuantityException(field, Double.NaN, field + " must be given, was null");
        }
        double factor = drive.jouleFactor();
        ModuleParameters module = array.module();
        ModuleParameters scaledModule = new ModuleParameters(module.seebeckVPerK(), module.resistanceOhm() * factor,
                module.conductanceWPerK());
        ModuleArray scaled = new ModuleArray(scaledModule, array.seriesCount(), array.parallelCount());
        OperatingPoint linear = solver.solve(array, coolingCase, limits);
        // the supply's limits are checked below against the peaks, the rated Imax against the average
        OperatingPoint driven = solver.solve(scaled, coolingCase,
                new DriveLimits(limits.ratedImaxA(), Double.NaN, Double.NaN, limits.maxHotSideK()));
        ModuleParameters equivalent = array.equivalent();
        double rmsA = Double.NaN;
        double peakA = Double.NaN;
        double peakV = Double.NaN;
        if (driven instanceof Solved d) {
            rmsA = d.currentA() * Math.sqrt(factor);
            peakA = d.currentA() * drive.peakFactor();
            peakV = equivalent.voltageV(peakA, d.coldSideK(), d.hotSideK());
            Infeasible atPeak = peakViolation(limits, peakA, peakV);
            driven = atPeak != null ? atPeak : withAverageVoltage(array, equivalent, d);
        }
        if (!(driven instanceof Solved)) {
            rmsA = Double.NaN;
            peakA = Double.NaN;
            peakV = Double.NaN;
        }
        double linearCapacityW = OperatingPointSolver.maxHeatLoadW(equivalent, coolingCase);
        double drivenCapacityW = OperatingPointSolver.maxHeatLoadW(scaled.equivalent(), coolingCase);
        double capacityLoss = linearCapacityW > 0 ? 1 - drivenCapacityW / linearCapacityW : Double.NaN;
        double copLoss = Double.NaN;
        if (linear instanceof Solved l && driven instanceof Solved d) {
            copLoss = l.currentA() == 0 ? 0.0 : 1 - d.cop() / l.cop();
        }
        List<Warning> warnings = warnings(drive, limits, linear, driven, capacityLoss, copLoss, peakA);
        return new RippleEffect(drive, factor, linear, driven, capacityLoss, copLoss, rmsA, peakA, peakV, warnings);
    }

    private static Infeasible peakViolation(DriveLimits limits, double peakA, double peakV) {
        if (!Double.isNaN(limits.supplyMaxA()) && peakA > limits.supplyMaxA()) {
            return new Infeasible(Reason.SUPPLY_CURRENT_EXCEEDED, format(
                    "the drive's peaks need %.2f A, above the supply's %.2f A", peakA, limits.supplyMaxA()));
        }
        if (!Double.isNaN(limits.supplyMaxV()) && peakV > limits.supplyMaxV()) {
            return new Infeasible(Reason.SUPPLY_VOLTAGE_EXCEEDED, format(
                    "the drive's peaks need %.2f V at %.2f A, above the supply's %.2f V", peakV, peakA,
                    limits.supplyMaxV()));
        }
        return null;
    }

    /** The driven point with the average terminal voltage S·ΔT + R·Iavg (the solver's is P/I with the scaled R). */
    private static Solved withAverageVoltage(ModuleArray array, ModuleParameters equivalent, Solved d) {
        double voltageV = equivalent.voltageV(d.currentA(), d.coldSideK(), d.hotSideK());
        return new Solved(d.currentA(), voltageV, d.powerW(), d.cop(), d.setPointK(), d.coldSideK(), d.hotSideK(),
                d.heatRejectedW(), d.heatLoadW(), d.fractionOfImax(), d.maxHeatLoadW(), d.currentAtMaxHeatLoadA(),
                d.marginK(), d.copOptimalCurrentA(), d.maxCop(), d.dewPointK(), d.frostPointK(), d.warnings(),
                array.share(d.currentA(), voltageV, d.heatLoadW(), d.heatRejectedW(), d.powerW()));
    }

    private static List<Warning> warnings(Drive drive, DriveLimits limits, OperatingPoint linear,
                                          OperatingPoint driven, double capacityLoss, double copLoss, double peakA) {
        List<Warning> warnings = new ArrayList<>(2);
        if (linear.feasible() && !driven.feasible()) {
            warnings.add(new Warning(Warning.Code.DRIVE_LOSS, format(
                    "on this drive the design no longer holds the set-point (%s); a linear supply does",
                    ((Infeasible) driven).detail())));
        } else if (capacityLoss > LOSS_WARNING_FRACTION || copLoss > LOSS_WARNING_FRACTION) {
            warnings.add(new Warning(Warning.Code.DRIVE_LOSS, format(
                    "this drive costs %.0f %% of the capacity and %.0f %% of the COP of a steady current (above"
                            + " %.0f %%): filter the current, or use a linear supply",
                    100 * capacityLoss, 100 * copLoss, 100 * LOSS_WARNING_FRACTION)));
        }
        if (drive instanceof Drive.Pwm pwm && pwm.frequencyHz() < SLOW_PWM_HZ) {
            warnings.add(new Warning(Warning.Code.SLOW_PWM, format(
                    "PWM at %.0f Hz: below the tens of kHz usually switched behind an LC filter; slow pulses also"
                            + " cycle the module thermally and tire its solder joints", pwm.frequencyHz())));
        }
        if (limits.hasRatedImax() && peakA > limits.ratedImaxA()) {
            warnings.add(new Warning(Warning.Code.PEAK_ABOVE_IMAX, format(
                    "the drive's peak current %.2f A is above the rated Imax of %.2f A", peakA, limits.ratedImaxA())));
        }
        return warnings;
    }

    private static String format(String pattern, Object... args) {
        return String.format(Locale.ROOT, pattern, args);
    }
}
