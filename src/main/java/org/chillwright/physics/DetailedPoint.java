package org.chillwright.physics;

/**
 * A steady operating point of the detailed model against a {@link CoolingCase}: the same quantities
 * as the lumped {@link Solved}, so that the two can be compared field by field. Temperatures in K.
 *
 * @param currentA              terminal current, A (0 in the passive case)
 * @param voltageV              terminal voltage, V
 * @param powerW                electrical input, W
 * @param cop                   heat load / power; +∞ when no power is needed
 * @param setPointK               object temperature (the set-point), K
 * @param coldSideK             cold face, K
 * @param hotSideK              hot face, K
 * @param heatRejectedW         heat into the hot-side path Qh = Qc + P, W
 * @param heatLoadW             heat pumped from the object, W
 * @param maxHeatLoadW          most heat removable while holding the object at setPointK with this heat sink, W
 *                              (NaN when the search failed)
 * @param currentAtMaxHeatLoadA current at that most heat, A
 * @param lowestLegK            coldest temperature in any leg at the operating point, K
 * @param highestLegK           hottest temperature in any leg, K
 * @param withinMaterialRange   whether every leg temperature lay within the material set's range
 * @param materialName          name of the material set used
 */
public record DetailedPoint(double currentA, double voltageV, double powerW, double cop, double setPointK,
                            double coldSideK, double hotSideK, double heatRejectedW, double heatLoadW,
                            double maxHeatLoadW, double currentAtMaxHeatLoadA, double lowestLegK,
                            double highestLegK, boolean withinMaterialRange, String materialName)
        implements DetailedResult {
}
