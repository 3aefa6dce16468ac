package org.chillwright.physics;

/**
 * The top of the concave curve Qc(I) of a heat-sink-coupled cooler (see {@link OperatingPointSolver}):
 * beyond this current more current pumps less.
 *
 * @param currentA current at the peak, A (0 when any current only lowers Qc)
 * @param heatW    cooling at the peak, W (negative when even zero load cannot be held)
 */
public record CapacityPeak(double currentA, double heatW) {
}
