package org.chillwright.physics;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleUnaryOperator;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.exception.NoBracketingException;

/**
 * Steady operating point of a heat-sink-coupled cooler: the current that removes a load at a required
 * object temperature, or the object temperature reached at a fixed current or voltage. Ideal
 * constant-property equations Qc = S·I·Tc − ½I²R − K(Th − Tc), Qh = Qc + I·V, V = S(Th − Tc) + I·R
 * (A.F. Ioffe, Semiconductor Thermoelements and Thermoelectric Cooling, 1957; H.J. Goldsmid, Introduction
 * to Thermoelectricity, 2016; both from memory) with the series thermal network Tc = Tobj − Q·Rint,c and
 * Th = Tamb + Qh·Rh, Rh = Rint,h + Rsink; the closed forms and bounds below are derived here from those
 * equations and checked against brute-force scans in the tests (check cases S10, S10b, S11, S12).
 *
 * <p>Stateless and thread-safe. The static {@link #currentForLoadA} and {@link #copAtLoad} are the
 * allocation-free path for ranking many candidates; {@link #solve} adds the capacity, margins,
 * COP optimum and warnings for the candidates shown.
 */
public final class OperatingPointSolver {

    /**
     * Newton stops once a step in current is below this, A. The iterations converge quadratically,
     * so the error left after a 1e-9 A step is many orders smaller, well inside the 1e-9 relative
     * accuracy the check cases ask for at currents of 0.1 A and up.
     */
    static final double CURRENT_ACCURACY_A = 1e-9;
    /**
     * The lower-root Newton also stops once the error it estimates after a step, ½|Qc''|·ΔI²/Qc', is
     * below this, A. The estimate is the leading term of the next step, so it is accepted only with a
     * thousandfold margin on {@link #CURRENT_ACCURACY_A}: 1e-12 A, 1e-12 relative at 1 A.
     */
    static final double ROOT_ERROR_A = 1e-12;
    /** The capacity iteration stops once a step in heat is below this, W: 1 nW against loads of mW and up. */
    static final double HEAT_ACCURACY_W = 1e-9;
    /**
     * The lowest-object-temperature iteration stops once a step is below this, K: 1 nK against a shown
     * 0.01 K. The 2-D Newton on the peak also stops once its estimated remaining error is below this
     * (in Tc) and below {@link #CURRENT_ACCURACY_A} (in I), see {@link #settled}.
     */
    static final double TEMPERATURE_ACCURACY_K = 1e-9;
    /**
     * Iteration cap. Near a double root (load exactly at the peak) Newton only halves the error per
     * step, so 200 steps reach round-off from any start; well-posed cases take 2 to 8.
     */
    static final int MAX_ITERATIONS = 200;
    /** Cap for the 2-D Newton on the capacity peak: it converges in 2 to 6 steps from the starts used, or is abandoned. */
    static final int NEWTON_2D_ITERATIONS = 30;
    /** Evaluation cap for the generic Brent root in the fixed-voltage drive; each evaluation is a 2x2 solve. */
    static final int MAX_EVALUATIONS = 500;
    /** Fraction of the runaway current used as the end of a bracket: at the runaway current itself Th is infinite. */
    private static final double RUNAWAY_GUARD = 1 - 1e-9;

    /** Warn above this fraction of rated Imax: common practice (no source). */
    static final double NEAR_IMAX_FRACTION = 0.8;
    /** Warn above this fraction of ΔTmax at the solved hot side: common practice (no source). */
    static final double NEAR_DTMAX_FRACTION = 0.7;
    /** Warn when the cold face is less than this above the dew point, K: common practice (no source). */
    static final double DEW_POINT_MARGIN_K = 2.0;

    private static final DewPoint DEW_POINT = new DewPointMagnus();
    private static final double FREEZING_K = Units.kelvinFromCelsius(0);

    /**
     * Lower-root current that removes the case's load at its object temperature, single module.
     * See {@link #solve(ModuleArray, CoolingCase, DriveLimits)}.
     */
    public OperatingPoint solve(ModuleParameters module, CoolingCase coolingCase, DriveLimits limits) {
        return solve(ModuleArray.single(module), coolingCase, limits);
    }

    /**
     * Current that removes {@code heatLoadW} from the object held at {@code setPointK}.
     * Returns the lower root of Qc(I) = Qload (low current, low power, high COP; the upper root is
     * on the over-driven side and never returned), I = 0 when conduction alone carries the load
     * (passive case), or {@link Infeasible} with {@link Reason#DELTA_T_BEYOND_REACH},
     * {@link Reason#LOAD_ABOVE_CAPACITY}, {@link Reason#CURRENT_ABOVE_IMAX},
     * {@link Reason#SUPPLY_CURRENT_EXCEEDED} or {@link Reason#SUPPLY_VOLTAGE_EXCEEDED}.
     *
     * @param array       the modules and their wiring (terminal values are the array's)
     * @param coolingCase load, temperatures and thermal resistances
     * @param limits      rated Imax of the array, supply limits, hot-side limit (any may be absent)
     */
    public OperatingPoint solve(ModuleArray array, CoolingCase coolingCase, DriveLimits limits) {
        return withCapacity(solvePoint(array, coolingCase, limits), array.equivalent(), coolingCase);
    }

    private static OperatingPoint solvePoint(ModuleArray array, CoolingCase coolingCase, DriveLimits limits) {
        ModuleParameters module = array.equivalent();
        double s = module.seebeckVPerK();
        double r = module.resistanceOhm();
        double k = module.conductanceWPerK();
        double ambientK = coolingCase.ambientK();
        double rh = coolingCase.hotPathKPerW();
        double loadW = coolingCase.heatLoadW();
        double coldK = coolingCase.coldSideAtLoadK();
        if (!(coldK > 0)) {
            return coldFaceAtAbsoluteZero(coolingCase);
        }
        double currentA = currentForLoadA(s, r, k, coldK, ambientK, rh, loadW);
        if (Double.isNaN(currentA)) {
            return noCurrentRemovesLoad(s, r, k, coolingCase, coldK);
        }
        double hotK = hotSideK(s, r, k, coldK, ambientK, rh, currentA);
        double voltageV = module.voltageV(currentA, coldK, hotK);
        Infeasible overLimit = limitViolation(limits, currentA, voltageV, hotK);
        if (overLimit != null) {
            return overLimit;
        }
        return complete(array, module, coolingCase, limits, currentA, voltageV, coldK, hotK, coolingCase.setPointK(),
                false);
    }

    /** The case's cold interface would need a cold face at or below 0 K (the first no-solution condition). */
    static Infeasible coldFaceAtAbsoluteZero(CoolingCase c) {
        return new Infeasible(Reason.DELTA_T_BEYOND_REACH, format(
                "holding the object at %.2f K with %.2f W through %.3f K/W would need the cold face at %.2f K,"
                        + " at or below absolute zero",
                c.setPointK(), c.heatLoadW(), c.coldInterfaceKPerW(), c.coldSideAtLoadK()));
    }

    /**
     * Object temperature reached at a fixed terminal current with the case's load (derived here; check
     * case S12): the linear 2x2 system
     * (S·I + K)Tc − K·Th = Q + ½RI², −Rh·K·Tc + (1 + Rh·K − Rh·S·I)Th = Tamb + ½Rh·R·I², by Cramer's
     * rule; Tobj = Tc + Rint,c·Q. Its determinant is K + S·I − Rh·S²·I²; at or below zero there is no
     * steady state ({@link Reason#HEAT_SINK_RUNAWAY}). The case's {@code setPointK} is not used.
     *
     * @param currentA terminal current, A, ≥ 0
     */
    public OperatingPoint atCurrent(ModuleArray array, CoolingCase coolingCase, DriveLimits limits, double currentA) {
        Check.nonNegative("currentA", currentA);
        return withCapacity(atCurrentPoint(array, coolingCase, limits, currentA), array.equivalent(), coolingCase);
    }

    private static OperatingPoint atCurrentPoint(ModuleArray array, CoolingCase coolingCase, DriveLimits limits,
                                                 double currentA) {
        ModuleParameters module = array.equivalent();
        double s = module.seebeckVPerK();
        double r = module.resistanceOhm();
        double k = module.conductanceWPerK();
        double rh = coolingCase.hotPathKPerW();
        double det = fixedCurrentDeterminant(s, k, rh, currentA);
        if (!(det > 0)) {
            return new Infeasible(Reason.HEAT_SINK_RUNAWAY, format(
                    "at %.2f A the hot side has no steady state: the Peltier heat grows with the hot-side temperature"
                            + " faster than the %.3f K/W hot path rejects it (runaway from %.2f A)",
                    currentA, rh, fixedCurrentRunawayA(s, k, rh)));
        }
        double[] junctionK = fixedCurrentJunctionsK(s, r, k, coolingCase, currentA, det);
        double coldK = junctionK[0];
        double hotK = junctionK[1];
        double voltageV = module.voltageV(currentA, coldK, hotK);
        Infeasible overLimit = limitViolation(limits, currentA, voltageV, hotK);
        if (overLimit != null) {
            return overLimit;
        }
        double setPointK = coldK + coolingCase.coldInterfaceKPerW() * coolingCase.heatLoadW();
        return complete(array, module, coolingCase, limits, currentA, voltageV, coldK, hotK, setPointK, true);
    }

    /**
     * Object temperature reached at a fixed terminal voltage with the case's load:
     * a 1-D root in I of S(Th − Tc) + I·R = V with (Tc, Th) from the fixed-current system, found by
     * Brent's method on a bracket from 0 (where the voltage is at most 0) to a current where it
     * exceeds V. The case's {@code setPointK} is not used.
     *
     * @param voltageV terminal voltage, V, &gt; 0
     */
    public OperatingPoint atVoltage(ModuleArray array, CoolingCase coolingCase, DriveLimits limits, double voltageV) {
        Check.positive("voltageV", voltageV);
        ModuleParameters module = array.equivalent();
        double s = module.seebeckVPerK();
        double r = module.resistanceOhm();
        double k = module.conductanceWPerK();
        double rh = coolingCase.hotPathKPerW();
        double runawayA = fixedCurrentRunawayA(s, k, rh);
        DoubleUnaryOperator surplusV = currentA -> {
            double[] junctionK = fixedCurrentJunctionsK(s, r, k, coolingCase, currentA,
                    fixedCurrentDeterminant(s, k, rh, currentA));
            return module.voltageV(currentA, junctionK[0], junctionK[1]) - voltageV;
        };
        double highA = Math.min(voltageV / r, runawayA * RUNAWAY_GUARD);
        for (int doubling = 0; surplusV.applyAsDouble(highA) < 0; doubling++) {
            if (doubling == 64 || highA >= runawayA * RUNAWAY_GUARD) {
                return withCapacity(new Infeasible(Reason.HEAT_SINK_RUNAWAY, format(
                        "no steady state reaches %.2f V: the hot side runs away from %.2f A before the voltage"
                                + " is reached", voltageV, runawayA)), module, coolingCase);
            }
            highA = Math.min(2 * highA, runawayA * RUNAWAY_GUARD);
        }
        var solver = new BrentSolver(CURRENT_ACCURACY_A); // holds per-call state: never share it
        double currentA;
        try {
            currentA = solver.solve(MAX_EVALUATIONS, surplusV::applyAsDouble, 0.0, highA);
        } catch (NoBracketingException | MathIllegalStateException e) {
            throw new IllegalStateException(format("fixed-voltage solve failed for %.4f V on [0, %.4f] A", voltageV,
                    highA), e);
        }
        return atCurrent(array, coolingCase, limits, currentA);
    }

    /**
     * Peak of the heat-sink-coupled Qc(I) at a fixed cold face (Qc is concave in I, see
     * {@link #currentForLoadA}; cases S10b, S11): the root of dQc/dI = 0 on [0, min(S·Tc/R, I_run)].
     *
     * @param module       module (or array equivalent) parameters
     * @param coldSideK    cold-face temperature Tc, K, &gt; 0
     * @param ambientK     ambient temperature, K, &gt; 0
     * @param hotPathKPerW hot interface + heat sink Rh, K/W, ≥ 0
     */
    public static CapacityPeak capacityPeak(ModuleParameters module, double coldSideK, double ambientK,
                                            double hotPathKPerW) {
        Check.positive("coldSideK", coldSideK);
        Check.positive("ambientK", ambientK);
        Check.nonNegative("hotPathKPerW", hotPathKPerW);
        double s = module.seebeckVPerK();
        double r = module.resistanceOhm();
        double k = module.conductanceWPerK();
        double peakA = peakCurrentA(s, r, k, coldSideK, ambientK, hotPathKPerW, Double.NaN);
        return new CapacityPeak(peakA, coldHeatW(s, r, k, coldSideK, ambientK, hotPathKPerW, peakA));
    }

    /**
     * Most heat removable while holding the case's set-point with its heat sink and cold interface, W, with no
     * current limit: {@link Solved#maxHeatLoadW()} without solving the operating point first; 0 when not even
     * zero load can be held there.
     *
     * @param module      module (or array equivalent) parameters
     * @param coolingCase the case; its load is not used
     */
    static double maxHeatLoadW(ModuleParameters module, CoolingCase coolingCase) {
        double s = module.seebeckVPerK();
        double r = module.resistanceOhm();
        double k = module.conductanceWPerK();
        double setPointK = coolingCase.setPointK();
        double ambientK = coolingCase.ambientK();
        double rh = coolingCase.hotPathKPerW();
        double peakA = peakCurrentA(s, r, k, setPointK, ambientK, rh, Double.NaN);
        if (coldHeatW(s, r, k, setPointK, ambientK, rh, peakA) < 0) {
            return 0.0;
        }
        return capacityAtObject(s, r, k, setPointK, coolingCase.coldInterfaceKPerW(), ambientK, rh, 0, peakA, setPointK)
                .heatW();
    }

    /**
     * Lower-root current, A, that pumps {@code heatLoadW} from a cold face at {@code coldSideK} into a
     * hot path of {@code hotPathKPerW} to ambient; 0 in the passive case; NaN when no current does
     * (load above the capacity peak, ΔT beyond reach, or a cold face at or below 0 K). Allocation-free,
     * for ranking. Arguments are not checked.
     *
     * <p>Newton with the analytic derivative, started at the smaller root of the second-order Taylor
     * polynomial of Qc at I = 0. In d = 1 + Rh·K − Rh·S·I, which is linear in I, Th(I) = α/d + β + γ·d
     * with α = Th·d at the runaway current, α ≥ 0; so Th‴ = 6α(Rh·S)³/d⁴ ≥ 0 and Qc‴ = −K·Th‴ ≤ 0.
     * Qc″ therefore only falls as I grows, the Taylor polynomial lies on or above Qc for I ≥ 0, and
     * its root is at or left of the lower root. With an ideal sink (Rh = 0) Qc is exactly that
     * quadratic and the start is the closed form of {@link ModuleParameters#currentForLoadA} (case S09),
     * which the first step only confirms. Qc(I) is concave on [0, I_run) (Th(I) is convex there), so every
     * tangent lies above the curve:
     * from a point left of the lower root each Newton step lands at or left of that root, and the
     * iterates rise monotonically to it, never reaching the upper root. If the slope becomes ≤ 0 (or
     * the step passes the runaway current) before the load is reached, the iterates have passed the
     * peak below the load, which only happens when the load is above capacity.
     *
     * @param seebeckVPerK     S, V/K
     * @param resistanceOhm    R, Ω
     * @param conductanceWPerK K, W/K
     * @param coldSideK        Tc, K
     * @param ambientK         Tamb, K
     * @param hotPathKPerW     Rh = hot interface + heat sink, K/W
     * @param heatLoadW        Qload, W
     */
    public static double currentForLoadA(double seebeckVPerK, double resistanceOhm, double conductanceWPerK,
                                         double coldSideK, double ambientK, double hotPathKPerW, double heatLoadW) {
        double s = seebeckVPerK;       // S
        double r = resistanceOhm;      // R
        double k = conductanceWPerK;   // K
        double tc = coldSideK;         // Tc
        double rh = hotPathKPerW;      // Rh
        if (!(tc > 0)) {
            return Double.NaN;
        }
        // Qc − Qload and its first two derivatives at I = 0, where d = 1 + Rh·K
        double perD0 = 1 / (1 + rh * k);
        double th0 = (ambientK + rh * k * tc) * perD0;
        double surplus0 = -k * (th0 - tc) - heatLoadW;
        if (surplus0 >= 0) {
            return 0.0; // passive: conduction alone carries the load
        }
        double thSlope0 = rh * s * th0 * perD0;
        double slope0 = s * tc - k * thSlope0;
        if (!(slope0 > 0)) {
            return Double.NaN; // concave and already falling at zero current: no current helps
        }
        double curvature0 = -r - k * rh * (r + 2 * s * thSlope0) * perD0;
        // Smaller root of surplus0 + slope0·I + ½·curvature0·I² = 0 in cancellation-free form. If the
        // polynomial never reaches the load, the load is above capacity; Newton from I = 0 still
        // decides it, so that round-off in the bound can never refuse a feasible load.
        double discriminant = slope0 * slope0 - 2 * curvature0 * surplus0;
        double i = discriminant >= 0 ? -2 * surplus0 / (slope0 + Math.sqrt(discriminant)) : 0.0;
        for (int n = 0; n < MAX_ITERATIONS; n++) {
            double d = 1 + rh * k - rh * s * i;            // denominator of Th(I)
            if (!(d > 0)) {
                return Double.NaN;
            }
            double perD = 1 / d;                           // one division serves Th and Th'
            double rhPerD = rh * perD;                     // formed beside Th, so fewer products wait on Th
            double th = (ambientK + rh * (0.5 * r * i * i + k * tc)) * perD;
            double surplusW = s * i * tc - 0.5 * r * i * i - k * (th - tc) - heatLoadW;
            double thSlope = rhPerD * (r * i + s * th);                     // Th'(I)
            double slope = s * tc - r * i - k * thSlope;                    // dQc/dI = S·Tc − R·I − K·Th'(I)
            if (!(slope > 0)) {
                return Double.NaN;
            }
            double step = -surplusW / slope;
            i += step;
            // Taylor: the surplus left after the step is ½·Qc''·ΔI², so about ½|Qc''|·ΔI²/Qc' of current is
            // still missing; compared without a division. Near a double root (slope → 0) only the step
            // test ends the iteration, as before.
            double curvature = -r - k * rhPerD * (r + 2 * s * thSlope);    // d²Qc/dI² < 0
            if (Math.abs(step) <= CURRENT_ACCURACY_A || -0.5 * curvature * step * step <= ROOT_ERROR_A * slope) {
                return i;
            }
        }
        return Double.NaN;
    }

    /**
     * COP at the lower-root current for a load (see {@link #currentForLoadA}); NaN when infeasible,
     * +∞ in the passive case. Allocation-free, for ranking; arguments as there.
     */
    public static double copAtLoad(double seebeckVPerK, double resistanceOhm, double conductanceWPerK,
                                   double coldSideK, double ambientK, double hotPathKPerW, double heatLoadW) {
        double i = currentForLoadA(seebeckVPerK, resistanceOhm, conductanceWPerK, coldSideK, ambientK, hotPathKPerW,
                heatLoadW);
        if (Double.isNaN(i)) {
            return Double.NaN;
        }
        double th = hotSideK(seebeckVPerK, resistanceOhm, conductanceWPerK, coldSideK, ambientK, hotPathKPerW, i);
        double powerW = i * (seebeckVPerK * (th - coldSideK) + i * resistanceOhm);
        return powerW > 0 ? heatLoadW / powerW : Double.POSITIVE_INFINITY;
    }

    /**
     * Hot-face temperature at current I with the cold face at Tc, K:
     * Th(I) = [Tamb + Rh(½R·I² + K·Tc)]/(1 + Rh·K − Rh·S·I) (the hot-side balance solved for Th). Valid
     * only below the runaway current (1 + Rh·K)/(Rh·S). Arguments as {@link #currentForLoadA} plus
     * the current, A.
     */
    public static double hotSideK(double seebeckVPerK, double resistanceOhm, double conductanceWPerK,
                                  double coldSideK, double ambientK, double hotPathKPerW, double currentA) {
        double d = 1 + hotPathKPerW * conductanceWPerK - hotPathKPerW * seebeckVPerK * currentA;
        return (ambientK + hotPathKPerW * (0.5 * resistanceOhm * currentA * currentA
                + conductanceWPerK * coldSideK)) / d;
    }

    // ---- kernel: heat-sink-coupled Qc(I) at fixed Tc and its derivatives ----

    static double coldHeatW(double s, double r, double k, double tc, double tamb, double rh, double i) {
        double th = hotSideK(s, r, k, tc, tamb, rh, i);
        return s * i * tc - 0.5 * r * i * i - k * (th - tc);
    }

    /** dQc/dI = S·Tc − R·I − K·Th', Th' = Rh(R·I + S·Th)/d. */
    private static double coldHeatSlope(double s, double r, double k, double tc, double tamb, double rh, double i) {
        double d = 1 + rh * k - rh * s * i;
        double th = (tamb + rh * (0.5 * r * i * i + k * tc)) / d;
        return s * tc - r * i - k * rh * (r * i + s * th) / d;
    }

    /**
     * ∂Qc/∂Tc at fixed I, W/K: S·I + K(1 − Rh·S·I)/d. Qc is affine in Tc at fixed I (Th is), so this
     * is exact, and at the peak it is the slope of the peak value against Tc (envelope theorem).
     */
    private static double coldSideSensitivityWPerK(double s, double k, double rh, double i) {
        double d = 1 + rh * k - rh * s * i;
        return s * i + k * (1 - rh * s * i) / d;
    }

    private static double runawayCurrentA(double s, double k, double rh) {
        return rh > 0 ? (1 + rh * k) / (rh * s) : Double.POSITIVE_INFINITY;
    }

    /**
     * Current of the capacity peak at fixed Tc: root of the decreasing dQc/dI on
     * [0, min(S·Tc/R, I_run)] (dQc/dI = S·Tc − R·I − K·Th' &lt; S·Tc − R·I), Newton with the analytic
     * second derivative, kept inside the shrinking bracket by bisection. 0 when dQc/dI(0) ≤ 0.
     */
    static double peakCurrentA(double s, double r, double k, double tc, double tamb, double rh, double guessA) {
        if (coldHeatSlope(s, r, k, tc, tamb, rh, 0) <= 0) {
            return 0.0;
        }
        double lowA = 0;
        double highA = Math.min(s * tc / r, runawayCurrentA(s, k, rh) * RUNAWAY_GUARD);
        double i = guessA > lowA && guessA < highA ? guessA : 0.5 * highA;
        for (int n = 0; n < MAX_ITERATIONS; n++) {
            double d = 1 + rh * k - rh * s * i;                       // slope and curvature share d and Th
            double th = (tamb + rh * (0.5 * r * i * i + k * tc)) / d;
            double thSlope = rh * (r * i + s * th) / d;               // Th'
            double slope = s * tc - r * i - k * thSlope;              // dQc/dI
            double curvature = -r - k * rh * (r + 2 * s * thSlope) / d; // d²Qc/dI² < 0
            if (slope > 0) {
                lowA = i;
            } else {
                highA = i;
            }
            double next = i - slope / curvature;
            if (!(next > lowA && next < highA)) {
                next = 0.5 * (lowA + highA);
            }
            if (Math.abs(next - i) <= CURRENT_ACCURACY_A) {
                return next;
            }
            i = next;
        }
        return i;
    }

    /**
     * A point on the capacity peak dQc/dI = 0, with the derivatives there that seed the next solve.
     *
     * @param currentA         I at the peak, A
     * @param coldSideK        Tc, K
     * @param heatW            Qc at the peak, W
     * @param sensitivityWPerK B = ∂Qc/∂Tc, W/K (the slope of the peak value against Tc, envelope theorem)
     * @param crossSlopeWPerAK B' = ∂²Qc/∂I∂Tc, W/(A·K)
     * @param curvatureWPerA2  Qc_II = ∂²Qc/∂I², W/A², &lt; 0
     */
    record PeakPoint(double currentA, double coldSideK, double heatW, double sensitivityWPerK,
                     double crossSlopeWPerAK, double curvatureWPerA2) {

        /** The point (I, Tc) with its heat and derivatives evaluated there (the fallbacks' end point). */
        static PeakPoint at(double s, double r, double k, double tamb, double rh, double i, double tc) {
            double perD = 1 / (1 + rh * k - rh * s * i);
            double th = (tamb + rh * (0.5 * r * i * i + k * tc)) * perD;
            double thSlope = rh * (r * i + s * th) * perD;
            double ratio = rh * k * perD;
            return new PeakPoint(i, tc, s * i * tc - 0.5 * r * i * i - k * (th - tc), s * i + k * (1 - ratio),
                    s * (1 - ratio * ratio), -r - k * rh * (r + 2 * s * thSlope) * perD);
        }
    }

    /**
     * Most heat removable with the object held at {@code setPointK}: the root Q of
     * Qpk(Tobj − Q·Rint,c) = Q, by 2-D Newton on the peak from (seedA, seedK). A seed extrapolated
     * far from the solved point can leave the domain; then the 2-D Newton starts again from the
     * bracketed peak at the cold face Tobj − startW·Rint,c. If that fails too, Newton in Q with slope
     * −(1 + Rint,c·∂Qc/∂Tc) from {@code startW}; Qpk is convex in Tc (a maximum of affine functions),
     * so from a start with Qpk(…) ≥ Q the iterates rise monotonically.
     */
    static PeakPoint capacityAtObject(double s, double r, double k, double setPointK, double rc, double tamb,
                                      double rh, double startW, double seedA, double seedK) {
        // Tc + Rint,c·Qc(I, Tc) = Tobj on the peak dQc/dI = 0
        PeakPoint peak = peakOnLine(s, r, k, tamb, rh, 1, rc, setPointK, seedA, seedK);
        if (peak != null) {
            return peak;
        }
        double startK = setPointK - startW * rc;
        peak = peakOnLine(s, r, k, tamb, rh, 1, rc, setPointK, peakCurrentA(s, r, k, startK, tamb, rh, seedA), startK);
        if (peak != null) {
            return peak;
        }
        double q = startW;
        double peakA = seedA;
        for (int n = 0; n < MAX_ITERATIONS; n++) {
            double tc = setPointK - q * rc;
            peakA = peakCurrentA(s, r, k, tc, tamb, rh, peakA);
            double surplusW = coldHeatW(s, r, k, tc, tamb, rh, peakA) - q;
            double slope = 1 + rc * coldSideSensitivityWPerK(s, k, rh, peakA);
            double step = surplusW / (slope > 0 ? slope : 1);
            q += step;
            if (Math.abs(step) <= HEAT_ACCURACY_W) {
                break;
            }
        }
        return PeakPoint.at(s, r, k, tamb, rh, peakA, setPointK - q * rc);
    }

    /**
     * Lowest cold face, K, at which the load is still removed with the current held at
     * {@code limitA}, when that limit binds: Qc = a + B·Tc is affine in Tc at fixed I, so the cold face
     * at which the limit current pumps exactly the load is a closed form from the solved (feasible)
     * {@code startK}; the limit binds there when the peak lies at or beyond it (dQc/dI ≥ 0). NaN when
     * it does not bind (or there is no limit, or the limit is at or beyond the runaway current).
     * Independent of the capacity, so it is computed before that iteration and overlaps with it.
     */
    private static double coldSideAtCurrentLimitK(double s, double r, double k, double tamb, double rh, double loadW,
                                                  double limitA, double startK) {
        double dAtLimit = 1 + rh * k - rh * s * limitA;
        if (!(limitA < Double.POSITIVE_INFINITY && dAtLimit > 0)) { // d > 0: the limit is below the runaway current
            return Double.NaN;
        }
        double perD = 1 / dAtLimit; // every term at the limit current shares 1/d
        double sensitivity = s * limitA + k * (1 - rh * s * limitA) * perD;
        double startHotK = (tamb + rh * (0.5 * r * limitA * limitA + k * startK)) * perD;
        double startW = s * limitA * startK - 0.5 * r * limitA * limitA - k * (startHotK - startK);
        double atLimitK = startK + (loadW - startW) / sensitivity;
        double hotK = (tamb + rh * (0.5 * r * limitA * limitA + k * atLimitK)) * perD;
        double slope = s * atLimitK - r * limitA - k * rh * (r * limitA + s * hotK) * perD;
        return atLimitK > 0 && slope >= 0 ? atLimitK : Double.NaN;
    }

    /**
     * Lowest cold face, K, at which the load is still removed with I ≤ limitA when the limit does not
     * bind (see {@link #coldSideAtCurrentLimitK}): root of Qc(min(I_pk(Tc), limit), Tc) = Q, a
     * capacity convex and increasing in Tc. The peak on the line Qc = Q, by 2-D Newton from a
     * second-order step along the peak from {@code capacity}, or, if that fails, Newton in Tc from the
     * solved (feasible) {@code startK}, which descends monotonically to the root.
     */
    static double lowestColdSideK(double s, double r, double k, double tamb, double rh, double loadW, double limitA,
                                  double startK, PeakPoint capacity) {
        // Along the peak Qpk(Tc + δ) ≈ Qpk + B·δ + ½G·δ², G = B'²/(−Qc_II) (envelope theorem and
        // dI_pk/dTc = −B'/Qc_II): its root nearest δ = 0 and the matching current start the Newton.
        double b = capacity.sensitivityWPerK();
        double g = capacity.crossSlopeWPerAK() * capacity.crossSlopeWPerAK() / -capacity.curvatureWPerA2();
        double gapW = capacity.heatW() - loadW;
        double discriminant = Math.max(0.0, b * b - 2 * g * gapW); // clipped: a cruder seed, not a wrong one
        double deltaK = -2 * gapW / (b + Math.sqrt(discriminant));
        double seedA = capacity.currentA() - capacity.crossSlopeWPerAK() / capacity.curvatureWPerA2() * deltaK;
        PeakPoint peak = peakOnLine(s, r, k, tamb, rh, 0, 1, loadW, seedA, capacity.coldSideK() + deltaK);
        if (peak != null) {
            return peak.coldSideK();
        }
        double tc = startK;
        double peakA = capacity.currentA();
        for (int n = 0; n < MAX_ITERATIONS; n++) {
            peakA = peakCurrentA(s, r, k, tc, tamb, rh, peakA);
            double i = Math.min(peakA, limitA);
            double surplusW = coldHeatW(s, r, k, tc, tamb, rh, i) - loadW;
            double slope = coldSideSensitivityWPerK(s, k, rh, i);
            if (!(slope > 0)) {
                return tc;
            }
            double step = surplusW / slope;
            tc -= step;
            if (Math.abs(step) <= TEMPERATURE_ACCURACY_K) {
                break;
            }
        }
        return tc;
    }

    /**
     * The capacity peak on a line in (Tc, Qc): solves α·Tc + β·Qc(I, Tc) = γ together with
     * dQc/dI = 0 by 2-D Newton in (I, Tc) with the analytic Jacobian
     * [[β·Qc_I, α + β·B], [Qc_II, B']], where B = ∂Qc/∂Tc and B' = S(1 − (Rh·K/d)²). Quadratic from the
     * nearby start the callers give. Returns the peak point, or null when an iterate leaves the
     * physical domain (I &lt; 0, Tc ≤ 0, beyond runaway) or it does not settle, so that the caller falls
     * back to its nested bracketed iteration. Each step waits on two divisions: 1/d, then the two by det.
     */
    private static PeakPoint peakOnLine(double s, double r, double k, double tamb, double rh, double alpha,
                                        double beta, double gamma, double i, double tc) {
        double previousA = Double.NaN;
        double previousK = Double.NaN;
        for (int n = 0; n < NEWTON_2D_ITERATIONS; n++) {
            double d = 1 + rh * k - rh * s * i;
            if (!(d > 0 && tc > 0 && i >= 0)) {
                return null;
            }
            double perD = 1 / d;
            double rhPerD = rh * perD;          // formed beside Th, so fewer products wait on Th and Th'
            double th = (tamb + rh * (0.5 * r * i * i + k * tc)) * perD;
            double thSlope = rhPerD * (r * i + s * th);
            double qc = s * i * tc - 0.5 * r * i * i - k * (th - tc);
            double slope = s * tc - r * i - k * thSlope;                     // Qc_I
            double curvature = -r - k * rhPerD * (r + 2 * s * thSlope);      // Qc_II
            double ratio = k * rhPerD;
            double sensitivity = s * i + k * (1 - ratio);                    // B = ∂Qc/∂Tc
            double crossSlope = s * (1 - ratio * ratio);                     // B' = ∂Qc_I/∂Tc
            double f1 = alpha * tc + beta * qc - gamma;
            double j11 = beta * slope;
            double j12 = alpha + beta * sensitivity;
            double det = j11 * crossSlope - j12 * curvature;
            if (!(det != 0)) {
                return null;
            }
            double stepA = (-f1 * crossSlope + slope * j12) / det; // two divisions side by side are as
            double stepK = (-slope * j11 + f1 * curvature) / det;  // fast as one, and save a product
            i += stepA;
            tc += stepK;
            boolean small = Math.abs(stepA) <= CURRENT_ACCURACY_A && Math.abs(stepK) <= TEMPERATURE_ACCURACY_K;
            if (small || settled(stepA, previousA, CURRENT_ACCURACY_A)
                    && settled(stepK, previousK, TEMPERATURE_ACCURACY_K)) {
                if (!(i >= 0 && tc > 0)) {
                    return null;
                }
                // Qc at the new point by its second-order Taylor polynomial (∂²Qc/∂Tc² = 0, Qc is affine in
                // Tc): the neglected third-order terms are far below the accuracy for steps that small,
                // and a second evaluation of Th is saved.
                double heatW = qc + slope * stepA + sensitivity * stepK
                        + 0.5 * curvature * stepA * stepA + crossSlope * stepA * stepK;
                return new PeakPoint(i, tc, heatW, sensitivity, crossSlope, curvature);
            }
            previousA = stepA;
            previousK = stepK;
        }
        return null;
    }

    /**
     * Whether the error left after a Newton step Δn is within {@code accuracy}. While the iteration
     * contracts, θ = |Δn|/|Δn−1| &lt; 1, the rest of the steps sum to at most θ/(1 − θ)·|Δn| (the
     * stopping rule of E. Hairer &amp; G. Wanner, Solving Ordinary Differential Equations II, 1996,
     * sec. IV.8, from memory); Newton contracts faster as it converges, so this overestimates. Written
     * without division: |Δn|² ≤ accuracy·(|Δn−1| − |Δn|). False on the first step (Δn−1 is NaN).
     */
    private static boolean settled(double step, double previousStep, double accuracy) {
        return step * step <= accuracy * (Math.abs(previousStep) - Math.abs(step));
    }

    private static double fixedCurrentDeterminant(double s, double k, double rh, double i) {
        return k + s * i - rh * s * s * i * i; // (S·I + K)(1 + Rh·K − Rh·S·I) − Rh·K², expanded
    }

    /** Positive root of K + S·I − Rh·S²·I² = 0, A; +∞ for an ideal sink. */
    private static double fixedCurrentRunawayA(double s, double k, double rh) {
        return rh > 0 ? (1 + Math.sqrt(1 + 4 * rh * k)) / (2 * rh * s) : Double.POSITIVE_INFINITY;
    }

    /** {Tc, Th} from the fixed-current 2x2 system by Cramer's rule. */
    private static double[] fixedCurrentJunctionsK(double s, double r, double k, CoolingCase c, double i, double det) {
        double rh = c.hotPathKPerW();
        double a11 = s * i + k;
        double a12 = -k;
        double a21 = -rh * k;
        double a22 = 1 + rh * k - rh * s * i;
        double b1 = c.heatLoadW() + 0.5 * r * i * i;
        double b2 = c.ambientK() + 0.5 * rh * r * i * i;
        return new double[] {(b1 * a22 - a12 * b2) / det, (a11 * b2 - a21 * b1) / det};
    }

    /**
     * An infeasible point with the capacity at the case's object temperature filled in (the most heat that can be
     * removed there with this heat sink, and its current), so that a script sees how far off the design is.
     */
    private static OperatingPoint withCapacity(OperatingPoint point, ModuleParameters module, CoolingCase c) {
        if (point instanceof Infeasible i && Double.isNaN(i.maxHeatLoadW())) {
            PeakPoint capacity = capacityAtObject(module, c);
            return new Infeasible(i.reason(), i.detail(), capacity.heatW(), capacity.currentA());
        }
        return point;
    }

    /**
     * Most heat removable with the object held at the case's temperature, from no solved point: the search starts
     * at the peak with the cold face at the object temperature (zero load through the cold interface), or at
     * that peak's heat when it is negative, so that Qpk(Tobj − Q·Rint,c) ≥ Q holds at the start
     * (see {@link #capacityAtObject(double, double, double, double, double, double, double, double, double, double)}).
     */
    static PeakPoint capacityAtObject(ModuleParameters module, CoolingCase c) {
        double s = module.seebeckVPerK();
        double r = module.resistanceOhm();
        double k = module.conductanceWPerK();
        double setPointK = c.setPointK();
        double rc = c.coldInterfaceKPerW();
        double tamb = c.ambientK();
        double rh = c.hotPathKPerW();
        double peakA = peakCurrentA(s, r, k, setPointK, tamb, rh, Double.NaN);
        double startW = Math.min(0.0, coldHeatW(s, r, k, setPointK, tamb, rh, peakA));
        return capacityAtObject(s, r, k, setPointK, rc, tamb, rh, startW, peakA, setPointK - startW * rc);
    }

    /**
     * The first limit the point breaks, or null: rated Imax, supply current, supply voltage, then the hot face
     * (the module's stated maximum, or 250 °C when it states none: beyond that a point is of no physical use,
     * whatever the equations give). Shared with {@link DetailedSolver}.
     */
    static Infeasible limitViolation(DriveLimits limits, double currentA, double voltageV, double hotK) {
        if (limits.hasRatedImax() && currentA > limits.ratedImaxA()) {
            return new Infeasible(Reason.CURRENT_ABOVE_IMAX,
                    format("needs %.2f A, above the rated Imax of %.2f A", currentA, limits.ratedImaxA()));
        }
        if (!Double.isNaN(limits.supplyMaxA()) && currentA > limits.supplyMaxA()) {
            return new Infeasible(Reason.SUPPLY_CURRENT_EXCEEDED,
                    format("needs %.2f A, above the supply's %.2f A", currentA, limits.supplyMaxA()));
        }
        if (!Double.isNaN(limits.supplyMaxV()) && voltageV > limits.supplyMaxV()) {
            return new Infeasible(Reason.SUPPLY_VOLTAGE_EXCEEDED, format(
                    "needs %.2f V at %.2f A, above the supply's %.2f V", voltageV, currentA, limits.supplyMaxV()));
        }
        if (!(hotK <= limits.hotFaceLimitK())) {
            boolean stated = !Double.isNaN(limits.maxHotSideK());
            return new Infeasible(stated ? Reason.HOT_SIDE_ABOVE_LIMIT : Reason.HOT_SIDE_BEYOND_USE, format(
                    "at %.2f A the hot face would reach %.1f °C, above %s of %.1f °C: use a better heat sink, less"
                            + " current, or a larger module", currentA, Units.celsiusFromKelvin(hotK),
                    stated ? "the module's stated maximum" : "the 250 °C this tool allows for a module that states no"
                            + " maximum (solder and ceramics give out before; common practice)",
                    Units.celsiusFromKelvin(limits.hotFaceLimitK())));
        }
        return null;
    }

    private static Infeasible noCurrentRemovesLoad(double s, double r, double k, CoolingCase c, double coldK) {
        double rh = c.hotPathKPerW();
        double ambientK = c.ambientK();
        double peakA = peakCurrentA(s, r, k, coldK, ambientK, rh, Double.NaN);
        double peakW = coldHeatW(s, r, k, coldK, ambientK, rh, peakA);
        if (peakW < 0) {
            return new Infeasible(Reason.DELTA_T_BEYOND_REACH, format(
                    "cannot hold the cold face at %.2f K (%.2f °C) against %.2f K ambient with a %.3f K/W hot path"
                            + " even with no load: the best it does there is %.2f W at %.2f A",
                    coldK, Units.celsiusFromKelvin(coldK), ambientK, rh, peakW, peakA));
        }
        double startW = Math.min(c.heatLoadW(), peakW);
        PeakPoint atObject = capacityAtObject(s, r, k, c.setPointK(), c.coldInterfaceKPerW(), ambientK, rh, startW,
                peakA, c.setPointK() - startW * c.coldInterfaceKPerW());
        return new Infeasible(Reason.LOAD_ABOVE_CAPACITY, format(
                "needs %.2f W of cooling at a cold face of %.2f K; with this heat sink the peak there is %.2f W"
                        + " at %.2f A, and at most %.2f W can be removed while holding the object at %.2f K (%.2f °C)",
                c.heatLoadW(), coldK, peakW, peakA, atObject.heatW(), c.setPointK(),
                Units.celsiusFromKelvin(c.setPointK())), atObject.heatW(), atObject.currentA());
    }

    /**
     * The full answer at a solved point. {@code fixedDrive} says the current was given (or followed from a given
     * voltage) rather than solved for the load at the set-point; only then can the point be over-driven.
     */
    private static Solved complete(ModuleArray array, ModuleParameters module, CoolingCase c, DriveLimits limits,
                                   double currentA, double voltageV, double coldK, double hotK, double setPointK,
                                   boolean fixedDrive) {
        double s = module.seebeckVPerK();
        double r = module.resistanceOhm();
        double k = module.conductanceWPerK();
        double rh = c.hotPathKPerW();
        double rc = c.coldInterfaceKPerW();
        double ambientK = c.ambientK();
        double loadW = c.heatLoadW();
        double powerW = currentA * voltageV;
        double rejectedW = loadW + powerW;
        double cop = powerW > 0 ? loadW / powerW : Double.POSITIVE_INFINITY;
        // Everything that does not wait for the capacity and margin iterations comes first: its
        // divisions and square roots then overlap with those latency-bound iterations in the core.
        double perD = 1 / (1 + rh * k - rh * s * currentA);
        double thSlope = rh * (r * currentA + s * hotK) * perD;          // Th'
        double slope = s * coldK - r * currentA - k * thSlope;           // Qc' = dQc/dI at this cold face
        double dewPointK = dewPointK(c);
        double frostPointK = frostPointK(c, dewPointK);
        List<Warning> warnings = warnings(module, limits, currentA, voltageV, coldK, hotK, ambientK, dewPointK,
                frostPointK);
        if (fixedDrive) {
            warnings = overDriveWarnings(warnings, currentA, slope, setPointK, ambientK);
        }
        double fractionOfImax = limits.hasRatedImax() ? currentA / limits.ratedImaxA() : Double.NaN;
        double copOptimalA = module.copOptimalCurrentA(coldK, hotK);
        double maxCop = module.maxCop(coldK, hotK);
        ModuleShare perModule = array.share(currentA, voltageV, loadW, rejectedW, powerW);

        // Start of the capacity peak: Qc' is concave in I (Qc‴ ≤ 0, see currentForLoadA), and the root
        // nearest zero of its second-order Taylor polynomial at the solved current is a near-peak
        // current. Th'' and Th‴ = 3·Rh·S·Th''/d follow from Th' without another division.
        double thCurvature = rh * (r + 2 * s * thSlope) * perD;          // Th''
        double curvature = -r - k * thCurvature;                         // Qc'' < 0
        double thirdDerivative = -3 * k * rh * s * thCurvature * perD;   // Qc‴ ≤ 0
        // The discriminant is ≥ Qc''² left of the peak (Qc' > 0, Qc‴ ≤ 0); only over-driven fixed-current
        // points can make it negative, and clipping it at zero there just gives a cruder seed.
        double discriminant = Math.max(0.0, curvature * curvature - 2 * thirdDerivative * slope);
        double towardPeakA = -2 * slope / (curvature - Math.sqrt(discriminant));
        double seedA = Math.max(0.0, currentA + towardPeakA);
        double limitA = limits.currentLimitA();
        double atLimitK = coldSideAtCurrentLimitK(s, r, k, ambientK, rh, loadW, limitA, coldK);
        PeakPoint atObject = capacityAtObject(s, r, k, setPointK, rc, ambientK, rh, loadW, seedA, coldK);
        double lowestColdK = Double.isNaN(atLimitK)
                ? lowestColdSideK(s, r, k, ambientK, rh, loadW, limitA, coldK, atObject)
                : atLimitK;
        double marginK = setPointK - (lowestColdK + loadW * rc);
        return new Solved(currentA, voltageV, powerW, cop, setPointK, coldK, hotK, rejectedW, loadW, fractionOfImax,
                atObject.heatW(), atObject.currentA(), marginK, copOptimalA, maxCop, dewPointK, frostPointK, warnings,
                perModule);
    }

    /** Dew point of the ambient air, K; NaN without a humidity or outside the model's air range. */
    static double dewPointK(CoolingCase c) {
        if (!c.hasRelativeHumidity() || !withinDewPointModel(c.ambientK())) {
            return Double.NaN;
        }
        return DEW_POINT.dewPointK(c.ambientK(), c.relativeHumidity());
    }

    /** Frost point of the ambient air, K, when its dew point is below 0 °C; else NaN. */
    static double frostPointK(CoolingCase c, double dewPointK) {
        return dewPointK < FREEZING_K ? DEW_POINT.frostPointK(c.ambientK(), c.relativeHumidity()) : Double.NaN;
    }

    private static boolean withinDewPointModel(double airK) {
        double airC = Units.celsiusFromKelvin(airK);
        return airC >= DEW_POINT.lowestAirC() && airC <= DEW_POINT.highestAirC();
    }

    /** The risks at a solved point (thresholds common practice, see the constants); empty when none. */
    static List<Warning> warnings(ModuleParameters module, DriveLimits limits, double currentA, double voltageV,
                                          double coldK, double hotK, double ambientK, double dewPointK,
                                          double frostPointK) {
        List<Warning> warnings = null;
        if (limits.hasRatedImax() && currentA > NEAR_IMAX_FRACTION * limits.ratedImaxA()) {
            warnings = add(warnings, Warning.Code.NEAR_IMAX, format(
                    "the current %.2f A is %.0f %% of the rated Imax %.2f A (above %.0f %% leaves little reserve)",
                    currentA, 100 * currentA / limits.ratedImaxA(), limits.ratedImaxA(), 100 * NEAR_IMAX_FRACTION));
        }
        double dtMaxK = module.dtmaxK(hotK);
        if (hotK - coldK > NEAR_DTMAX_FRACTION * dtMaxK) {
            warnings = add(warnings, Warning.Code.NEAR_DTMAX, format(
                    "the junction difference %.1f K is %.0f %% of ΔTmax %.1f K at this hot side (above %.0f %%"
                            + " the COP collapses)",
                    hotK - coldK, 100 * (hotK - coldK) / dtMaxK, dtMaxK, 100 * NEAR_DTMAX_FRACTION));
        }
        if (!Double.isNaN(dewPointK)) {
            warnings = moistureWarning(warnings, coldK, ambientK, dewPointK, frostPointK);
        }
        if (SafetyLimits.isShockHazard(voltageV)) {
            List<Warning> list = warnings == null ? new ArrayList<>(1) : warnings;
            list.add(SafetyLimits.shockHazard("the terminal voltage", voltageV));
            warnings = list;
        }
        return warnings == null ? List.of() : warnings;
    }

    /**
     * Water on the cold face: below 0 °C dew point the frost point governs (ice forms there first, and melts
     * to water when the cooler stops), else the dew point; a warning within {@link #DEW_POINT_MARGIN_K} of it.
     * Outside the Magnus fit (air below −40 °C or above 50 °C) the value is extrapolated, the margin doubled,
     * and the sentence says so.
     */
    private static List<Warning> moistureWarning(List<Warning> warnings, double coldK, double ambientK,
                                                 double dewPointK, double frostPointK) {
        double airC = Units.celsiusFromKelvin(ambientK);
        boolean extrapolated = !DEW_POINT.withinFit(airC);
        double marginK = extrapolated ? 2 * DEW_POINT_MARGIN_K : DEW_POINT_MARGIN_K;
        boolean frost = !Double.isNaN(frostPointK);
        double pointK = frost ? frostPointK : dewPointK;
        if (!(coldK < pointK + marginK)) {
            return warnings;
        }
        String point = frost ? "frost point" : "dew point";
        String note = extrapolated ? format(" (the air at %.1f °C is outside the −40 to 50 °C range of the Magnus fit,"
                + " so the %s is extrapolated and the margin doubled to %.0f K)", airC, point, marginK) : "";
        String sentence;
        if (frost) {
            sentence = coldK < frostPointK
                    ? format("the cold face at %.1f °C is below the ambient frost point %.1f °C (dew point %.1f °C):"
                            + " ice will build on it and melt to water when the cooler stops; seal, insulate or purge"
                            + " the cold side, or raise the set-point%s", Units.celsiusFromKelvin(coldK),
                            Units.celsiusFromKelvin(frostPointK), Units.celsiusFromKelvin(dewPointK), note)
                    : format("the cold face at %.1f °C is less than %.0f K above the ambient frost point %.1f °C:"
                            + " seal or purge the cold side%s", Units.celsiusFromKelvin(coldK), marginK,
                            Units.celsiusFromKelvin(frostPointK), note);
        } else {
            sentence = coldK < dewPointK
                    ? format("the cold face at %.1f °C is below the ambient dew point %.1f °C: water will condense on "
                            + "it; seal, insulate or purge the cold side, or raise the set-point%s",
                            Units.celsiusFromKelvin(coldK), Units.celsiusFromKelvin(dewPointK), note)
                    : format("the cold face at %.1f °C is less than %.0f K above the ambient dew point %.1f °C: "
                            + "seal or purge the cold side%s", Units.celsiusFromKelvin(coldK), marginK,
                            Units.celsiusFromKelvin(dewPointK), note);
        }
        return add(warnings, frost ? Warning.Code.FROST_RISK : Warning.Code.CONDENSATION_RISK, sentence);
    }

    /**
     * At a fixed drive: over-driven when dQc/dI &lt; 0 at the point (beyond the capacity peak, more current
     * cools less: the side of the upper root that the set-point solve never returns), and the cooled
     * part warmer than the ambient.
     */
    private static List<Warning> overDriveWarnings(List<Warning> warnings, double currentA, double slopeWPerA,
                                                   double setPointK, double ambientK) {
        List<Warning> list = warnings.isEmpty() ? null : new ArrayList<>(warnings);
        if (currentA > 0 && slopeWPerA < 0) {
            list = add(list, Warning.Code.OVER_DRIVEN, format(
                    "at %.2f A the module is past its capacity peak: each extra ampere pumps %.2f W less, so less"
                            + " current would hold the part colder and draw less power", currentA, -slopeWPerA));
        }
        if (setPointK > ambientK) {
            list = add(list, Warning.Code.COOLED_PART_ABOVE_AMBIENT, format(
                    "the cooled part settles at %.1f °C, %.1f K above the %.1f °C ambient: at this drive the cooler"
                            + " does not bring it below ambient%s", Units.celsiusFromKelvin(setPointK),
                    setPointK - ambientK, Units.celsiusFromKelvin(ambientK),
                    currentA > 0 && slopeWPerA < 0 ? " and its own heat warms it" : ""));
        }
        return list == null ? List.of() : list;
    }

    private static List<Warning> add(List<Warning> warnings, Warning.Code code, String sentence) {
        List<Warning> list = warnings == null ? new ArrayList<>(2) : warnings;
        list.add(new Warning(code, sentence));
        return list;
    }

    private static String format(String pattern, Object... args) {
        return String.format(Locale.ROOT, pattern, args);
    }
}
