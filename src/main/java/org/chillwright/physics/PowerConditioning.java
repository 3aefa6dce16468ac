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
 * converter starts at all. Uses {@link GeneratorSolver}'s public API for every generator point, so the
 * heat-exchanger model is the one of physics.md i. Stateless and thread-safe.
 */
public final class PowerConditioning {

    /**
     * Root accuracy of the fixed-fraction current, relative to the short-circuit current: 1e-13, so the
     * input voltage lands on k·Voc to about 12 significant digits, well below any converter's regulation.
     */
    static final double CURRENT_ACCURACY_OF_SHORT_CIRCUIT = 1e-13;
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
     * (I = Voc/(R + RL), physics.md i); with finite ones the current is the root of V(I) = k·Voc, where
     * V(I) = S·ΔT(I) − I·R and ΔT(I) follows from the linear 2x2 heat-exchanger system of physics.md i in closed
     * form (Cramer's rule; the two columns summed):
     * ΔT = [b1(1 − Rc·S·I) − b2(1 + Rh·S·I)] / det, b1 = Tsrc + ½Rh·R·I², b2 = Tsnk + ½Rc·R·I²,
     * det = (1 + Rh·S·I + Rh·K)(1 − Rc·S·I + Rc·K) − Rh·Rc·K².
     * The root is bracketed by 0 (V = Voc) and the short-circuit current from {@link GeneratorSolver#atLoad}
     * (V = 0), and the point returned is {@link GeneratorSolver#atLoad} on the load k·Voc/I, so it agrees with
     * every other generator point.
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

    private GeneratorPoint atFraction(ModuleParameters m, GeneratorCase c, double fraction, double openCircuitV) {
        double targetV = fraction * openCircuitV;
        double shortCircuitA = solver.atLoad(m, c, 0).currentA();
        UnivariateFunction surplusV = i -> terminalVoltageV(m, c, i) - targetV;
        double currentA;
        try {
            currentA = new BrentSolver(CURRENT_ACCURACY_OF_SHORT_CIRCUIT * shortCircuitA) // per-call state
                    .solve(MAX_EVALUATIONS, surplusV, 0, shortCircuitA);
        } catch (NoBracketingException | MathIllegalStateException e) {
            throw new IllegalStateException("fixed-fraction current solve failed for k = " + fraction + " on " + m
                    + " in " + c, e);
        }
        return solver.atLoad(m, c, targetV / currentA);
    }

    /** Terminal voltage S·ΔT(I) − I·R at current I, V, with ΔT(I) in the closed form given above. */
    static double terminalVoltageV(ModuleParameters m, GeneratorCase c, double currentA) {
        double s = m.seebeckVPerK();
        double r = m.resistanceOhm();
        double k = m.conductanceWPerK();
        double rh = c.hotResistanceKPerW();
        double rc = c.coldResistanceKPerW();
        double i = currentA;
        double b1 = c.hotSourceK() + 0.5 * rh * r * i * i;
        double b2 = c.coldSinkK() + 0.5 * rc * r * i * i;
        double det = (1 + rh * s * i + rh * k) * (1 - rc * s * i + rc * k) - rh * rc * k * k;
        double junctionDifferenceK = (b1 * (1 - rc * s * i) - b2 * (1 + rh * s * i)) / det;
        return s * junctionDifferenceK - i * r;
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
