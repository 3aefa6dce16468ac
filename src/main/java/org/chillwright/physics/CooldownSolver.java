package org.chillwright.physics;

import java.util.ArrayList;
import java.util.List;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.exception.MaxCountExceededException;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.FixedStepHandler;
import org.apache.commons.math3.ode.sampling.StepNormalizer;
import org.apache.commons.math3.ode.sampling.StepNormalizerBounds;
import org.apache.commons.math3.ode.sampling.StepNormalizerMode;

/**
 * Cool-down of a part from ambient at a constant current, on the network of a {@link CoolingCase}: part (heat
 * capacity C, an active load and a leak G to ambient) —cold interface— module —hot interface— sink base —sink—
 * ambient. Lumped-capacitance method (F.P. Incropera et al., Fundamentals of Heat and Mass Transfer, 7th ed.
 * 2011, sec. 5.1, Biot number &lt; 0.1); the module itself is quasi-steady (its own heat capacity neglected,
 * the lumped-capacitance method, Incropera & DeWitt ch. 5) with the ideal equations of the Ioffe 1957 / Goldsmid 2016 ideal equations. Everything starts at ambient.
 *
 * <p>At a fixed current the module's faces follow the part (and the sink base) linearly: the two face balances
 * (1 + Rc(S·I + K))·Tc − Rc·K·Th = T + ½Rc·R·I² and −Rh·K·Tc + (1 + Rh(K − S·I))·Th = Tb + ½Rh·R·I² are linear
 * (derived here from the Ioffe 1957 / Goldsmid 2016 ideal equations; the heat-sink network derived here). So:
 * <ul>
 * <li><b>One node</b> (no sink heat capacity, or no sink resistance): Qc = a + b·T, and
 * C·dT/dt = Qactive + G(Tamb − T) − Qc is linear in T, solved exactly: T(t) = T∞ + (T0 − T∞)·exp(−t/τ),
 * τ = C/(G + b), T∞ = (Qactive + G·Tamb − a)/(G + b). With no interfaces and the hot face held at ambient this
 * is the closed form of the lumped-capacitance method, Incropera & DeWitt ch. 5 and {@link Cooldown} (case S16).</li>
 * <li><b>Two nodes</b> (a heat sink of heat capacity Cs behind a sink resistance): the sink base Tb gets
 * Cs·dTb/dt = Qh − (Tb − Tamb)/Rsink. The system is integrated with Commons Math's
 * {@link DormandPrince853Integrator} (an adaptive explicit Runge–Kutta pair of order 8: E. Hairer, S.P. Nørsett
 * &amp; G. Wanner, Solving Ordinary Differential Equations I, 2nd ed. 1993, sec. II.10, from memory) with an event
 * for the first time the part reaches the set-point band; the time constant is the slowest eigenvalue's.
 * The integrator rather than the matrix exponential, so that a current that changes with time or
 * temperature-dependent parameters can be added without a new method. A sink node far faster than the part
 * (stiff: more than {@value #STIFFNESS_LIMIT} times, or more than {@value #MAX_EVALUATIONS} evaluations) would
 * hold an explicit integrator to tiny steps; there the exact exponential of the linear 2x2 system is used.</li>
 * </ul>
 */
public final class CooldownSolver {

    /** Points of a cool-down curve (100 steps). */
    static final int CURVE_POINTS = 101;
    /** Without a given end, the curve runs this many time constants, or 1.2 times to the set-point if longer. */
    static final double CURVE_TIME_CONSTANTS = 5;
    /** The set-point is looked for up to this many slowest time constants (e^−40: any band is reached by then). */
    static final double SEARCH_TIME_CONSTANTS = 40;
    /** Absolute integration tolerance on temperatures, K: far below the shown 0.01 K. */
    static final double TEMPERATURE_TOLERANCE_K = 1e-9;
    /** Relative integration tolerance. */
    static final double RELATIVE_TOLERANCE = 1e-11;
    /** The set-point event is located to this fraction of the slowest time constant. */
    static final double EVENT_ACCURACY_TIME_CONSTANTS = 1e-10;
    /**
     * Above this ratio of the fastest to the slowest decay rate an explicit integrator's steps are held to the fast
     * mode (its stability region) for the whole slow cool-down; the exact solution is used instead.
     */
    static final double STIFFNESS_LIMIT = 1e3;
    /** Right-hand-side evaluations allowed to the integrator before the exact solution takes over. */
    static final int MAX_EVALUATIONS = 200_000;
    /** Scan points for the set-point crossing of the exact solution, over the search horizon. */
    static final int CROSSING_SCAN_POINTS = 4000;
    /** Evaluation cap of the Brent searches for the crossing. */
    static final int MAX_BRENT_EVALUATIONS = 200;

    private final OperatingPointSolver solver = new OperatingPointSolver();

    /**
     * The cool-down at the design current (the steady operating point of the case) and at the most current the
     * limits allow (rated Imax and supply current), each from ambient.
     *
     * @param array       the modules and their wiring
     * @param coolingCase the case: set-point, ambient, load and network
     * @param limits      limits at the terminals
     * @param setup       heat capacities, leak and settle band
     */
    public CooldownAnalysis analyse(ModuleArray array, CoolingCase coolingCase, DriveLimits limits,
                                    CooldownSetup setup) {
        require(array, coolingCase, setup);
        if (limits == null) {
            throw new InvalidQuantityException("limits", Double.NaN, "limits must be given, was null");
        }
        OperatingPoint design = solver.solve(array, coolingCase, limits);
        CooldownRun atDesign = design instanceof Solved s ? run(array, coolingCase, setup, s.currentA(), Double.NaN)
                : null;
        double limitA = limits.currentLimitA();
        CooldownRun atLimit = limitA < Double.POSITIVE_INFINITY ? run(array, coolingCase, setup, limitA, Double.NaN)
                : null;
        return new CooldownAnalysis(design, atDesign, atLimit);
    }

    /**
     * The cool-down from ambient at one constant current.
     *
     * @param array       the modules and their wiring
     * @param coolingCase the case (its set-point is the target, its load less the leak the active load)
     * @param setup       heat capacities, leak and settle band
     * @param currentA    constant terminal current, A, ≥ 0
     * @param curveEndS   end of the curve, s, &gt; 0; NaN to choose it (5 time constants, or 1.2 times to the
     *                    set-point if longer)
     */
    public CooldownRun run(ModuleArray array, CoolingCase coolingCase, CooldownSetup setup, double currentA,
                           double curveEndS) {
        require(array, coolingCase, setup);
        Check.nonNegative("currentA", currentA);
        if (!Double.isNaN(curveEndS)) {
            Check.positive("curveEndS", curveEndS);
        }
        var network = new Network(array.equivalent(), coolingCase, setup, currentA);
        if (!network.steady()) {
            return new CooldownRun(currentA, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, List.of(),
                    network.twoNodes ? CooldownRun.Method.DORMAND_PRINCE_853 : CooldownRun.Method.CLOSED_FORM);
        }
        return network.twoNodes ? network.twoNodes(curveEndS) : network.closedForm(curveEndS);
    }

    private static void require(ModuleArray array, CoolingCase coolingCase, CooldownSetup setup) {
        if (array == null || coolingCase == null || setup == null) {
            String field = array == null ? "array" : coolingCase == null ? "coolingCase" : "setup";
            throw new InvalidQuantityException(field, Double.NaN, field + " must be given, was null");
        }
    }

    /** The linear network at one current: the face temperatures and heats as affine functions of the nodes. */
    static final class Network {
        final ModuleParameters module;
        final double i;
        final double rc;
        final double tamb;
        final double activeW;
        final double leakWPerK;
        final double partJPerK;
        final double sinkJPerK;
        final double sinkKPerW;
        final double targetK;
        final boolean twoNodes;
        /** Resistance from the hot face to the hot node: the whole hot path with one node, the interface with two. */
        final double hotKPerW;
        /** Qc = qc[0] + qc[1]·T + qc[2]·Tb and the same for Qh, Tc and Th (Tb = Tamb with one node). */
        final double[] qc = new double[3];
        final double[] qh = new double[3];
        final double[] tc = new double[3];
        final double[] th = new double[3];
        final double determinant;

        Network(ModuleParameters module, CoolingCase c, CooldownSetup setup, double currentA) {
            this.module = module;
            this.i = currentA;
            rc = c.coldInterfaceKPerW();
            tamb = c.ambientK();
            activeW = setup.activeLoadW(c);
            leakWPerK = setup.leakConductanceWPerK();
            partJPerK = setup.heatCapacityJPerK();
            sinkJPerK = setup.sinkHeatCapacityJPerK();
            sinkKPerW = c.sinkResistanceKPerW();
            targetK = c.setPointK() + setup.settleBandK();
            twoNodes = sinkJPerK > 0 && sinkKPerW > 0;
            hotKPerW = twoNodes ? c.hotInterfaceKPerW() : c.hotPathKPerW();
            double s = module.seebeckVPerK();
            double k = module.conductanceWPerK();
            determinant = (1 + rc * (s * i + k)) * (1 + hotKPerW * (k - s * i)) - rc * hotKPerW * k * k;
            if (determinant > 0) {
                double[] origin = faces(0, 0);
                double[] perPart = faces(1, 0);
                double[] perSink = faces(0, 1);
                for (int n = 0; n < 4; n++) {
                    double[] target = n == 0 ? tc : n == 1 ? th : n == 2 ? qc : qh;
                    target[0] = origin[n];
                    target[1] = perPart[n] - origin[n];
                    target[2] = perSink[n] - origin[n];
                }
            }
        }

        /** {Tc, Th, Qc, Qh} with the part at {@code partK} and the hot node at {@code hotNodeK} (Cramer's rule). */
        private double[] faces(double partK, double hotNodeK) {
            double s = module.seebeckVPerK();
            double r = module.resistanceOhm();
            double k = module.conductanceWPerK();
            double joule = 0.5 * r * i * i;
            double b1 = partK + rc * joule;
            double b2 = hotNodeK + hotKPerW * joule;
            double a11 = 1 + rc * (s * i + k);
            double a12 = -rc * k;
            double a21 = -hotKPerW * k;
            double a22 = 1 + hotKPerW * (k - s * i);
            double coldK = (b1 * a22 - a12 * b2) / determinant;
            double hotK = (a11 * b2 - a21 * b1) / determinant;
            return new double[] {coldK, hotK, module.coldSideHeatW(i, coldK, hotK), module.hotSideHeatW(i, coldK, hotK)};
        }

        private static double at(double[] affine, double partK, double sinkK) {
            return affine[0] + affine[1] * partK + affine[2] * sinkK;
        }

        /** dT/dt = a[0] + a[1]·T + a[2]·Tb for the part, and b the same for the sink base. */
        double[] partRate() {
            return new double[] {(activeW + leakWPerK * tamb - qc[0]) / partJPerK, (-leakWPerK - qc[1]) / partJPerK,
                    -qc[2] / partJPerK};
        }

        double[] sinkRate() {
            return new double[] {(qh[0] + tamb / sinkKPerW) / sinkJPerK, qh[1] / sinkJPerK,
                    (qh[2] - 1 / sinkKPerW) / sinkJPerK};
        }

        /** Whether a steady state exists: the faces' system is regular and every mode decays. */
        boolean steady() {
            if (!(determinant > 0)) {
                return false;
            }
            if (!twoNodes) {
                return leakWPerK + qc[1] > 0;
            }
            double[] a = partRate();
            double[] b = sinkRate();
            double trace = a[1] + b[2];
            double det = a[1] * b[2] - a[2] * b[1];
            return trace < 0 && det > 0;
        }

        CooldownRun closedForm(double curveEndS) {
            double pullWPerK = leakWPerK + qc[1];                         // G + b
            double finalK = (activeW + leakWPerK * tamb - at(qc, 0, tamb)) / pullWPerK; // a = Qc at T = 0
            double tauS = partJPerK / pullWPerK;
            double reachS = tamb <= targetK ? 0.0
                    : finalK >= targetK ? Double.NaN : tauS * Math.log((tamb - finalK) / (targetK - finalK));
            double endS = curveEnd(curveEndS, tauS, reachS);
            List<CooldownSample> curve = new ArrayList<>(CURVE_POINTS);
            for (int n = 0; n < CURVE_POINTS; n++) {
                double t = endS * n / (CURVE_POINTS - 1);
                double partK = finalK + (tamb - finalK) * Math.exp(-t / tauS);
                curve.add(new CooldownSample(t, partK, at(th, partK, tamb)));
            }
            return finish(finalK, tamb, tauS, reachS, curve, CooldownRun.Method.CLOSED_FORM);
        }

        /** The two-node cool-down: integrated, or exact when the sink node is too fast for an explicit integrator. */
        CooldownRun twoNodes(double curveEndS) {
            double[] a = partRate();
            double[] b = sinkRate();
            double trace = a[1] + b[2];
            double det = a[1] * b[2] - a[2] * b[1];
            double discriminant = trace * trace - 4 * det;
            double slowest = discriminant >= 0 ? 0.5 * (trace + Math.sqrt(discriminant)) : 0.5 * trace;
            double fastest = discriminant >= 0 ? 0.5 * (trace - Math.sqrt(discriminant)) : 0.5 * trace;
            if (fastest / slowest <= STIFFNESS_LIMIT) {
                CooldownRun run = integrated(curveEndS);
                if (run != null) {
                    return run;
                }
            }
            return exact(curveEndS);
        }

        /** {steady part, steady sink base, slowest time constant}: a + A·x = 0 by Cramer's rule, and −1/Re λ. */
        private double[] steadyAndTimeConstant(double[] a, double[] b) {
            double det = a[1] * b[2] - a[2] * b[1];
            double trace = a[1] + b[2];
            double discriminant = trace * trace - 4 * det;
            double slowest = discriminant >= 0 ? 0.5 * (trace + Math.sqrt(discriminant)) : 0.5 * trace;
            return new double[] {(-a[0] * b[2] + a[2] * b[0]) / det, (-a[1] * b[0] + b[1] * a[0]) / det,
                    -1 / slowest};
        }

        /** The two-node cool-down by Commons Math's Dormand–Prince 8(5,3); null when it needs too many steps. */
        CooldownRun integrated(double curveEndS) {
            double[] a = partRate();
            double[] b = sinkRate();
            double[] steady = steadyAndTimeConstant(a, b);
            double finalK = steady[0];
            double tauS = steady[2];
            FirstOrderDifferentialEquations equations = new FirstOrderDifferentialEquations() {
                @Override
                public int getDimension() {
                    return 2;
                }

                @Override
                public void computeDerivatives(double t, double[] y, double[] yDot) {
                    yDot[0] = a[0] + a[1] * y[0] + a[2] * y[1];
                    yDot[1] = b[0] + b[1] * y[0] + b[2] * y[1];
                }
            };
            double reachS = 0.0;
            if (tamb > targetK) {
                reachS = Double.NaN;
                if (finalK < targetK) {
                    double[] reached = {Double.NaN};
                    if (!integrate(withTargetEvent(integrator(tauS), reached, tauS), equations,
                            SEARCH_TIME_CONSTANTS * tauS)) {
                        return null;
                    }
                    reachS = reached[0];
                }
            }
            double endS = curveEnd(curveEndS, tauS, reachS);
            List<CooldownSample> curve = new ArrayList<>(CURVE_POINTS);
            double sampleS = endS / (CURVE_POINTS - 1);
            FixedStepHandler sampler = new FixedStepHandler() {
                @Override
                public void init(double t0, double[] y0, double t) {
                    // nothing to prepare
                }

                @Override
                public void handleStep(double t, double[] y, double[] yDot, boolean isLast) {
                    // the normalizer can hand a point over twice (as a bound and as a multiple, or on both sides of
                    // a step end within round-off): keep it once
                    boolean repeated = !curve.isEmpty() && t - curve.get(curve.size() - 1).timeS() < 0.5 * sampleS;
                    if (!repeated && curve.size() < CURVE_POINTS) {
                        curve.add(new CooldownSample(t, y[0], at(th, y[0], y[1])));
                    }
                }
            };
            DormandPrince853Integrator integrator = integrator(tauS);
            integrator.addStepHandler(new StepNormalizer(sampleS, sampler,
                    StepNormalizerMode.MULTIPLES, StepNormalizerBounds.BOTH));
            if (!integrate(integrator, equations, endS)) {
                return null;
            }
            return finish(finalK, steady[1], tauS, reachS, curve, CooldownRun.Method.DORMAND_PRINCE_853);
        }

        /**
         * The two-node cool-down by the exponential of its 2x2 matrix (exact for this linear system): with
         * eigenvalues λ1 ≠ λ2, e^(At) = (e^(λ1·t)(A − λ2·I) − e^(λ2·t)(A − λ1·I))/(λ1 − λ2); with a complex pair
         * m ± iq, e^(mt)(cos(qt)·I + sin(qt)/q·(A − m·I)); with a double eigenvalue, e^(mt)(I + t(A − m·I))
         * (Sylvester's formula for 2x2 matrices). The set-point crossing is bracketed on a scan of the curve and
         * found with Commons Math's Brent solver.
         */
        CooldownRun exact(double curveEndS) {
            double[] a = partRate();
            double[] b = sinkRate();
            double[] steady = steadyAndTimeConstant(a, b);
            double finalK = steady[0];
            double finalSinkK = steady[1];
            double tauS = steady[2];
            double[] start = {tamb - finalK, tamb - finalSinkK};
            java.util.function.DoubleFunction<double[]> state = t -> {
                double[] e = exponentialTimes(a[1], a[2], b[1], b[2], t, start);
                return new double[] {finalK + e[0], finalSinkK + e[1]};
            };
            double reachS = 0.0;
            if (tamb > targetK) {
                reachS = finalK >= targetK ? Double.NaN : firstCrossing(state, SEARCH_TIME_CONSTANTS * tauS);
            }
            double endS = curveEnd(curveEndS, tauS, reachS);
            List<CooldownSample> curve = new ArrayList<>(CURVE_POINTS);
            for (int n = 0; n < CURVE_POINTS; n++) {
                double t = endS * n / (CURVE_POINTS - 1);
                double[] y = state.apply(t);
                curve.add(new CooldownSample(t, y[0], at(th, y[0], y[1])));
            }
            return finish(finalK, finalSinkK, tauS, reachS, curve, CooldownRun.Method.EXACT_TWO_NODE);
        }

        /** e^(At)·v for A = [[a11, a12], [a21, a22]] (see {@link #exact}). */
        private static double[] exponentialTimes(double a11, double a12, double a21, double a22, double t,
                                                 double[] v) {
            double m = 0.5 * (a11 + a22);
            double quarterDiscriminant = 0.25 * (a11 - a22) * (a11 - a22) + a12 * a21;
            double bx = (a11 - m) * v[0] + a12 * v[1];   // (A − m·I)·v
            double by = a21 * v[0] + (a22 - m) * v[1];
            if (quarterDiscriminant > 0) {
                double q = Math.sqrt(quarterDiscriminant);
                double e1 = Math.exp((m + q) * t);
                double e2 = Math.exp((m - q) * t);
                // (e1(A − λ2 I)v − e2(A − λ1 I)v)/(2q) with A − λ I = (A − m I) − (λ − m) I
                return new double[] {(e1 * (bx + q * v[0]) - e2 * (bx - q * v[0])) / (2 * q),
                        (e1 * (by + q * v[1]) - e2 * (by - q * v[1])) / (2 * q)};
            }
            double em = Math.exp(m * t);
            if (quarterDiscriminant < 0) {
                double q = Math.sqrt(-quarterDiscriminant);
                double c = Math.cos(q * t);
                double sq = Math.sin(q * t) / q;
                return new double[] {em * (c * v[0] + sq * bx), em * (c * v[1] + sq * by)};
            }
            return new double[] {em * (v[0] + t * bx), em * (v[1] + t * by)};
        }

        /** First time the part is at the target: the first sign change on a scan of the horizon, then Brent. */
        private double firstCrossing(java.util.function.DoubleFunction<double[]> state, double horizonS) {
            double previousS = 0;
            for (int n = 1; n <= CROSSING_SCAN_POINTS; n++) {
                double t = horizonS * n / CROSSING_SCAN_POINTS;
                if (state.apply(t)[0] <= targetK) {
                    try {
                        return new BrentSolver(EVENT_ACCURACY_TIME_CONSTANTS * horizonS / SEARCH_TIME_CONSTANTS)
                                .solve(MAX_BRENT_EVALUATIONS, time -> state.apply(time)[0] - targetK, previousS, t);
                    } catch (MathIllegalStateException | MathIllegalArgumentException e) {
                        throw new IllegalStateException(String.format(java.util.Locale.ROOT,
                                "set-point crossing not found in [%.4g, %.4g] s", previousS, t), e);
                    }
                }
                previousS = t;
            }
            return Double.NaN;
        }

        /** Adds an event that records the first time the part reaches the target and stops there. */
        private DormandPrince853Integrator withTargetEvent(DormandPrince853Integrator integrator, double[] reached,
                                                           double tauS) {
            integrator.addEventHandler(new EventHandler() {
                @Override
                public void init(double t0, double[] y0, double t) {
                    // nothing to prepare
                }

                @Override
                public double g(double t, double[] y) {
                    return y[0] - targetK;
                }

                @Override
                public Action eventOccurred(double t, double[] y, boolean increasing) {
                    reached[0] = t;
                    return Action.STOP;
                }

                @Override
                public void resetState(double t, double[] y) {
                    // the state is not changed at the event
                }
            }, tauS / 20, EVENT_ACCURACY_TIME_CONSTANTS * tauS, MAX_BRENT_EVALUATIONS);
            return integrator;
        }

        private static DormandPrince853Integrator integrator(double tauS) {
            // no smallest step (the system is linear, and stiff ones go to the exact solution); steps up to a
            // time constant; at most MAX_EVALUATIONS right-hand sides
            DormandPrince853Integrator integrator = new DormandPrince853Integrator(0.0, tauS, TEMPERATURE_TOLERANCE_K,
                    RELATIVE_TOLERANCE);
            integrator.setMaxEvaluations(MAX_EVALUATIONS);
            return integrator;
        }

        /** Integrates from ambient to {@code endS}; false when the evaluation cap was reached first. */
        private boolean integrate(DormandPrince853Integrator integrator, FirstOrderDifferentialEquations equations,
                                  double endS) {
            double[] y = {tamb, tamb};
            try {
                integrator.integrate(equations, 0, y.clone(), endS, y);
                return true;
            } catch (MaxCountExceededException e) {
                return false;
            } catch (MathIllegalStateException | MathIllegalArgumentException e) {
                throw new IllegalStateException(String.format(java.util.Locale.ROOT,
                        "cool-down integration failed at %.4f A over %.1f s", i, endS), e);
            }
        }

        private static double curveEnd(double given, double tauS, double reachS) {
            if (!Double.isNaN(given)) {
                return given;
            }
            double endS = CURVE_TIME_CONSTANTS * tauS;
            return Double.isNaN(reachS) ? endS : Math.max(endS, 1.2 * reachS);
        }

        private CooldownRun finish(double finalK, double finalSinkK, double tauS, double reachS,
                                   List<CooldownSample> curve, CooldownRun.Method method) {
            double coldK = at(tc, finalK, finalSinkK);
            double hotK = at(th, finalK, finalSinkK);
            return new CooldownRun(i, finalK, hotK, module.voltageV(i, coldK, hotK), tauS, reachS, curve, method);
        }
    }
}
