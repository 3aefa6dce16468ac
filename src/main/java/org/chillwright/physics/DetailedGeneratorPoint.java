package org.chillwright.physics;

/**
 * A generator point of the detailed model (the quantities of {@link GeneratorPoint}) with where the
 * leg temperatures lay against the material's range.
 *
 * @param point               load, current, voltage, power, efficiency, junction temperatures, heat in
 * @param lowestLegK          coldest temperature in any leg, K
 * @param highestLegK         hottest temperature in any leg, K
 * @param withinMaterialRange whether every leg temperature lay within the material set's range
 * @param materialName        name of the material set used
 */
public record DetailedGeneratorPoint(GeneratorPoint point, double lowestLegK, double highestLegK,
                                     boolean withinMaterialRange, String materialName) {
}
