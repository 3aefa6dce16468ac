package org.chillwright.physics;

/**
 * What a cool-down needs beyond the steady case: the heat capacities and the leak that grows as the part gets
 * colder.
 *
 * @param heatCapacityJPerK     heat capacity of what is cooled (part, cold plate), J/K, &gt; 0 (see {@link ThermalMass})
 * @param leakConductanceWPerK  conductance from the ambient into the part (convection, leads, supports), W/K, ≥ 0:
 *                              of the case's load, G·(ambient − set-point) is this leak and the rest is an active
 *                              load that stays on during the cool-down
 * @param sinkHeatCapacityJPerK heat capacity of the heat sink, J/K, ≥ 0: 0 for a sink that follows its heat at
 *                              once; with a positive value and a sink resistance the sink base is a second node
 * @param settleBandK           the set-point counts as reached once the part is this close to it, K, &gt; 0; at the
 *                              design current the part only approaches the set-point, so a band is needed (0.1 K
 *                              is common practice, no source)
 */
public record CooldownSetup(double heatCapacityJPerK, double leakConductanceWPerK, double sinkHeatCapacityJPerK,
                            double settleBandK) {

    /** Settle band, K: common practice (no source). */
    public static final double DEFAULT_SETTLE_BAND_K = 0.1;

    public CooldownSetup {
        Check.positive("heatCapacityJPerK", heatCapacityJPerK);
        Check.nonNegative("leakConductanceWPerK", leakConductanceWPerK);
        Check.nonNegative("sinkHeatCapacityJPerK", sinkHeatCapacityJPerK);
        Check.positive("settleBandK", settleBandK);
    }

    /** A part of this heat capacity with no leak, on a sink that follows at once, and the default band. */
    public static CooldownSetup of(ThermalMass part) {
        return new CooldownSetup(part.heatCapacityJPerK(), 0, 0, DEFAULT_SETTLE_BAND_K);
    }

    /**
     * The load that stays on during the cool-down, W: the case's load less the leak at the set-point.
     *
     * @throws InvalidQuantityException on {@code leakConductanceWPerK} when the leak alone at the set-point
     *                                  exceeds the case's load
     */
    public double activeLoadW(CoolingCase c) {
        double leakW = leakConductanceWPerK * (c.ambientK() - c.setPointK());
        double activeW = c.heatLoadW() - leakW;
        if (activeW < 0) {
            throw new InvalidQuantityException("leakConductanceWPerK", leakConductanceWPerK, String.format(
                    java.util.Locale.ROOT, "leakConductanceWPerK must leak no more than the load at the set-point"
                            + " (%.3f W), was %s W/K (%.3f W)", c.heatLoadW(), leakConductanceWPerK, leakW));
        }
        return activeW;
    }
}
