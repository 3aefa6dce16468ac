package org.chillwright.physics;

/**
 * The temperature-dependent properties of the material of one leg type.
 *
 * @param seebeckVPerK       Seebeck coefficient α(T), V/K (positive for p-type, negative for n-type)
 * @param resistivityOhmM    electrical resistivity ρ(T), Ω·m (&gt; 0 over the set's range)
 * @param conductivityWPerMK thermal conductivity k(T), W/(m·K) (&gt; 0 over the set's range)
 */
public record LegMaterial(PropertyCurve seebeckVPerK, PropertyCurve resistivityOhmM,
                          PropertyCurve conductivityWPerMK) {

    public LegMaterial {
        if (seebeckVPerK == null || resistivityOhmM == null || conductivityWPerMK == null) {
            throw new InvalidQuantityException(seebeckVPerK == null ? "seebeckVPerK"
                    : resistivityOhmM == null ? "resistivityOhmM" : "conductivityWPerMK", Double.NaN,
                    "every property curve of a leg material must be given");
        }
    }

    /** Constant properties. */
    public static LegMaterial constant(double seebeckVPerK, double resistivityOhmM, double conductivityWPerMK) {
        return new LegMaterial(PropertyCurve.constant(seebeckVPerK), PropertyCurve.constant(resistivityOhmM),
                PropertyCurve.constant(conductivityWPerMK));
    }

    /** The material with each property multiplied by its factor (all &gt; 0). */
    public LegMaterial scaled(double seebeckFactor, double resistivityFactor, double conductivityFactor) {
        return new LegMaterial(seebeckVPerK.scaled(seebeckFactor), resistivityOhmM.scaled(resistivityFactor),
                conductivityWPerMK.scaled(conductivityFactor));
    }

    /** Thomson coefficient τ = T·dα/dT, V/K (Kelvin's second relation; physics.md d). */
    public double thomsonVPerK(double temperatureK) {
        return temperatureK * seebeckVPerK.slopeAt(temperatureK);
    }
}
