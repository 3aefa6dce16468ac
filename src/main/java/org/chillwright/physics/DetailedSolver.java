package org.chillwright.physics;

import java.util.Locale;
import java.util.Optional;
import java.util.function.DoubleUnaryOperator;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.exception.NoBracketingException;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;

/**
 * The detailed (temperature-dependent, Thomson-including) model of a cooler or generator: 1-D
 * steady legs solved as a boundary-value problem, coupled to the same thermal network as the lumped
 * {@link OperatingPointSolver} (object —Rint,c— cold face | legs | hot face —Rint,h + Rsink— ambient,
 * the heat-sink network of OperatingPointSolver) and, in generator mode, to the heat-exchanger network of {@link GeneratorSolver}
 * (Ioffe 1957; Rowe (ed.), CRC Handbook of Thermoelectrics, 1995; as GeneratorSolver).
 *
 * <p><b>Method: finite differences, not shooting.</b> Each leg is a two-point boundary-value problem
 * (temperature given at both faces). It is solved by the energy-conserving box scheme of
 * {@link LegGrid}: heat flux and temperature as unknowns, eliminated to a tridiagonal system in the
 * node temperatures, Newton with the analytic Jacobian. Chosen over shooting with a Commons Math ODE
 * integrator because (1) the discrete energy balance Qh − Qc = I·V then holds to round-off by
 * construction (the cell works telescope), whereas a shooting solution balances only to the
 * integrator's tolerance; (2) with constant properties the scheme is exact on any grid, so the
 * detailed model reproduces the ideal equations identically; (3) shooting from the cold face must
 * find the unknown heat flux with the leg profile's exponential sensitivity to it at high current,
 * while the tridiagonal Newton converges in 2 to 4 steps from a straight line and in 1 to 2 from the
 * previous profile, with no step-size control, which is what makes ≤ 1 ms per design possible.
 * Second order in the cell width (measured in the tests).
 *
 * <p>The outer solves are small Newton iterations with finite-difference Jacobians started from the
 * lumped solution at the mean temperature; where one fails (for example when it would land on the
 * over-driven upper root) a bracketed Commons Math search takes over. Stateless and thread-safe: each
 * call builds its own working storage.
 */
public final class DetailedSolver {

    /** Cells per leg by default: second order, so 16 cells leave about 1e-4 relative in Qc for Bi2Te3 curves (see the tests). */
    public static final int DEFAULT_CELLS = 16;
    /** Outer Newton iterations stop once a current step is below this fraction of the current scale. */
    static final double CURRENT_ACCURACY = 1e-11;
    /** Outer Newton iterations stop once a temperature step is below this, K. */
    static final double TEMPERATURE_ACCURACY_K = 1e-8;
    /** Heat accuracy of the capacity iteration, W, relative to the scale of the load. */
    static final double HEAT_ACCURACY = 1e-10;
    static final int MAX_ITERATIONS = 60;
    static final int MAX_EVALUATIONS = 400;
    /** Forward-difference steps for the Jacobians: relative in current, absolute in temperature. */
    private static final double CURRENT_STEP = 1e-7;
    private static final double TEMPERATURE_STEP_K = 1e-5;
    /** Relative accuracy of the searches over current for a peak (flat maxima: the value is still accurate to its square). */
    private static final double PEAK_ACCURACY = 1e-9;
    /** The parabola steps towards a peak stop below this fraction of the current scale: the peak value is then accurate to about its square. */
    private static final double PEAK_STEP = 1e-6;

    private final int cells;

    /** A solver with {@link #DEFAULT_CELLS} cells per leg. */
    public DetailedSolver() {
        this(DEFAULT_CELLS);
    }

    /** @param cells cells per leg, ≥ 1 (the error falls as 1/cells²) */
    public DetailedSolver(int cells) {
        this.cells = Check.atLeastOne("cells", cells);
    }

    /**
     * The legs between fixed face temperatures at a fixed terminal current; empty when no steady
     * profile exists.
     *
     * @param currentA  terminal current, A, finite (positive pumps heat from the cold to the hot face)
     * @param coldSideK cold face, K, &gt; 0
     * @param hotSideK  hot face, K, &gt; 0
     */
    public Optional<FaceSolution> atFaces(DetailedArray array, double currentA, double coldSideK, double hotSideK) {
        Check.finite("currentA", currentA);
        Check.positive("coldSideK", coldSideK);
        Check.positive("hotSideK", hotSideK);
        CoupleModel model = model(array);
        if (!model.solve(currentA, coldSideK, hotSideK)) {
            return Optional.empty();
        }
        return Optional.of(faceSolution(model, currentA, coldSideK, hotSideK));
    }

    private static FaceSolution faceSolution(CoupleModel model, double currentA, double coldK, double hotK) {
        return new FaceSolution(currentA, coldK, hotK, model.coldHeatW, model.hotHeatW, model.voltageV,
                currentA * model.voltageV, model.lowestK, model.highestK, model.withinMaterialRange());
    }

    private CoupleModel model(DetailedArray array) {
        return new CoupleModel(array.module(), array.seriesCount(), array.parallelCount(), cells);
    }

    // ------------------------------------------------------------------ cooling

    /**
     * Current that removes the case's load at its object temperature (the detailed counterpart of
     * {@link OperatingPointSolver#solve(ModuleArray, CoolingCase, DriveLimits)}): Tc = Tobj − Q·Rint,c,
     * Th = Tamb + Qh·(Rint,h + Rsink), the lower root of Qc(I) = Q, I = 0 when conduction alone
     * carries the load, and the most heat removable at the set-point with this heat sink. The limits
     * are applied as in the lumped solve ({@link Reason#CURRENT_ABOVE_IMAX},
     * {@link Reason#SUPPLY_CURRENT_EXCEEDED}, {@link Reason#SUPPLY_VOLTAGE_EXCEEDED}).
     */
    public DetailedResult solve(DetailedArray array, CoolingCase coolingCase, DriveLimits limits) {
        double tc = coolingCase.coldSideAtLoadK();
        if (!(tc > 0)) {
            return new Infeasible(Reason.DELTA_T_BEYOND_REACH, format(
                    "holding the object at %.2f K with %.2f W would need the cold face at %.2f K, at or below 0 K",
                    coolingCase.setPointK(), coolingCase.heatLoadW(), tc));
        }
        Cooler cooler = new Cooler(model(array), coolingCase, array);
        double[] point = cooler.currentForLoad();
        if (point == null) {
            return cooler.infeasible();
        }
        double currentA = point[0];
        double hotK = point[1];
        if (!cooler.evaluate(currentA, tc, hotK)) {
            return cooler.infeasible();
        }
        CoupleModel m = cooler.model;
        double voltageV = m.voltageV;
        Infeasible overLimit = OperatingPointSolver.limitViolation(limits, currentA, voltageV, hotK);
        if (overLimit != null) {
            return overLimit;
        }
        double powerW = currentA * voltageV;
        double loadW = coolingCase.heatLoadW();
        // passive (I = 0): reported as the lumped solve does, heat rejected = load + power
        double heatRejectedW = currentA > 0 ? m.hotHeatW : loadW + powerW;
        double lowestK = m.lowestK;
        double highestK = m.highestK;
        boolean within = m.withinMaterialRange();
        double[] capacity = cooler.capacityAtObject(currentA, hotK);
        return new DetailedPoint(currentA, voltageV, powerW, powerW > 0 ? loadW / powerW : Double.POSITIVE_INFINITY,
                coolingCase.setPointK(), tc, hotK, heatRejectedW, loadW, capacity[0], capacity[1], lowestK, highestK,
                within, array.module().material().name());
    }

    /** The cooling problem against a case: the couple model and the network. */
    private static final class Cooler {
        final CoupleModel model;
        final double tc;
        final double tamb;
        final double rh;
        final double rc;
        final double setPointK;
        final double loadW;
        final double currentScaleA;
        final double highestCurrentA;
        final Solved lumped;

        Cooler(CoupleModel model, CoolingCase c, DetailedArray array) {
            this.model = model;
            tc = c.coldSideAtLoadK();
            tamb = c.ambientK();
            rh = c.hotPathKPerW();
            rc = c.coldInterfaceKPerW();
            setPointK = c.setPointK();
            loadW = c.heatLoadW();
            // the lumped model at the mean temperature gives the scales and the starting point
            ModuleArray first = array.lumpedAt(0.5 * (tc + tamb));
            Solved firstPoint = new OperatingPointSolver().solve(first, c, DriveLimits.NONE) instanceof Solved s ? s : null;
            double meanK = firstPoint == null ? 0.5 * (tc + tamb) : 0.5 * (tc + firstPoint.hotSideK());
            ModuleArray lumpedArray = array.lumpedAt(meanK);
            lumped = new OperatingPointSolver().solve(lumpedArray, c, DriveLimits.NONE) instanceof Solved s ? s : null;
            ModuleParameters e = lumpedArray.equivalent();
            currentScaleA = e.seebeckVPerK() * tc / e.resistanceOhm();
            double runawayA = rh > 0 ? (1 + rh * e.conductanceWPerK()) / (rh * e.seebeckVPerK()) : Double.POSITIVE_INFINITY;
            highestCurrentA = Math.min(2 * currentScaleA, runawayA);
        }

        boolean evaluate(double currentA, double coldK, double hotK) {
            return model.solve(currentA, coldK, hotK);
        }

        /** {I, Th} of the lower root, or null when no current removes the load. */
        double[] currentForLoad() {
            double[] hot0 = new double[1];
            double surplus0 = surplus(0, hot0, lumped == null ? tamb : tamb + rh * loadW);
            if (surplus0 >= 0) {
                return new double[] {0, hot0[0]}; // passive: conduction alone carries the load
            }
            if (lumped != null && lumped.currentA() > 0) {
                double[] newton = newtonOperatingPoint(lumped.currentA(), lumped.hotSideK());
                if (newton != null) {
                    return newton;
                }
            }
            return bracketedOperatingPoint();
        }

        /** 2-D Newton on (I, Th); null when it fails or lands on the over-driven root. */
        private double[] newtonOperatingPoint(double i, double th) {
            for (int n = 0; n < MAX_ITERATIONS; n++) {
                if (!model.solve(i, tc, th)) {
                    return null;
                }
                double qc = model.coldHeatW;
                double qh = model.hotHeatW;
                double di = CURRENT_STEP * currentScaleA;
                if (!model.solve(i + di, tc, th)) {
                    return null;
                }
                double qcI = (model.coldHeatW - qc) / di;
                double qhI = (model.hotHeatW - qh) / di;
                if (!model.solve(i, tc, th + TEMPERATURE_STEP_K)) {
                    return null;
                }
                double qcT = (model.coldHeatW - qc) / TEMPERATURE_STEP_K;
                double qhT = (model.hotHeatW - qh) / TEMPERATURE_STEP_K;
                double r1 = qc - loadW;
                double r2 = th - tamb - rh * qh;
                double a11 = qcI;
                double a12 = qcT;
                double a21 = -rh * qhI;
                double a22 = 1 - rh * qhT;
                double det = a11 * a22 - a12 * a21;
                if (!(det != 0) || !(a22 > 0)) {
                    return null;
                }
                double stepI = -(r1 * a22 - a12 * r2) / det;
                double stepT = -(a11 * r2 - a21 * r1) / det;
                // slope of Qc along the network, dQc/dI + dQc/dTh·dTh/dI: positive on the lower root's side
                double slopeAlongNetwork = a11 - a12 * a21 / a22;
                if (!(slopeAlongNetwork > 0)) {
                    return null;
                }
                double nextI = i + stepI;
                if (nextI < 0) {
                    nextI = 0.5 * i;
                }
                double nextT = th + stepT;
                boolean done = Math.abs(stepI) <= CURRENT_ACCURACY * currentScaleA
                        && Math.abs(stepT) <= TEMPERATURE_ACCURACY_K;
                i = nextI;
                th = nextT;
                if (done) {
                    return i >= 0 && th > 0 ? new double[] {i, th} : null;
                }
            }
            return null;
        }

        /** Qc − Q at current I with Th from the hot balance; hotOut receives Th. −∞ when no steady hot side. */
        double surplus(double i, double[] hotOut, double startK) {
            double th = hotSide(i, startK);
            if (Double.isNaN(th) || !model.solve(i, tc, th)) {
                hotOut[0] = Double.NaN;
                return Double.NEGATIVE_INFINITY;
            }
            hotOut[0] = th;
            return model.coldHeatW - loadW;
        }

        /** Th solving Th = Tamb + Rh·Qh(I, Tc, Th) by Newton (Qh is nearly affine in Th); NaN if none. */
        double hotSide(double i, double startK) {
            if (rh == 0) {
                return tamb;
            }
            double th = startK > 0 ? startK : tamb;
            for (int n = 0; n < MAX_ITERATIONS; n++) {
                if (!model.solve(i, tc, th)) {
                    return Double.NaN;
                }
                double qh = model.hotHeatW;
                if (!model.solve(i, tc, th + TEMPERATURE_STEP_K)) {
                    return Double.NaN;
                }
                double slope = 1 - rh * (model.hotHeatW - qh) / TEMPERATURE_STEP_K;
                if (!(slope > 0)) {
                    return Double.NaN; // the hot side runs away: Qh grows with Th faster than the path rejects it
                }
                double step = -(th - tamb - rh * qh) / slope;
                th += step;
                if (!(th > 0)) {
                    return Double.NaN;
                }
                if (Math.abs(step) <= TEMPERATURE_ACCURACY_K) {
                    return th;
                }
            }
            return Double.NaN;
        }

        private double[] bracketedOperatingPoint() {
            double[] hot = new double[1];
            double[] lastHot = {tamb + rh * loadW};
            DoubleUnaryOperator surplusW = i -> {
                double s = surplus(i, hot, lastHot[0]);
                if (!Double.isNaN(hot[0])) {
                    lastHot[0] = hot[0];
                }
                return s;
            };
            double peakA = peakOf(surplusW, 0, highestCurrentA, 0.5 * highestCurrentA);
            double peakW = surplusW.applyAsDouble(peakA);
            if (!(peakW >= 0)) {
                return null;
            }
            double currentA;
            try {
                currentA = new BrentSolver(CURRENT_ACCURACY * currentScaleA).solve(MAX_EVALUATIONS,
                        surplusW::applyAsDouble, 0, peakA);
            } catch (NoBracketingException | MathIllegalStateException e) {
                return null;
            }
            surplusW.applyAsDouble(currentA);
            return Double.isNaN(hot[0]) ? null : new double[] {currentA, hot[0]};
        }

        /** Infeasible with the reason that applies. */
        Infeasible infeasible() {
            double[] hot = new double[1];
            double[] lastHot = {tamb};
            DoubleUnaryOperator coldHeatW = i -> {
                double s = surplus(i, hot, lastHot[0]);
                if (!Double.isNaN(hot[0])) {
                    lastHot[0] = hot[0];
                }
                return s + loadW;
            };
            double peakA = peakOf(coldHeatW, 0, highestCurrentA, 0.5 * highestCurrentA);
            double peakW = coldHeatW.applyAsDouble(peakA);
            if (!(peakW >= 0)) {
                return new Infeasible(Reason.DELTA_T_BEYOND_REACH, format(
                        "the detailed model cannot hold the cold face at %.2f K against %.2f K ambient with a %.3f K/W"
                                + " hot path even with no load: the best it does there is %.2f W at %.2f A",
                        tc, tamb, rh, peakW, peakA));
            }
            return new Infeasible(Reason.LOAD_ABOVE_CAPACITY, format(
                    "the detailed model needs %.2f W of cooling at a cold face of %.2f K; with this heat sink the peak"
                            + " there is %.2f W at %.2f A", loadW, tc, peakW, peakA));
        }

        /**
         * Most heat removable with the object held at its set-point: the maximum over I of the Q that
         * solves Qc(I, Tobj − Q·Rint,c, Th) = Q with the hot balance; {Q, I}, or NaNs if the search fails.
         * Newton on dQ/dI with central differences (a parabola through three points, Q(I) being nearly
         * quadratic at its peak) from the lumped model's peak current; Brent's search if that fails.
         */
        double[] capacityAtObject(double startA, double startHotK) {
            double[] state = {loadW, startHotK};
            DoubleUnaryOperator capacityW = i -> {
                double[] s = capacityAtCurrent(i, state[0], state[1]);
                if (s == null) {
                    return Double.NEGATIVE_INFINITY;
                }
                state[0] = s[0];
                state[1] = s[1];
                return s[0];
            };
            double guess = lumped != null ? lumped.currentAtMaxHeatLoadA() : Math.max(startA, 0.5 * highestCurrentA);
            double i = guess;
            double h = 1e-3 * currentScaleA;
            for (int n = 0; n < 20 && i - h > 0 && i + h < highestCurrentA; n++) {
                double down = capacityW.applyAsDouble(i - h);
                double up = capacityW.applyAsDouble(i + h);
                double mid = capacityW.applyAsDouble(i);
                double curvature = (up - 2 * mid + down) / (h * h);
                if (!(curvature < 0) || !Double.isFinite(up + mid + down)) {
                    break;
                }
                double step = -(up - down) / (2 * h) / curvature;
                if (Math.abs(step) > 0.25 * currentScaleA) {
                    break;
                }
                i += step;
                if (Math.abs(step) <= PEAK_STEP * currentScaleA) {
                    double heatW = capacityW.applyAsDouble(i);
                    if (Double.isFinite(heatW)) {
                        return new double[] {heatW, i};
                    }
                    break;
                }
            }
            double peakA = peakOf(capacityW, 0, highestCurrentA, guess);
            double heatW = capacityW.applyAsDouble(peakA);
            return Double.isFinite(heatW) ? new double[] {heatW, peakA} : new double[] {Double.NaN, Double.NaN};
        }

        /** Jacobian of the capacity problem, reused between calls (chord Newton); NaN until first formed. */
        private double c11 = Double.NaN;
        private double c12;
        private double c21;
        private double c22;

        /**
         * {Q, Th} at a fixed current with the object at its set-point: chord Newton with a
         * forward-difference Jacobian, formed again only when the iteration stops contracting; null if none.
         */
        private double[] capacityAtCurrent(double i, double q, double th) {
            double scaleW = Math.max(1e-3, Math.abs(loadW));
            double previous = Double.POSITIVE_INFINITY;
            for (int n = 0; n < MAX_ITERATIONS; n++) {
                double coldK = setPointK - q * rc;
                if (!(coldK > 0) || !model.solve(i, coldK, th)) {
                    return null;
                }
                double qc = model.coldHeatW;
                double qh = model.hotHeatW;
                double r1 = qc - q;
                double r2 = th - tamb - rh * qh;
                double size = Math.abs(r1) / scaleW + Math.abs(r2);
                if (Double.isNaN(c11) || size > 0.25 * previous) {
                    double dq = TEMPERATURE_STEP_K; // perturb the cold face by a small temperature step
                    if (!model.solve(i, coldK + dq, th)) {
                        return null;
                    }
                    double qcC = (model.coldHeatW - qc) / dq;  // ∂Qc/∂Tc
                    double qhC = (model.hotHeatW - qh) / dq;
                    if (!model.solve(i, coldK, th + TEMPERATURE_STEP_K)) {
                        return null;
                    }
                    double qcT = (model.coldHeatW - qc) / TEMPERATURE_STEP_K;
                    double qhT = (model.hotHeatW - qh) / TEMPERATURE_STEP_K;
                    // unknowns (Q, Th); dTc/dQ = −Rint,c
                    c11 = -rc * qcC - 1;
                    c12 = qcT;
                    c21 = rh * rc * qhC;
                    c22 = 1 - rh * qhT;
                }
                previous = size;
                double det = c11 * c22 - c12 * c21;
                if (!(det != 0)) {
                    return null;
                }
                double stepQ = -(r1 * c22 - c12 * r2) / det;
                double stepT = -(c11 * r2 - c21 * r1) / det;
                q += stepQ;
                th += stepT;
                if (!(th > 0)) {
                    return null;
                }
                if (Math.abs(stepQ) <= HEAT_ACCURACY * scaleW && Math.abs(stepT) <= TEMPERATURE_ACCURACY_K) {
                    return new double[] {q, th};
                }
            }
            return null;
        }
    }

    // ------------------------------------------------------------------ generator

    /**
     * Generator on a load with the heat-exchanger network of {@link GeneratorSolver} (Ioffe 1957; Rowe (ed.), CRC Handbook of Thermoelectrics, 1995; as GeneratorSolver):
     * Th = Tsrc − Rhx,h·Qh,in, Tc = Tsnk + Rhx,c·Qc,out, and the circuit I·RL = V(I), where the legs carry
     * the current the module drives (the cooler current reversed). For each current the two junction
     * temperatures come from a 2-D Newton; the current from Brent's method on [0, a current where the
     * voltage falls below I·RL]. Empty when no steady point exists.
     *
     * @param loadOhm external load RL, Ω, ≥ 0
     */
    public Optional<DetailedGeneratorPoint> generatorAtLoad(DetailedModule module, GeneratorCase c, double loadOhm) {
        Check.nonNegative("loadOhm", loadOhm);
        Generator g = new Generator(model(DetailedArray.single(module)), c);
        return g.atLoad(loadOhm, module.lumpedAt(0.5 * (c.hotSourceK() + c.coldSinkK())))
                .map(p -> new DetailedGeneratorPoint(p, g.model.lowestK, g.model.highestK,
                        g.model.withinMaterialRange(), module.material().name()));
    }

    /** The load of most power (Brent over ln(RL/R), R at the mean temperature) and the point there; empty if none. */
    public Optional<DetailedGeneratorPoint> generatorMaxPower(DetailedModule module, GeneratorCase c) {
        ModuleParameters lumped = module.lumpedAt(0.5 * (c.hotSourceK() + c.coldSinkK()));
        Generator g = new Generator(model(DetailedArray.single(module)), c);
        double r = lumped.resistanceOhm();
        double span = Math.log(GeneratorSolver.LOAD_RATIO_RANGE);
        double logRatio;
        try {
            logRatio = new BrentOptimizer(GeneratorSolver.LOAD_LOG_ACCURACY, GeneratorSolver.LOAD_LOG_ACCURACY)
                    .optimize(new MaxEval(MAX_EVALUATIONS), new UnivariateObjectiveFunction(x ->
                                    g.atLoad(r * Math.exp(x), lumped).map(GeneratorPoint::powerW).orElse(0.0)),
                            GoalType.MAXIMIZE, new SearchInterval(-span, span, 0))
                    .getPoint();
        } catch (MathIllegalStateException e) {
            return Optional.empty();
        }
        return generatorAtLoad(module, c, r * Math.exp(logRatio));
    }

    /** The generator problem: the couple model and the heat-exchanger network. */
    private static final class Generator {
        final CoupleModel model;
        final GeneratorCase c;
        double hotK;
        double coldK;

        Generator(CoupleModel model, GeneratorCase c) {
            this.model = model;
            this.c = c;
            hotK = c.hotSourceK();
            coldK = c.coldSinkK();
        }

        /** Junctions at a generator current by 2-D Newton; false if none. Leaves the model solved there. */
        boolean junctions(double currentA) {
            double rh = c.hotResistanceKPerW();
            double rc = c.coldResistanceKPerW();
            double th = hotK;
            double tc = coldK;
            for (int n = 0; n < MAX_ITERATIONS; n++) {
                if (!model.solve(-currentA, tc, th)) {
                    return false;
                }
                double heatIn = -model.hotHeatW;
                double heatOut = -model.coldHeatW;
                if (!model.solve(-currentA, tc, th + TEMPERATURE_STEP_K)) {
                    return false;
                }
                double inT = (-model.hotHeatW - heatIn) / TEMPERATURE_STEP_K;
                double outT = (-model.coldHeatW - heatOut) / TEMPERATURE_STEP_K;
                if (!model.solve(-currentA, tc + TEMPERATURE_STEP_K, th)) {
                    return false;
                }
                double inC = (-model.hotHeatW - heatIn) / TEMPERATURE_STEP_K;
                double outC = (-model.coldHeatW - heatOut) / TEMPERATURE_STEP_K;
                double r1 = th - c.hotSourceK() + rh * heatIn;
                double r2 = tc - c.coldSinkK() - rc * heatOut;
                double a11 = 1 + rh * inT;
                double a12 = rh * inC;
                double a21 = -rc * outT;
                double a22 = 1 - rc * outC;
                double det = a11 * a22 - a12 * a21;
                if (!(det != 0)) {
                    return false;
                }
                double stepH = -(r1 * a22 - a12 * r2) / det;
                double stepC = -(a11 * r2 - a21 * r1) / det;
                th += stepH;
                tc += stepC;
                if (!(th > 0 && tc > 0)) {
                    return false;
                }
                if (Math.abs(stepH) <= TEMPERATURE_ACCURACY_K && Math.abs(stepC) <= TEMPERATURE_ACCURACY_K) {
                    hotK = th;
                    coldK = tc;
                    return model.solve(-currentA, tc, th);
                }
            }
            return false;
        }

        /** V the module drives minus I·RL at a generator current; NaN if no steady point. */
        double surplusV(double currentA, double loadOhm) {
            return junctions(currentA) ? model.voltageV - currentA * loadOhm : Double.NaN; // V = S·ΔT − I·R in the ideal case
        }

        Optional<GeneratorPoint> atLoad(double loadOhm, ModuleParameters lumped) {
            double openV = surplusV(0, loadOhm);
            if (!(openV > 0)) {
                return Optional.empty();
            }
            double highA = 2 * openV / (lumped.resistanceOhm() + loadOhm);
            for (int n = 0; n < 60 && surplusV(highA, loadOhm) > 0; n++) {
                highA *= 2;
            }
            double currentA;
            try {
                currentA = new BrentSolver(1e-13 * Math.max(1, highA)).solve(MAX_EVALUATIONS,
                        i -> {
                            double v = surplusV(i, loadOhm);
                            return Double.isNaN(v) ? -openV : v;
                        }, 0, highA);
            } catch (NoBracketingException | MathIllegalStateException e) {
                return Optional.empty();
            }
            if (!junctions(currentA)) {
                return Optional.empty();
            }
            double heatInW = -model.hotHeatW;
            double powerW = currentA * model.voltageV; // delivered: −(cooler power) = Qh,in − Qc,out
            return Optional.of(new GeneratorPoint(loadOhm, currentA, model.voltageV, powerW, powerW / heatInW, hotK,
                    coldK, heatInW));
        }
    }

    // ------------------------------------------------------------------ ratings

    /**
     * Maximum ratings of one module in the detailed model with the hot face held at {@code hotSideK}
     * (the rating definitions of the ideal rating relations derived from Ioffe's equations, see RatingsMethod): ΔTmax is the largest ΔT at Qc = 0, Imax the current
     * that gives it (the peak of Qc(I) at the cold face of ΔTmax), Vmax the voltage there and Qmax the
     * cooling at Imax with ΔT = 0. With constant properties these are the ideal forward relations.
     *
     * @param hotSideK hot face of the rating, K, &gt; 0
     * @throws IllegalStateException if the searches fail (no cold face between 1 K and Th has Qc = 0)
     */
    public MaxRatings ratingsAt(DetailedModule module, double hotSideK) {
        Check.positive("hotSideK", hotSideK);
        CoupleModel model = model(DetailedArray.single(module));
        ModuleParameters lumped = module.lumpedAt(hotSideK);
        MaxRatings guess = lumped.ratingsAt(hotSideK);
        double scaleA = guess.imaxA();
        double[] lastPeak = {guess.imaxA()};
        DoubleUnaryOperator peakHeatW = tc -> {
            double[] peak = peakCurrent(model, tc, hotSideK, lastPeak[0], scaleA);
            lastPeak[0] = peak[0];
            return peak[1];
        };
        double highK = hotSideK;
        double lowK = Math.max(1.0, hotSideK - 1.3 * guess.dtmaxK());
        for (int n = 0; n < 60 && peakHeatW.applyAsDouble(lowK) > 0; n++) {
            if (lowK <= 1.0) {
                throw new IllegalStateException(format("no cold face above 1 K stops the cooling at %.2f K", hotSideK));
            }
            lowK = Math.max(1.0, hotSideK - 2 * (hotSideK - lowK));
        }
        double coldMinK;
        try {
            coldMinK = new BrentSolver(1e-12 * hotSideK, 1e-10).solve(MAX_EVALUATIONS, peakHeatW::applyAsDouble,
                    lowK, highK, hotSideK - guess.dtmaxK());
        } catch (NoBracketingException | MathIllegalStateException e) {
            throw new IllegalStateException(format("detailed ΔTmax search failed at %.2f K", hotSideK), e);
        }
        double imaxA = peakCurrent(model, coldMinK, hotSideK, lastPeak[0], scaleA)[0];
        if (!model.solve(imaxA, coldMinK, hotSideK)) {
            throw new IllegalStateException(format("no steady legs at Imax %.4f A", imaxA));
        }
        double vmaxV = model.voltageV;
        if (!model.solve(imaxA, hotSideK, hotSideK)) {
            throw new IllegalStateException(format("no steady legs at Imax %.4f A and zero ΔT", imaxA));
        }
        return new MaxRatings(imaxA, vmaxV, model.coldHeatW, hotSideK - coldMinK, hotSideK);
    }

    /**
     * {I, Qc} at the peak of Qc(I) between fixed faces: Newton on dQc/dI with central differences (a
     * parabola through three points; Qc(I) is nearly quadratic there), Brent's search if that fails.
     */
    private static double[] peakCurrent(CoupleModel model, double tc, double th, double guessA, double scaleA) {
        double i = guessA > 0 ? guessA : scaleA;
        for (int n = 0; n < MAX_ITERATIONS; n++) {
            double h = 1e-3 * scaleA;
            double down = heat(model, i - h, tc, th);
            double mid = heat(model, i, tc, th);
            double up = heat(model, i + h, tc, th);
            double curvature = (up - 2 * mid + down) / (h * h);
            if (!(curvature < 0) || Double.isNaN(down + mid + up)) {
                break;
            }
            double step = -(up - down) / (2 * h) / curvature;
            i += step;
            if (Math.abs(step) <= CURRENT_ACCURACY * scaleA) {
                return new double[] {i, heat(model, i, tc, th)};
            }
        }
        DoubleUnaryOperator q = c -> {
            double v = heat(model, c, tc, th);
            return Double.isNaN(v) ? Double.NEGATIVE_INFINITY : v;
        };
        double peak = peakOf(q, 0, 4 * scaleA, Math.min(Math.max(guessA, 0), 4 * scaleA));
        return new double[] {peak, q.applyAsDouble(peak)};
    }

    private static double heat(CoupleModel model, double currentA, double tc, double th) {
        return model.solve(currentA, tc, th) ? model.coldHeatW : Double.NaN;
    }

    /** Maximum of a unimodal function of current on [low, high] by Brent's method, started near {@code guess}. */
    static double peakOf(DoubleUnaryOperator f, double low, double high, double guess) {
        double start = guess > low && guess < high ? guess : 0.5 * (low + high);
        try {
            return new BrentOptimizer(PEAK_ACCURACY, 1e-14 * Math.max(1, high)) // per-call state
                    .optimize(new MaxEval(MAX_EVALUATIONS), new UnivariateObjectiveFunction(f::applyAsDouble),
                            GoalType.MAXIMIZE, new SearchInterval(low, high, start))
                    .getPoint();
        } catch (MathIllegalStateException e) {
            throw new IllegalStateException(format("peak search failed on [%.6g, %.6g] A", low, high), e);
        }
    }

    static String format(String pattern, Object... args) {
        return String.format(Locale.ROOT, pattern, args);
    }
}
