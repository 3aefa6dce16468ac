package org.chillwright.physics;

import java.util.Locale;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.exception.NoBracketingException;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;

/**
 * Two-stage cascade: a cold stage stacked on a hot stage with no interstage resistance, between a
 * fixed cold side and a fixed hot side (derived here from the ideal equations per stage, Ioffe 1957 and
 * Goldsmid 2016, from memory; case S15). Stage heat balance
 * Qh1 = Qc2 with the ideal equations per stage. Either stage may be an array equivalent
 * ({@link ModuleParameters#inArray}).
 *
 * @param coldStage parameters of the cold (upper) stage
 * @param hotStage  parameters of the hot (lower) stage
 */
public record TwoStageCascade(ModuleParameters coldStage, ModuleParameters hotStage) {

    /** Brent root accuracy in current, A: 1 nA, far below any drive resolution. */
    static final double CURRENT_ACCURACY_A = 1e-9;
    /** Relative accuracy of the peak search: the maximum is flat, so its location is only needed roughly. */
    static final double PEAK_RELATIVE_ACCURACY = 1e-10;
    /** Absolute accuracy of the peak search, A. */
    static final double PEAK_ACCURACY_A = 1e-9;
    /** Evaluation cap for the Commons Math searches; each evaluation is a closed form. */
    static final int MAX_EVALUATIONS = 1000;

    public TwoStageCascade {
        if (coldStage == null || hotStage == null) {
            throw new InvalidQuantityException(coldStage == null ? "coldStage" : "hotStage", Double.NaN,
                    (coldStage == null ? "coldStage" : "hotStage") + " must be given, was null");
        }
    }

    /**
     * Interstage temperature for fixed stage currents, K (Qh1 = Qc2 solved for Ti):
     * Ti = (½I1²R1 + K1·Tc + ½I2²R2 + K2·Th)/(S2·I2 + K2 − S1·I1 + K1); NaN when the denominator is ≤ 0.
     */
    public double interstageK(double coldStageCurrentA, double hotStageCurrentA, double coldSideK, double hotSideK) {
        double i1 = coldStageCurrentA;
        double i2 = hotStageCurrentA;
        double denominator = hotStage.seebeckVPerK() * i2 + hotStage.conductanceWPerK()
                - coldStage.seebeckVPerK() * i1 + coldStage.conductanceWPerK();
        if (!(denominator > 0)) {
            return Double.NaN;
        }
        return (0.5 * i1 * i1 * coldStage.resistanceOhm() + coldStage.conductanceWPerK() * coldSideK
                + 0.5 * i2 * i2 * hotStage.resistanceOhm() + hotStage.conductanceWPerK() * hotSideK) / denominator;
    }

    /**
     * Steady point at fixed stage currents. Infeasible with
     * {@link Reason#INTERSTAGE_OUT_OF_RANGE} unless Tc &lt; Ti &lt; Th, and with
     * {@link Reason#DELTA_T_BEYOND_REACH} when the cold stage pumps no heat.
     *
     * @param coldStageCurrentA cold-stage current, A, ≥ 0
     * @param hotStageCurrentA  hot-stage current, A, ≥ 0
     * @param coldSideK         cold side Tc, K, &gt; 0
     * @param hotSideK          hot side Th, K, &gt; coldSideK
     */
    public CascadePoint atCurrents(double coldStageCurrentA, double hotStageCurrentA, double coldSideK,
                                   double hotSideK) {
        Check.nonNegative("coldStageCurrentA", coldStageCurrentA);
        Check.nonNegative("hotStageCurrentA", hotStageCurrentA);
        checkSides(coldSideK, hotSideK);
        double ti = interstageK(coldStageCurrentA, hotStageCurrentA, coldSideK, hotSideK);
        if (!(ti > coldSideK && ti < hotSideK)) {
            return new Infeasible(Reason.INTERSTAGE_OUT_OF_RANGE, String.format(Locale.ROOT,
                    "at %.2f A (cold stage) and %.2f A (hot stage) the interstage temperature is %s, not between"
                            + " %.2f K and %.2f K",
                    coldStageCurrentA, hotStageCurrentA,
                    Double.isNaN(ti) ? "unbounded" : String.format(Locale.ROOT, "%.2f K", ti), coldSideK, hotSideK));
        }
        double qc1 = coldStage.coldSideHeatW(coldStageCurrentA, coldSideK, ti);
        if (!(qc1 > 0)) {
            return new Infeasible(Reason.DELTA_T_BEYOND_REACH, String.format(Locale.ROOT,
                    "at these currents the cold stage pumps %.2f W: it cannot hold %.2f K", qc1, coldSideK));
        }
        double p1 = coldStage.powerW(coldStageCurrentA, coldSideK, ti);
        double p2 = hotStage.powerW(hotStageCurrentA, ti, hotSideK);
        double qc2 = hotStage.coldSideHeatW(hotStageCurrentA, ti, hotSideK);
        return new CascadeSolved(ti, qc1, coldStageCurrentA, hotStageCurrentA, p1, p2, qc1 / p1, qc2 / p2);
    }

    /**
     * Both stages on one current (series wiring): the lower root of Qc1(I) = heatLoadW with Ti(I)
     * from the fixed-current closed form. Qc1(I) is
     * unimodal: its peak is found with Commons Math's Brent optimiser, then the root with Brent's
     * solver on [0, I_peak]. Infeasible with {@link Reason#LOAD_ABOVE_CAPACITY} above the peak.
     *
     * @param heatLoadW heat to pump from the cold side, W, ≥ 0
     * @param coldSideK cold side Tc, K, &gt; 0
     * @param hotSideK  hot side Th, K, &gt; coldSideK
     */
    public CascadePoint sharedCurrentForLoad(double heatLoadW, double coldSideK, double hotSideK) {
        Check.nonNegative("heatLoadW", heatLoadW);
        checkSides(coldSideK, hotSideK);
        UnivariateFunction coolingW = i -> {
            double ti = interstageK(i, i, coldSideK, hotSideK);
            return Double.isNaN(ti) ? Double.NEGATIVE_INFINITY : coldStage.coldSideHeatW(i, coldSideK, ti);
        };
        double highA = searchLimitA(coldSideK, hotSideK);
        double peakA;
        try {
            peakA = new BrentOptimizer(PEAK_RELATIVE_ACCURACY, PEAK_ACCURACY_A) // per-call state: never share it
                    .optimize(new MaxEval(MAX_EVALUATIONS), new UnivariateObjectiveFunction(coolingW),
                            GoalType.MAXIMIZE, new SearchInterval(0, highA))
                    .getPoint();
        } catch (MathIllegalStateException e) {
            throw new IllegalStateException("cascade peak search failed on [0, " + highA + "] A", e);
        }
        double peakW = coolingW.value(peakA);
        if (peakW < heatLoadW) {
            return new Infeasible(Reason.LOAD_ABOVE_CAPACITY, String.format(Locale.ROOT,
                    "needs %.2f W at %.2f K; on one shared current this cascade pumps at most %.2f W (at %.2f A)",
                    heatLoadW, coldSideK, peakW, peakA));
        }
        double currentA;
        try {
            currentA = new BrentSolver(CURRENT_ACCURACY_A) // per-call state: never share it
                    .solve(MAX_EVALUATIONS, i -> coolingW.value(i) - heatLoadW, 0, peakA);
        } catch (NoBracketingException e) {
            currentA = peakA; // the load sits at the flat top within round-off
        } catch (MathIllegalStateException e) {
            throw new IllegalStateException("cascade current solve failed for " + heatLoadW + " W", e);
        }
        return atCurrents(currentA, currentA, coldSideK, hotSideK);
    }

    /** Upper end of the shared-current search: below the current where Ti becomes unbounded, and past both stages' S·T/R. */
    private double searchLimitA(double coldSideK, double hotSideK) {
        double highA = 2 * Math.max(coldStage.maxCoolingCurrentA(coldSideK), hotStage.maxCoolingCurrentA(hotSideK));
        double netSeebeck = coldStage.seebeckVPerK() - hotStage.seebeckVPerK();
        if (netSeebeck > 0) {
            double unboundedA = (coldStage.conductanceWPerK() + hotStage.conductanceWPerK()) / netSeebeck;
            highA = Math.min(highA, unboundedA * (1 - 1e-9));
        }
        return highA;
    }

    private static void checkSides(double coldSideK, double hotSideK) {
        Check.positive("coldSideK", coldSideK);
        Check.above("hotSideK", hotSideK, coldSideK, "coldSideK");
    }
}
