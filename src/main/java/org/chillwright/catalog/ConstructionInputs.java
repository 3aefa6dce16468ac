package org.chillwright.catalog;

import jakarta.annotation.Nullable;
import org.chillwright.physics.LegConstruction;
import org.chillwright.physics.Units;

/**
 * A module described by its couples, leg geometry (mm, mm²) and leg materials (SI), as in the
 * module JSON of the HTTP contract. Wrapper types so that missing input can be named.
 *
 * @param legAreaNMm2             optional: the n-leg area when it differs from the p-leg area
 * @param contactResistivityOhmM2 optional: electrical contact resistance per leg end, 0 when absent
 */
public record ConstructionInputs(Integer couples, Double legAreaMm2, @Nullable Double legAreaNMm2, Double legLengthMm,
                                 Double seebeckPVPerK, Double seebeckNVPerK,
                                 Double resistivityPOhmM, Double resistivityNOhmM,
                                 Double conductivityPWPerMK, Double conductivityNWPerMK,
                                 @Nullable Double contactResistivityOhmM2) {

    /** The construction for the physics engine; call only on checked inputs. */
    public LegConstruction toLegConstruction() {
        double areaPM2 = Units.squareMetresFromSquareMillimetres(legAreaMm2);
        double areaNM2 = legAreaNMm2 == null ? areaPM2 : Units.squareMetresFromSquareMillimetres(legAreaNMm2);
        return new LegConstruction(couples, areaPM2, areaNM2, Units.metresFromMillimetres(legLengthMm),
                seebeckPVPerK, seebeckNVPerK, resistivityPOhmM, resistivityNOhmM,
                conductivityPWPerMK, conductivityNWPerMK,
                contactResistivityOhmM2 == null ? 0.0 : contactResistivityOhmM2);
    }
}
