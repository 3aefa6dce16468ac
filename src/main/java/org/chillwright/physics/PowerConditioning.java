package org.chillwright.physics;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.exception.NoBracketingException;

/**
 * A thermoelectric generator through a power converter (see {@link Converter}): the operating point the
 * converter's input strategy holds, the efficiency there, the power delivered after it, and whether the
 * converter starts at all. The open-circuit voltage and the maximum power point come from {@link GeneratorSolver};
 * the fixed-fraction point from a closed form of the same heat-exchanger model (the Ioffe 1957 / Rowe 1995 generator equations), checked against
 * {@link GeneratorSolver#atLoad} in the tests. Stateless and thread-safe.
 */
public final class PowerConditioning {

    /**
     * Root accuracy of the fixed-fraction current, relative to the top of its bracket: 1e-13, so the input
     * voltage lands on k·Voc to about 12 significant digits, well below any converter's regulation.
     */
    static final double CURRENT_ACCURACY_OF_LIMIT = 1e-13;
    /** How far inside the exchanger runaway current the bracket ends, relative: keeps V finite there. */
    static final double INSIDE_RUNAWAY = 1e-9;
    /** Evaluation cap of the fixed-fraction root; Brent needs a few tens on this smooth, monotonic function. */
    static final int MAX_EVALUATIONS = 200;

    private final GeneratorSolver solver = new GeneratorSolver();

    /**
     * The generator through the converter.
     *
     * @param generator the module, or the equivalent module of an array ({@link ModuleArray#equivalent()})
     * @param c         source, sink and heat-exchanger resistances
     * @param converter the converter
     */
    public ConditionedPoint condition(ModuleParameters generator, GeneratorCase c, Converter converter) {
        required("generator", generator);
        required("generatorCase", c);
        required("converter", converter);
        double openCircuitV = solver.openCircuitV(generator, c);
        GeneratorPoint input = converter.input() instanceof InputStrategy.FractionOfOpenCircuit f
                ? atFraction(generator, c, f.fractionOfOpenCircuit(), openCircuitV)
                : solver.maxPower(generator, c);
        boolean starts = openCircuitV >= converter.coldStartV();
        double efficiency = converter.efficiency().at(input.voltageV(), input.powerW());
        return new ConditionedPoint(openCircuitV, converter.coldStartV(), starts, input, efficiency,
                starts ? efficiency * input.powerW() : 0);
    }

    /**
     * The generator's point where its terminal voltage is k·Voc, Voc its open-circuit voltage
     * ({@link GeneratorSolver#openCircuitV}). With ideal heat exchangers this is the load RL = R·k/(1 − k)
     * (I = Voc/(R + RL), the Ioffe 1957 / Rowe 1995 generator equations). With finite ones the current is the root of V(I) = k·Voc, where
     * V(I) = S·ΔT(I) − I·R and ΔT(I) follows from the linear 2x2 heat-exchanger system of the Ioffe 1957 / Rowe 1995 generator equations in closed
     * form (Cramer's rule, the two columns summed; derived here):
     * <pre>
     * ΔT = [b1(1 − Rc·S·I) − b2(1 + Rh·S·I)] / det,  b1 = Tsrc + ½Rh·R·I²,  b2 = Tsnk + ½Rc·R·I²,
     * det = (1 + Rh·S·I + Rh·K)(1 − Rc·S·I + Rc·K) − Rh·Rc·K² = A + B·I − C·I²,
     * A = 1 + (Rh + Rc)·K,  B = S·(Rh − Rc),  C = Rh·Rc·S².
     * </pre>
     * The physical branch is 0 ≤ I &lt; I_det, the first zero of det: beyond it the Peltier heat a junction takes
     * up grows with its temperature faster than its exchanger removes it (runaway), and as det → 0⁺ the
     * numerator is negative, so V → −∞. Up to I = S(Tsrc − Tsnk)/R the junction difference stays below the
     * source-sink difference, so V ≤ 0 there. The root is therefore bracketed by 0 (V = Voc) and
     * min(S(Tsrc − Tsnk)/R, I_det) (V ≤ 0). The junction temperatures then follow from Th = Tsrc − Rh·Qh,in with
     * Qh,in = S·I·Th − ½I²R + K·ΔT, i.e. Th = (Tsrc + Rh(½I²R − K·ΔT))/(1 + Rh·S·I), and Tc = Th − ΔT.
     *
     * @param fractionOfOpenCircuit k, strictly between 0 and 1
     */
    public GeneratorPoint atFractionOfOpenCircuit(ModuleParameters generator, GeneratorCase c,
                                                  double fractionOfOpenCircuit) {
        required("generator", generator);
        required("generatorCase", c);
        new InputStrategy.FractionOfOpenCircuit(fractionOfOpenCircuit); // validates k
        return atFraction(generator, c, fractionOfOpenCircuit, solver.openCircuitV(generator, c));
    }

    private static GeneratorPoint atFraction(ModuleParameters m, GeneratorCase c, double fraction,
                                             double openCircuitV) {
        double targetV = fraction * openCircuitV;
        double highA = physicalCurrentLimitA(m, c);
        UnivariateFunction surplusV = i -> terminalVoltageV(m, c, i) - targetV;
        double currentA;
        try {
            currentA = new BrentSolver(CURRENT_ACCURACY_OF_LIMIT * highA) // per-call state
                    .solve(MAX_EVALUATIONS, surplusV, 0, highA);
        } catch (NoBracketingException | MathIllegalStateException e) {
            throw new IllegalStateException("fixed-fraction current solve failed for k = " + fraction + " on " + m
                    + " in " + c, e);
        }
        return pointAt(m, c, currentA);
    }

    /**
     * Upper end of the current bracket, A: min(S(Tsrc − Tsnk)/R, I_det), with I_det the first positive zero of
     * det = A + B·I − C·I² taken a hair inside (relative {@value #INSIDE_RUNAWAY}) so V there is finite.
     */
    static double physicalCurrentLimitA(ModuleParameters m, GeneratorCase c) {
        double s = m.seebeckVPerK();
        double k = m.conductanceWPerK();
        double rh = c.hotResistanceKPerW();
        double rc = c.coldResistanceKPerW();
        double idealA = s * (c.hotSourceK() - c.coldSinkK()) / m.resistanceOhm();
        double a = 1 + (rh + rc) * k;
        double b = s * (rh - rc);
        double cc = rh * rc * s * s;
        double runawayA;
        if (cc == 0) {
            runawayA = b >= 0 ? Double.POSITIVE_INFINITY : -a / b;
        } else {
            double root = Math.sqrt(b * b + 4 * a * cc);
            runawayA = b >= 0 ? (b + root) / (2 * cc) : 2 * a / (root - b); // both forms free of cancellation
        }
        return Math.min(idealA, runawayA * (1 - INSIDE_RUNAWAY));
    }

    /** Terminal voltage S·ΔT(I) − I·R at current I, V, with ΔT(I) in the closed form given above. */
    static double terminalVoltageV(ModuleParameters m, GeneratorCase c, double currentA) {
        return m.seebeckVPerK() * junctionDifferenceK(m, c, currentA) - currentA * m.resistanceOhm();
    }

    private static double junctionDifferenceK(ModuleParameters m, GeneratorCase c, double i) {
        double s = m.seebeckVPerK();
        double r = m.resistanceOhm();
        double k = m.conductanceWPerK();
        double rh = c.hotResistanceKPerW();
        double rc = c.coldResistanceKPerW();
        double b1 = c.hotSourceK() + 0.5 * rh * r * i * i;
        double b2 = c.coldSinkK() + 0.5 * rc * r * i * i;
        double det = (1 + rh * s * i + rh * k) * (1 - rc * s * i + rc * k) - rh * rc * k * k;
        return (b1 * (1 - rc * s * i) - b2 * (1 + rh * s * i)) / det;
    }

    /** The generator point at a current on the physical branch, from the closed form above. */
    static GeneratorPoint pointAt(ModuleParameters m, GeneratorCase c, double currentA) {
        double s = m.seebeckVPerK();
        double r = m.resistanceOhm();
        double i = currentA;
        double dtK = junctionDifferenceK(m, c, i);
        double hotK = (c.hotSourceK() + c.hotResistanceKPerW() * (0.5 * i * i * r - m.conductanceWPerK() * dtK))
                / (1 + c.hotResistanceKPerW() * s * i);
        double heatInW = s * i * hotK - 0.5 * i * i * r + m.conductanceWPerK() * dtK;
        double voltageV = s * dtK - i * r;
        double powerW = i * voltageV;
        return new GeneratorPoint(i > 0 ? voltageV / i : Double.POSITIVE_INFINITY, i, voltageV, powerW,
                powerW / heatInW, hotK, hotK - dtK, heatInW);
    }

    /**
     * Ranks generator designs by the power delivered after the converter and sets apart those whose converter
     * cannot start (open-circuit voltage below its cold-start voltage).
     *
     * @param designs the designs, none null
     * @param c       source, sink and heat-exchanger resistances of the whole assembly
     */
    public ConverterRanking rank(List<ModuleArray> designs, GeneratorCase c, Converter converter) {
        required("designs", designs);
        var ranked = new ArrayList<ConditionedDesign>();
        var cannotStart = new ArrayList<ConditionedDesign>();
        for (int i = 0; i < designs.size(); i++) {
            ModuleArray design = designs.get(i);
            required("designs[" + i + "]", design);
            var point = new ConditionedDesign(i, design, condition(design.equivalent(), c, converter));
            (point.point().starts() ? ranked : cannotStart).add(point);
        }
        ranked.sort(Comparator.comparingDouble((ConditionedDesign d) -> d.point().deliveredW()).reversed());
        return new ConverterRanking(ranked, cannotStart);
    }

    private static void required(String field, Object value) {
        if (value == null) {
            throw new InvalidQuantityException(field, Double.NaN, field + " must be given, was null");
        }
    }
}
