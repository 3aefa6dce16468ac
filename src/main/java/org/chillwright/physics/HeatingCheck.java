package org.chillwright.physics;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.exception.NoBracketingException;

/**
 * The same cooler run backwards on the coldest day: with the current reversed, the object-side face is
 * the hot junction and the heat-sink side the cold one, so the module pumps heat from the (cold) ambient
 * into the object on top of its Joule heat. Same ideal equations as cooling (Ioffe 1957; Goldsmid 2016, from
 * memory), with the roles of the faces swapped; the network is the one of {@link OperatingPointSolver}:
 * <pre>
 *   object-side face  Th = Tobj + Qh·Rint,c              (heat flows from the face into the object)
 *   sink-side face    Tc = Tamb − Qc·(Rint,h + Rsink)      (heat drawn from the sink cools it)
 *   Qh = S·I·Th + ½·I²·R − K·(Th − Tc),   Qc = S·I·Tc − ½·I²·R − K·(Th − Tc),   P = Qh − Qc
 * </pre>
 * For a given current the sink-side face follows linearly (Tc = [Tamb + Rh(½I²R + K·Th)] / [1 + Rh(S·I + K)],
 * whose denominator is always positive), so the current that delivers the needed heat is a 1-D root.
 */
public final class HeatingCheck {

    /** Currents are solved to a microampere: far below any driver's resolution. */
    static final double CURRENT_ACCURACY_A = 1e-6;
    private static final int MAX_EVALUATIONS = 200;

    /**
     * Result of the check.
     *
     * @param heatNeededW   heat the object must receive through the module at the coldest ambient, W; negative
     *                      when the object still dissipates more than it loses elsewhere
     * @param currentA      reversed current that delivers it, A; 0 when conduction through the module alone
     *                      drains no more than that (no heating needed); NaN when not reachable
     * @param voltageV      terminal voltage then, V
     * @param powerW        electrical input, W
     * @param copHeating    Qh / P (NaN when not reachable)
     * @param sinkSideK     temperature of the sink-side face, K
     * @param withinLimits  the current is within the limit given (rated Imax or supply)
     */
    public record Result(double heatNeededW, double currentA, double voltageV, double powerW, double copHeating,
                         double sinkSideK, boolean withinLimits) {

        /** Conduction through the idle module would pull the object below its set-point. */
        public boolean needsHeating() {
            return !(currentA == 0);
        }

        public boolean reachable() {
            return Double.isFinite(currentA);
        }
    }

    /**
     * @param module         the (array's equivalent) module
     * @param setPointK        set-point, K
     * @param coldAmbientK   the coldest ambient, K
     * @param heatNeededW    heat the object must receive from the module there, W: its losses elsewhere minus
     *                       its own dissipation (negative when it still dissipates more than it loses)
     * @param coldInterfaceKPerW object-side interface, K/W
     * @param hotPathKPerW   sink-side path (hot interface + heat sink), K/W
     * @param currentLimitA  most current allowed, A (rated Imax, supply), or NaN for none
     */
    public Result check(ModuleParameters module, double setPointK, double coldAmbientK, double heatNeededW,
                        double coldInterfaceKPerW, double hotPathKPerW, double currentLimitA) {
        Check.positive("setPointK", setPointK);
        Check.positive("coldAmbientK", coldAmbientK);
        Check.finite("heatNeededW", heatNeededW);
        Check.nonNegative("coldInterfaceKPerW", coldInterfaceKPerW);
        Check.nonNegative("hotPathKPerW", hotPathKPerW);
        double th = setPointK + heatNeededW * coldInterfaceKPerW; // Th, the object-side face
        double s = module.seebeckVPerK();
        double r = module.resistanceOhm();
        double k = module.conductanceWPerK();
        java.util.function.DoubleUnaryOperator sinkSide = i ->
                (coldAmbientK + hotPathKPerW * (0.5 * i * i * r + k * th)) / (1 + hotPathKPerW * (s * i + k));
        java.util.function.DoubleUnaryOperator surplusW = i -> module.hotSideHeatW(i, sinkSide.applyAsDouble(i), th)
                - heatNeededW;
        // Qh grows without bound with I (Joule heat alone), so double the bracket until it holds the root
        double highA = Math.max(1e-3, s * th / r);
        for (int n = 0; n < 60 && surplusW.applyAsDouble(highA) < 0; n++) {
            highA *= 2;
        }
        if (surplusW.applyAsDouble(0) >= 0) {
            // the idle module drains no more than the object can spare: no heating current
            return new Result(heatNeededW, 0, 0, 0, Double.NaN, sinkSide.applyAsDouble(0), true);
        }
        double currentA;
        try {
            currentA = new BrentSolver(CURRENT_ACCURACY_A).solve(MAX_EVALUATIONS, surplusW::applyAsDouble, 0, highA);
        } catch (NoBracketingException | MathIllegalStateException e) {
            return new Result(heatNeededW, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, false);
        }
        double tc = sinkSide.applyAsDouble(currentA);
        double powerW = module.powerW(currentA, tc, th);
        double voltageV = module.voltageV(currentA, tc, th);
        boolean within = !(currentA > currentLimitA);
        return new Result(heatNeededW, currentA, voltageV, powerW, heatNeededW / powerW, tc, within);
    }
}
