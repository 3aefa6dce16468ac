package org.chillwright.physics;

/**
 * One generator design through a converter, for a ranking.
 *
 * @param index  position of the design in the list that was ranked, so the caller can find its module again
 * @param design the array of modules
 * @param point  the design through the converter
 */
public record ConditionedDesign(int index, ModuleArray design, ConditionedPoint point) {
}
