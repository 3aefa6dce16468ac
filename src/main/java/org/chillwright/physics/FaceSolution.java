package org.chillwright.physics;

/**
 * The detailed model between fixed face temperatures at a fixed terminal current.
 *
 * @param currentA            terminal current, A (positive pumps heat from the cold face to the hot face)
 * @param coldSideK           cold face, K
 * @param hotSideK            hot face, K
 * @param coldSideHeatW       heat drawn from the cold face Qc, W
 * @param hotSideHeatW        heat released at the hot face Qh, W
 * @param voltageV            terminal voltage, V
 * @param powerW              electrical input I·V, W (= Qh − Qc)
 * @param lowestLegK          coldest temperature in any leg, K
 * @param highestLegK         hottest temperature in any leg, K
 * @param withinMaterialRange whether every leg temperature lay within the material set's range
 */
public record FaceSolution(double currentA, double coldSideK, double hotSideK, double coldSideHeatW,
                           double hotSideHeatW, double voltageV, double powerW, double lowestLegK,
                           double highestLegK, boolean withinMaterialRange) {
}
