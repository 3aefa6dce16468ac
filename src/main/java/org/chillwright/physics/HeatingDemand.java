package org.chillwright.physics;

/**
 * The coldest day a design must hold its set-point on, for the heating check ({@link HeatingCheck}).
 *
 * @param coldAmbientK the coldest ambient, K, &gt; 0
 * @param heatNeededW  heat the part must receive through the module then, W: its losses to the cold ambient minus
 *                     its own dissipation (negative when it still dissipates more than it loses)
 */
public record HeatingDemand(double coldAmbientK, double heatNeededW) {

    public HeatingDemand {
        Check.positive("coldAmbientK", coldAmbientK);
        Check.finite("heatNeededW", heatNeededW);
    }
}
