package org.chillwright.physics;

import java.util.List;

/**
 * A feasible steady point of a two-stage stack on one shared current against a {@link CoolingCase}
 * (the heat-sink network derived here; the two-stage balance derived here). Temperatures in K.
 *
 * @param coldStage     the cold (upper) stage
 * @param hotStage      the hot (lower) stage
 * @param currentA      the shared supply current, A
 * @param voltageV      supply voltage, the sum of both stages' voltages, V
 * @param powerW        electrical input power of both stages, W
 * @param cop           heatLoadW / powerW; it satisfies 1 + 1/COP = (1 + 1/COP1)(1 + 1/COP2)
 * @param setPointK     temperature the cooled part is held at, K
 * @param coldSideK     cold face of the cold stage, setPointK − load × cold interface, K
 * @param interstageK   interstage temperature Ti, K (between the cold and hot faces)
 * @param hotSideK      hot face of the hot stage, ambient + heat rejected × hot path, K
 * @param heatLoadW     heat pumped from the cooled part, W
 * @param heatRejectedW heat into the hot path, heatLoadW + powerW, W
 * @param marginK       how much colder than setPointK the part could be held at the same load with the
 *                      current limited to min(capacity-peak current, rated Imax of either stage, supply
 *                      current), K: the definition of {@link Solved#marginK()} for a single stage
 * @param dewPointK     dew point of the ambient air, K; NaN when the humidity is unknown
 * @param warnings      risks, each sentence naming its stage; empty when none
 */
public record StackSolved(StackStage coldStage, StackStage hotStage, double currentA, double voltageV, double powerW,
                          double cop, double setPointK, double coldSideK, double interstageK, double hotSideK,
                          double heatLoadW, double heatRejectedW, double marginK, double dewPointK,
                          List<Warning> warnings) implements StackPoint {

    public StackSolved {
        warnings = List.copyOf(warnings);
    }

    /** Whether a warning of this kind was raised for either stage. */
    public boolean hasWarning(Warning.Code code) {
        return warnings.stream().anyMatch(w -> w.code() == code);
    }
}
