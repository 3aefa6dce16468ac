package org.chillwright.physics;

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
 * Generator (Seebeck) mode with heat-exchanger resistances on both sides (physics.md i; ideal
 * equations after A.F. Ioffe, Semiconductor Thermoelements, 1957, and D.M. Rowe (ed.), CRC Handbook of
 * Thermoelectrics, 1995, from memory; the heat-exchanger system derived in physics.md; case S13).
 * For a given current the junction temperatures solve the linear 2x2 system
 * (1 + Rh·S·I + Rh·K)Th − Rh·K·Tc = Tsrc + ½Rh·R·I², −Rc·K·Th + (1 − Rc·S·I + Rc·K)Tc = Tsnk + ½Rc·R·I²;
 * the circuit I(R + RL) = S(Th − Tc) closes the loop as a 1-D root in I. The loads of maximum power
 * and of maximum efficiency are found numerically (Brent), since with finite heat-exchanger
 * resistances the first is no longer RL = R. Stateless and thread-safe.
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

    /** Open-circuit voltage S(Th − Tc) at I = 0, V; with heat exchangers the junction difference is smaller than the source-sink difference. */
    public double openCircuitV(ModuleParameters module, GeneratorCase c) {
        double[] junctionK = junctionsK(module, c, 0);
        return module.seebeckVPerK() * (junctionK[0] - junctionK[1]);
    }

    /**
     * Steady point on a given load.
     *
     * @param loadOhm external load RL, Ω, ≥ 0 (0 is a short circuit)
     */
    public GeneratorPoint atLoad(ModuleParameters module, GeneratorCase c, double loadOhm) {
        Check.nonNegative("loadOhm", loadOhm);
        double s = module.seebeckVPerK();
        double circuitOhm = module.resistanceOhm() + loadOhm;
        UnivariateFunction surplusV = i -> {
            double[] junctionK = junctionsK(module, c, i);
            return s * (junctionK[0] - junctionK[1]) - i * circuitOhm;
        };
        double highA = s * (c.hotSourceK() - c.coldSinkK()) / circuitOhm; // junction ΔT never exceeds the source-sink ΔT
        double currentA;
        if (!(surplusV.value(highA) < 0)) {
            // ideal heat exchangers: the junctions sit at the source and sink, so highA is the root itself and
            // rounding may leave its surplus at +1 ulp, which no bracket would accept
            currentA = highA;
        } else {
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
        return new GeneratorPoint(loadOhm, currentA, currentA * loadOhm, powerW, powerW / heatInW, th, tc, heatInW);
    }

    /** The point on the load that gives the most power (Brent over ln(RL/R)); RL = R with ideal heat exchangers. */
    public GeneratorPoint maxPower(ModuleParameters module, GeneratorCase c) {
        return best(module, c, true);
    }

    /**
     * The point on the load of highest efficiency (Brent over ln(RL/R)); RL = R·√(1 + Z·Tm) with ideal
     * heat exchangers, where η = (ΔT/Th)(M − 1)/(M + Tc/Th) (physics.md i).
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
