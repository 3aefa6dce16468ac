package org.chillwright.physics;

import java.util.List;

/**
 * A cool-down from ambient at one constant current (see {@link CooldownSolver}).
 *
 * @param currentA         the constant terminal current, A
 * @param finalPartK       steady temperature of the part, K; NaN when there is no steady state (runaway)
 * @param finalHotSideK    steady hot face, K; NaN without a steady state
 * @param finalVoltageV    steady terminal voltage, V (the highest of the cool-down); NaN without a steady state
 * @param timeConstantS    the slowest time constant, s: C/G with one node, −1/λ of the slowest eigenvalue with a
 *                         heat-sink node; NaN without a steady state
 * @param timeToSetPointS  first time the part is within the settle band of the set-point, s; 0 when it starts
 *                         there; NaN when it never gets there
 * @param curve            the part and hot face from switch-on to the end of the curve, evenly spaced in time
 * @param method           how it was computed
 */
public record CooldownRun(double currentA, double finalPartK, double finalHotSideK, double finalVoltageV,
                          double timeConstantS, double timeToSetPointS, List<CooldownSample> curve, Method method) {

    /** How a cool-down was computed. */
    public enum Method {
        /** One node (the part; the heat sink follows at once): an exact exponential, the lumped-capacitance method, Incropera & DeWitt ch. 5. */
        CLOSED_FORM,
        /** Two nodes (the part and the heat sink): Commons Math's Dormand–Prince 8(5,3) integrator. */
        DORMAND_PRINCE_853,
        /** Two nodes with a sink node far faster than the part (stiff): the exact exponential of the 2x2 system. */
        EXACT_TWO_NODE
    }

    public CooldownRun {
        curve = List.copyOf(curve);
    }

    /** Whether the set-point is reached. */
    public boolean reachesSetPoint() {
        return !Double.isNaN(timeToSetPointS);
    }
}
