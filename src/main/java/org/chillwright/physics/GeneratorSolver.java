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
 * Generator (Seebeck) mode with heat-exchanger resistances on both sides. Ideal constant-property equations
 * (A.F. Ioffe, Semiconductor Thermoelements and Thermoelectric Cooling, Infosearch, 1957; D.M. Rowe (ed.),
 * CRC Handbook of Thermoelectrics, 1995; both from memory): Voc = S(Th − Tc), I = Voc/(R + RL), P = I²RL,
 * Qh,in = S·I·Th − ½I²R + K(Th − Tc), Qc,out = Qh,in − P. With the node balances Th = Tsrc − Rh·Qh,in and
 * Tc = Tsnk + Rc·Qc,out (derived here), the junction temperatures for a given current solve the linear 2x2
 * system (1 + Rh·S·I + Rh·K)Th − Rh·K·Tc = Tsrc + ½Rh·R·I², −Rc·K·Th + (1 − Rc·S·I + Rc·K)Tc = Tsnk + ½Rc·R·I²;
 * the circuit I(R + RL) = S(Th − Tc) closes the loop as a 1-D root in I (see {@link #atLoad} for its bracket).
 * The loads of maximum power and of maximum efficiency are found numerically (Brent), since with finite
 * heat-exchanger resistances the first is no longer RL = R. Every point returned is checked to be physical.
 * Stateless and thread-safe.
 */
public final class GeneratorSolver {

    /** Root accuracy in current, A: 1 pA, so that powers near the flat optimum keep about 12 significant digits. */
    static final double CURRENT_ACCURACY_A = 1e-12;
    /** Accuracy of ln(RL/R) in the load searches: 1e-10, far below the 1e-6 needed on the load. */
    static final double LOAD_LOG_ACCURACY = 1e-10;
    /** Search range of RL/R for the optimal loads: 1e-3 to 1e3, wide around the matched value 1. */
    static final double LOAD_RATIO_RANGE = 1e3;
    /** Evaluation cap for the Commons Math searches; each evaluation is a small root solve. */
    static final int MAX_EVALUATIONS = 1000;
    /**
     * Fraction of the singular current I_D used as the end of the current bracket: at I_D itself the junction
     * temperatures are infinite, and 1e-9 below it the voltage balance is already hugely negative.
     */
    static final double SINGULAR_GUARD = 1 - 1e-9;
    /** Bracket moves towards I_D (halving the gap each time) before giving up: 2⁻⁶⁰ of the gap is below round-off. */
    static final int MAX_BRACKET_STEPS = 60;
    /** Temperatures may pass the source or sink by this fraction of the source temperature (round-off, 1e-9). */
    static final double TEMPERATURE_SLACK = 1e-9;
    /**
     * Relative tolerance of the circuit and energy-balance checks on every point: 1e-6, far above what the
     * 1 pA root leaves even where the junction ΔT is a few mK, and far below any impossible point (those miss
     * by orders of magnitude).
     */
    static final double ENERGY_SLACK = 1e-6;

    /** Open-circuit voltage S(Th − Tc) at I = 0, V; with heat exchangers the junction difference is smaller than the source-sink difference. */
    public double openCircuitV(ModuleParameters module, GeneratorCase c) {
        double[] junctionK = junctionsK(module, c, 0);
        return module.seebeckVPerK() * (junctionK[0] - junctionK[1]);
    }

    /**
     * Hot-face temperature with no current, K: the hottest the module gets, since current draws Peltier heat
     * out of the hot face. Only conduction K·ΔT crosses the module, so the two node balances at I = 0 give
     * ΔT = (Tsrc − Tsnk)/(1 + (Rh + Rc)K) and Th = Tsrc − Rh·K·ΔT (hand algebra).
     */
    public static double openCircuitHotJunctionK(ModuleParameters module, GeneratorCase c) {
        double k = module.conductanceWPerK();
        double dtK = (c.hotSourceK() - c.coldSinkK()) / (1 + (c.hotResistanceKPerW() + c.coldResistanceKPerW()) * k);
        return c.hotSourceK() - c.hotResistanceKPerW() * k * dtK;
    }

    /**
     * Steady point on a given load.
     *
     * <p>The current solves S(Th − Tc) = I(R + RL) with (Th, Tc) from the heat-exchanger system. Its
     * determinant D(I) = (1 + Rh·K + Rh·S·I)(1 + Rc·K − Rc·S·I) − Rh·Rc·K² is positive at I = 0 and falls to
     * zero at {@link #singularCurrentA}: there the Peltier heat S·I·Tc released at the cold face grows with
     * Tc faster than the cold exchanger rejects it, Th − Tc runs to −∞, and beyond it the system gives a
     * cold face below absolute zero. The physical point is therefore the root on [0, I_D), where the
     * voltage balance falls from S·ΔT at open circuit to −∞; the bracket ends below I_D (and below the
     * short-circuit bound S(Tsrc − Tsnk)/(R + RL) when that comes first). Only with both resistances zero are
     * the junctions the source and sink themselves, and the current is the closed form S(Tsrc − Tsnk)/(R + RL).
     *
     * @param loadOhm external load RL, Ω, ≥ 0 (0 is a short circuit)
     * @throws IllegalStateException when the point found breaks Tsnk ≤ Tc &lt; Th ≤ Tsrc or the energy balance
     *                               (a solver fault, never an answer)
     */
    public GeneratorPoint atLoad(ModuleParameters module, GeneratorCase c, double loadOhm) {
        Check.nonNegative("loadOhm", loadOhm);
        double s = module.seebeckVPerK();
        double circuitOhm = module.resistanceOhm() + loadOhm;
        double shortCircuitBoundA = s * (c.hotSourceK() - c.coldSinkK()) / circuitOhm;
        double currentA;
        if (c.hotResistanceKPerW() == 0 && c.coldResistanceKPerW() == 0) {
            currentA = shortCircuitBoundA; // junctions held at the source and sink: the closed form
        } else {
            UnivariateFunction surplusV = i -> {
                double[] junctionK = junctionsK(module, c, i);
                return s * (junctionK[0] - junctionK[1]) - i * circuitOhm;
            };
            double singularA = singularCurrentA(module, c);
            double guardA = singularA * SINGULAR_GUARD;
            double highA = Math.min(shortCircuitBoundA, guardA);
            // the surplus is −∞ just below I_D, and below −I·RL/2 for large I when there is no I_D; the short-circuit
            // bound is usually past the root already, and otherwise the bracket moves on towards I_D (or doubles)
            for (int n = 0; !(surplusV.value(highA) < 0); n++) {
                if (n == MAX_BRACKET_STEPS) {
                    throw new IllegalStateException(String.format(Locale.ROOT,
                            "generator current not bracketed for a %s ohm load: %s", loadOhm, c));
                }
                highA = Double.isFinite(guardA) ? highA + 0.5 * (guardA - highA) : 2 * highA;
            }
            try {
                currentA = new BrentSolver(CURRENT_ACCURACY_A).solve(MAX_EVALUATIONS, surplusV, 0, highA); // per-call state
            } catch (NoBracketingException | MathIllegalStateException e) {
                throw new IllegalStateException("generator current solve failed for a " + loadOhm + " ohm load", e);
            }
        }
        double[] junctionK = junctionsK(module, c, currentA);
        double th = junctionK[0];
        double tc = junctionK[1];
        double heatInW = s * currentA * th - 0.5 * currentA * currentA * module.resistanceOhm()
                + module.conductanceWPerK() * (th - tc);
        double powerW = currentA * currentA * loadOhm;
        var point = new GeneratorPoint(loadOhm, currentA, currentA * loadOhm, powerW, powerW / heatInW, th, tc, heatInW);
        requirePhysical(module, c, point);
        return point;
    }

    /**
     * Smallest positive root of the determinant D(I) of the heat-exchanger system, A; +∞ when D stays positive
     * (no cold-side resistance). D = −Rh·Rc·S²·I² + S(Rh − Rc)·I + 1 + (Rh + Rc)K, a downward parabola (or a
     * falling line when Rh = 0) with D(0) &gt; 0, so it has exactly one positive root when Rc &gt; 0. Written
     * without cancellation for either sign of Rh − Rc.
     */
    static double singularCurrentA(ModuleParameters m, GeneratorCase c) {
        double s = m.seebeckVPerK();
        double rh = c.hotResistanceKPerW();
        double rc = c.coldResistanceKPerW();
        if (rc == 0) {
            return Double.POSITIVE_INFINITY;
        }
        double a = rh * rc * s * s;                         // −(coefficient of I²)
        double b = s * (rh - rc);                           // coefficient of I
        double d0 = 1 + (rh + rc) * m.conductanceWPerK();   // D(0)
        double root = Math.sqrt(b * b + 4 * a * d0);
        return b <= 0 ? 2 * d0 / (root - b) : (b + root) / (2 * a);
    }

    /**
     * Every generator point must be one the hardware can be in: Tsnk ≤ Tc &lt; Th ≤ Tsrc; the circuit
     * S(Th − Tc) = I(R + RL), so that V = I·RL is the load's voltage; and the cold-face heat from its own
     * equation, Qc,out = S·I·Tc + ½I²R + K(Th − Tc), equal to Qh,in − P.
     */
    static void requirePhysical(ModuleParameters m, GeneratorCase c, GeneratorPoint p) {
        double slackK = TEMPERATURE_SLACK * c.hotSourceK();
        double i = p.currentA();
        double r = m.resistanceOhm();
        double emfV = m.seebeckVPerK() * (p.hotJunctionK() - p.coldJunctionK());
        // the junction temperatures carry the same round-off as the ordering test allows them (slackK), which
        // dominates when the source is only nanokelvin above the sink
        double circuitSlackV = ENERGY_SLACK * (Math.abs(emfV) + i * (r + p.loadOhm())) + m.seebeckVPerK() * slackK;
        double circuitV = emfV - i * (r + p.loadOhm());
        double heatOutW = m.seebeckVPerK() * i * p.coldJunctionK() + 0.5 * i * i * r
                + m.conductanceWPerK() * (p.hotJunctionK() - p.coldJunctionK());
        double balanceW = p.heatInW() - heatOutW - p.powerW();
        double balanceSlackW = ENERGY_SLACK * (Math.abs(p.heatInW()) + Math.abs(heatOutW)) + i * circuitSlackV
                + (m.conductanceWPerK() + m.seebeckVPerK() * i) * slackK;
        boolean ordered = p.coldJunctionK() >= c.coldSinkK() - slackK && p.coldJunctionK() < p.hotJunctionK()
                && p.hotJunctionK() <= c.hotSourceK() + slackK;
        if (!(ordered && i >= 0 && Math.abs(circuitV) <= circuitSlackV && Math.abs(balanceW) <= balanceSlackW
                && p.voltageV() == i * p.loadOhm())) {
            throw new IllegalStateException(String.format(Locale.ROOT,
                    "impossible generator point (Tsnk %.6g K, Tc %.6g K, Th %.6g K, Tsrc %.6g K, I %.6g A on"
                            + " %.6g ohm, S·ΔT − I(R + RL) = %.3g V, Qh − Qc − P = %.3g W) for %s and %s",
                    c.coldSinkK(), p.coldJunctionK(), p.hotJunctionK(), c.hotSourceK(), i, p.loadOhm(), circuitV,
                    balanceW, m, c));
        }
    }

    /** The point on the load that gives the most power (Brent over ln(RL/R)); RL = R with ideal heat exchangers. */
    public GeneratorPoint maxPower(ModuleParameters module, GeneratorCase c) {
        return best(module, c, true);
    }

    /**
     * The point on the load of highest efficiency (Brent over ln(RL/R)); RL = R·√(1 + Z·Tm) with ideal
     * heat exchangers, where η = (ΔT/Th)(M − 1)/(M + Tc/Th) (Ioffe 1957, from memory).
     */
    public GeneratorPoint maxEfficiency(ModuleParameters module, GeneratorCase c) {
        return best(module, c, false);
    }

    private GeneratorPoint best(ModuleParameters module, GeneratorCase c, boolean power) {
        double r = module.resistanceOhm();
        UnivariateFunction objective = logRatio -> {
            GeneratorPoint p = atLoad(module, c, r * Math.exp(logRatio));
            return power ? p.powerW() : p.efficiency();
        };
        double span = Math.log(LOAD_RATIO_RANGE);
        double logRatio;
        try {
            logRatio = new BrentOptimizer(LOAD_LOG_ACCURACY, LOAD_LOG_ACCURACY) // per-call state: never share it
                    .optimize(new MaxEval(MAX_EVALUATIONS), new UnivariateObjectiveFunction(objective),
                            GoalType.MAXIMIZE, new SearchInterval(-span, span, 0))
                    .getPoint();
        } catch (MathIllegalStateException e) {
            throw new IllegalStateException("generator load search failed", e);
        }
        return atLoad(module, c, r * Math.exp(logRatio));
    }

    /** {Th, Tc} at current I from the heat-exchanger 2x2 system by Cramer's rule. */
    private static double[] junctionsK(ModuleParameters m, GeneratorCase c, double i) {
        double s = m.seebeckVPerK();
        double r = m.resistanceOhm();
        double k = m.conductanceWPerK();
        double rh = c.hotResistanceKPerW();
        double rc = c.coldResistanceKPerW();
        double a11 = 1 + rh * s * i + rh * k;
        double a12 = -rh * k;
        double a21 = -rc * k;
        double a22 = 1 - rc * s * i + rc * k;
        double b1 = c.hotSourceK() + 0.5 * rh * r * i * i;
        double b2 = c.coldSinkK() + 0.5 * rc * r * i * i;
        double det = a11 * a22 - a12 * a21;
        return new double[] {(b1 * a22 - a12 * b2) / det, (a11 * b2 - a21 * b1) / det};
    }
}
