package org.chillwright.physics;

/**
 * Steady point of a two-stage cascade with fixed cold- and hot-side temperatures (see {@link TwoStageCascade}).
 *
 * @param interstageK        interstage temperature Ti, K (between the cold and hot sides)
 * @param heatLoadW          heat pumped from the cold side Qc1, W
 * @param coldStageCurrentA  current of the cold stage, A
 * @param hotStageCurrentA   current of the hot stage, A
 * @param coldStagePowerW    electrical power of the cold stage, W
 * @param hotStagePowerW     electrical power of the hot stage, W
 * @param coldStageCop       Qc1/P1
 * @param hotStageCop        Qc2/P2 (Qc2 = Qh1)
 */
public record CascadeSolved(double interstageK, double heatLoadW, double coldStageCurrentA, double hotStageCurrentA,
                            double coldStagePowerW, double hotStagePowerW, double coldStageCop, double hotStageCop)
        implements CascadePoint {

    /** Total electrical power P1 + P2, W. */
    public double powerW() {
        return coldStagePowerW + hotStagePowerW;
    }

    /** Overall COP Qc1/(P1 + P2); it satisfies 1 + 1/COP = (1 + 1/COP1)(1 + 1/COP2) (energy conservation). */
    public double cop() {
        return heatLoadW / powerW();
    }

    /** Heat released at the hot side, Qh2 = Qc1 + P1 + P2, W. */
    public double heatRejectedW() {
        return heatLoadW + powerW();
    }
}
