package org.chillwright.physics;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.exception.NoBracketingException;

/**
 * A two-stage stack on the thermal network of a single stage (the heat-sink network derived here; the two-stage balance derived here): a cold stage of m
 * modules stacked on a hot stage of n, both series × parallel arrays, between the cooled part and the heat
 * sink:
 * <pre>
 *   part (set-point) —cold interface— Tc | cold stage | Ti | hot stage | Th —hot interface + sink— ambient
 *   Qc1 = S1·I·Tc − ½I²R1 − K1(Ti − Tc) = load          Qh1 = S1·I·Ti + ½I²R1 − K1(Ti − Tc)
 *   Qc2 = S2·I·Ti − ½I²R2 − K2(Th − Ti) = Qh1           Th  = Tamb + Rh·(S2·I·Th + ½I²R2 − K2(Th − Ti))
 * </pre>
 * ideal constant-property equations per stage (the Ioffe 1957 / Goldsmid 2016 ideal equations; A.F. Ioffe, Semiconductor Thermoelements and
 * Thermoelectric Cooling, 1957, from memory), no interstage resistance, the stages' equivalent modules of
 * arrays of identical modules, derived here. For a fixed current the interstage and hot-side temperatures follow from a linear 2x2 system
 * (derived here from the two-stage balance and the heat-sink network; see {@link StackKernel}).
 *
 * <p><b>One shared current.</b> Both stages are wired in series on one supply, so they carry the same
 * terminal current I, and the load fixes it as the lower root of Qc1(I) = load (the two-stage balance derived here, "Same current in
 * both stages"). This is what is solved and ranked, because it is what a stack with one driver is: one
 * supply, one current limit, one temperature loop, and the usual wiring of a stack under one controller.
 * Separate currents could do somewhat better (the best (I1, I2) needs a 2-D search per stack), but cost a
 * second supply and a second control loop, and would multiply the cost of ranking a catalog squared. The
 * series × parallel split of each stage still sets the modules' current ratio: a cold-stage module carries
 * I/np1 and a hot-stage module I/np2.
 *
 * @param coldStage the cold (upper) stage, on the cooled part
 * @param hotStage  the hot (lower) stage, on the heat sink
 */
public record TwoStageStack(StageDesign coldStage, StageDesign hotStage) {

    /** The lowest set-point is solved to 1 nK, against a shown 0.01 K (as {@link OperatingPointSolver}). */
    static final double TEMPERATURE_ACCURACY_K = 1e-9;
    /** Evaluation cap for the Brent root of the lowest set-point; each evaluation is one peak search. */
    static final int MAX_EVALUATIONS = 200;
    /** First downward step when bracketing the lowest set-point, K; doubled until the stack cannot hold it. */
    private static final double FIRST_STEP_K = 1.0;
    /** The lowest set-point search never goes below this cold face, K. */
    private static final double LOWEST_COLD_SIDE_K = 1.0;

    public TwoStageStack {
        if (coldStage == null || hotStage == null) {
            String field = coldStage == null ? "coldStage" : "hotStage";
            throw new InvalidQuantityException(field, Double.NaN, field + " must be given, was null");
        }
    }

    /**
     * The shared current that removes the case's load at its set-point, with the interstage and hot-side
     * temperatures, powers, COP, marginK and warnings; or {@link Infeasible} with
     * {@link Reason#DELTA_T_BEYOND_REACH}, {@link Reason#LOAD_ABOVE_CAPACITY},
     * {@link Reason#INTERSTAGE_OUT_OF_RANGE} (unless Tc &lt; Ti &lt; Th), {@link Reason#CURRENT_ABOVE_IMAX}
     * (either stage's rated Imax, or {@code limits.ratedImaxA()} at the stack's terminals),
     * {@link Reason#SUPPLY_CURRENT_EXCEEDED} or {@link Reason#SUPPLY_VOLTAGE_EXCEEDED} (both stages' voltages
     * add up on the one supply).
     *
     * @param coolingCase set-point, ambient, load and the thermal network
     * @param limits      limits at the stack's terminals (the one supply); each module's own rated Imax and
     *                    hot-side limit apply as well
     */
    public StackPoint solve(CoolingCase coolingCase, DriveLimits limits) {
        if (coolingCase == null || limits == null) {
            String field = coolingCase == null ? "coolingCase" : "limits";
            throw new InvalidQuantityException(field, Double.NaN, field + " must be given, was null");
        }
        ModuleParameters cold = coldStage.equivalent();
        ModuleParameters hot = hotStage.equivalent();
        double s1 = cold.seebeckVPerK();
        double r1 = cold.resistanceOhm();
        double k1 = cold.conductanceWPerK();
        double s2 = hot.seebeckVPerK();
        double r2 = hot.resistanceOhm();
        double k2 = hot.conductanceWPerK();
        double tamb = coolingCase.ambientK();
        double rh = coolingCase.hotPathKPerW();
        double loadW = coolingCase.heatLoadW();
        double tc = coolingCase.coldSideAtLoadK();
        if (!(tc > 0)) {
            return OperatingPointSolver.coldFaceAtAbsoluteZero(coolingCase);
        }
        double currentA = StackKernel.currentForLoadA(s1, r1, k1, s2, r2, k2, tc, tamb, rh, loadW);
        if (Double.isNaN(currentA)) {
            double[] peak = StackKernel.peak(s1, r1, k1, s2, r2, k2, tc, tamb, rh);
            if (peak[1] < 0) {
                return new Infeasible(Reason.DELTA_T_BEYOND_REACH, format(
                        "cannot hold the cold face at %.2f K (%.2f °C) against %.2f K ambient with a %.3f K/W hot path"
                                + " even with no load: on one shared current the best this stack does there is"
                                + " %.2f W at %.2f A",
                        tc, Units.celsiusFromKelvin(tc), tamb, rh, peak[1], peak[0]));
            }
            return new Infeasible(Reason.LOAD_ABOVE_CAPACITY, format(
                    "needs %.2f W of cooling at a cold face of %.2f K; on one shared current this stack pumps at most"
                            + " %.2f W there (at %.2f A)", loadW, tc, peak[1], peak[0]));
        }
        double[] junctions = StackKernel.junctionsK(s1, r1, k1, s2, r2, k2, tc, tamb, rh, currentA, currentA);
        double ti = junctions[0];
        double th = junctions[1];
        if (!(ti > tc && ti < th)) {
            return new Infeasible(Reason.INTERSTAGE_OUT_OF_RANGE, format(
                    "at %.2f A the interstage temperature is %.2f K, not between the cold face %.2f K and the hot"
                            + " face %.2f K", currentA, ti, tc, th));
        }
        double coldV = cold.voltageV(currentA, tc, ti);
        double hotV = hot.voltageV(currentA, ti, th);
        Infeasible overLimit = limitViolation(limits, currentA, coldV + hotV, th);
        if (overLimit != null) {
            return overLimit;
        }
        return complete(coolingCase, limits, cold, hot, currentA, tc, ti, th, coldV, hotV);
    }

    /** The most current either stage's rating or the supply allows, A (+∞ when none is given). */
    public double currentLimitA(DriveLimits limits) {
        double limitA = limits.currentLimitA();
        if (!Double.isNaN(coldStage.ratedImaxA())) {
            limitA = Math.min(limitA, coldStage.ratedImaxA());
        }
        if (!Double.isNaN(hotStage.ratedImaxA())) {
            limitA = Math.min(limitA, hotStage.ratedImaxA());
        }
        return limitA;
    }

    private Infeasible limitViolation(DriveLimits limits, double currentA, double voltageV, double hotSideK) {
        for (StageDesign stage : new StageDesign[] {coldStage, hotStage}) {
            if (currentA > stage.ratedImaxA()) {
                return new Infeasible(Reason.CURRENT_ABOVE_IMAX, format(
                        "needs %.2f A, above the %s stage's rated Imax of %.2f A (%d in parallel)", currentA,
                        stage == coldStage ? "cold" : "hot", stage.ratedImaxA(), stage.parallelCount()));
            }
        }
        // the one supply drives both stages; the hot face is the hot stage's, held to its module's stated maximum
        double statedK = Math.min(nanToInfinity(hotStage.module().maxHotSideK()), nanToInfinity(limits.maxHotSideK()));
        DriveLimits supply = new DriveLimits(limits.ratedImaxA(), limits.supplyMaxV(), limits.supplyMaxA(),
                Double.isInfinite(statedK) ? Double.NaN : statedK);
        return OperatingPointSolver.limitViolation(supply, currentA, voltageV, hotSideK);
    }

    private StackSolved complete(CoolingCase c, DriveLimits limits, ModuleParameters cold, ModuleParameters hot,
                                 double currentA, double tc, double ti, double th, double coldV, double hotV) {
        double loadW = c.heatLoadW();
        double coldPowerW = currentA * coldV;
        double hotPowerW = currentA * hotV;
        double powerW = coldPowerW + hotPowerW;
        double cop = powerW > 0 ? loadW / powerW : Double.POSITIVE_INFINITY;
        double dewPointK = OperatingPointSolver.dewPointK(c);
        double hotLimitK = Math.min(nanToInfinity(hotStage.module().maxHotSideK()), nanToInfinity(limits.maxHotSideK()));
        List<Warning> warnings = new ArrayList<>(2);
        double frostPointK = OperatingPointSolver.frostPointK(c, dewPointK);
        // per stage: its Imax and ΔTmax; the voltage hazard is the whole stack's, checked once below
        addWithStage(warnings, "cold stage", OperatingPointSolver.warnings(cold,
                new DriveLimits(coldStage.ratedImaxA(), Double.NaN, Double.NaN, Double.NaN), currentA, 0, tc, ti,
                c.ambientK(), dewPointK, frostPointK));
        addWithStage(warnings, "hot stage", OperatingPointSolver.warnings(hot,
                new DriveLimits(hotStage.ratedImaxA(), Double.NaN, Double.NaN,
                        Double.isInfinite(hotLimitK) ? Double.NaN : hotLimitK), currentA, 0, ti, th, c.ambientK(),
                Double.NaN, Double.NaN));
        if (SafetyLimits.isShockHazard(coldV + hotV)) {
            warnings.add(SafetyLimits.shockHazard("the stack's terminal voltage", coldV + hotV));
        }
        double marginK = tc - lowestColdSideK(cold.seebeckVPerK(), cold.resistanceOhm(), cold.conductanceWPerK(),
                hot.seebeckVPerK(), hot.resistanceOhm(), hot.conductanceWPerK(), c.ambientK(), c.hotPathKPerW(), loadW, tc,
                currentLimitA(limits));
        StackStage coldResult = stage(coldStage, currentA, coldV, coldPowerW, loadW, tc, ti);
        StackStage hotResult = stage(hotStage, currentA, hotV, hotPowerW, loadW + coldPowerW, ti, th);
        return new StackSolved(coldResult, hotResult, currentA, coldV + hotV, powerW, cop, c.setPointK(), tc, ti, th,
                loadW, loadW + powerW, marginK, dewPointK, warnings);
    }

    private static StackStage stage(StageDesign design, double currentA, double voltageV, double powerW,
                                    double heatPumpedW, double coldSideK, double hotSideK) {
        double perModuleA = currentA / design.parallelCount();
        return new StackStage(design.module().moduleId(), design.seriesCount(), design.parallelCount(), currentA,
                perModuleA, voltageV, powerW, heatPumpedW, coldSideK, hotSideK,
                perModuleA / design.module().ratedImaxA());
    }

    private static void addWithStage(List<Warning> to, String stage, List<Warning> warnings) {
        for (Warning w : warnings) {
            to.add(new Warning(w.code(), stage + ": " + w.sentence()));
        }
    }

    /**
     * Lowest cold face, K, at which the load is still removed with the shared current at most
     * {@code limitA}: the root of G(Tc) = max over I ≤ limit of Qc1(I, Tc) − load. At a fixed current Qc1 is
     * affine in Tc (only the right-hand side K1·Tc of the 2x2 system holds Tc), with slope
     * S1·I + K1(1 − K1·a22/det). Where that is positive for every current up to the peak (as at every such
     * current of the random stacks swept in {@code StackProperties}; far past the peak, near runaway, it can
     * turn negative) G is a maximum of increasing affine functions: increasing, with one root. Since Qc1 is unimodal in I, the
     * maximum is at min(peak current, limit). The root is bracketed downwards from the solved cold face (where
     * G ≥ 0) and found with Commons Math's Brent solver.
     */
    private static double lowestColdSideK(double s1, double r1, double k1, double s2, double r2, double k2,
                                          double tamb, double rh, double loadW, double tc, double limitA) {
        java.util.function.DoubleUnaryOperator surplusW = t -> {
            double[] peak = StackKernel.peak(s1, r1, k1, s2, r2, k2, t, tamb, rh);
            double bestW = peak[0] <= limitA ? peak[1]
                    : StackKernel.coolingW(s1, r1, k1, s2, r2, k2, t, tamb, rh, limitA);
            return bestW - loadW;
        };
        double high = tc;
        double step = FIRST_STEP_K;
        double low = tc - step;
        while (low > LOWEST_COLD_SIDE_K && surplusW.applyAsDouble(low) >= 0) {
            high = low;
            step *= 2;
            low = tc - step;
        }
        if (low <= LOWEST_COLD_SIDE_K) {
            low = LOWEST_COLD_SIDE_K;
            if (surplusW.applyAsDouble(low) >= 0) {
                return low;
            }
        }
        try {
            return new BrentSolver(TEMPERATURE_ACCURACY_K) // per-call state: never share it
                    .solve(MAX_EVALUATIONS, surplusW::applyAsDouble, low, high);
        } catch (NoBracketingException e) {
            return high; // the load sits at the limit within round-off
        } catch (MathIllegalStateException e) {
            throw new IllegalStateException(format("lowest cold face of the stack not found in [%.4f, %.4f] K", low,
                    high), e);
        }
    }

    private static double nanToInfinity(double value) {
        return Double.isNaN(value) ? Double.POSITIVE_INFINITY : value;
    }

    private static String format(String pattern, Object... args) {
        return String.format(Locale.ROOT, pattern, args);
    }
}
