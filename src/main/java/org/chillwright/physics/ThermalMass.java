package org.chillwright.physics;

/**
 * The heat capacity of what is cooled (the part, its cold plate, half the module's cold ceramic), or of a heat
 * sink: C = m·cp, J/K, summed over its pieces (lumped-capacitance method, F.P. Incropera et al., Fundamentals of
 * Heat and Mass Transfer, 7th ed. 2011, sec. 5.1, valid while the Biot number is below about 0.1).
 *
 * @param heatCapacityJPerK heat capacity, J/K, finite and &gt; 0
 */
public record ThermalMass(double heatCapacityJPerK) {

    public ThermalMass {
        Check.positive("heatCapacityJPerK", heatCapacityJPerK);
    }

    /**
     * A piece of a material by its mass.
     *
     * @param material what it is made of ({@link Material}, specific heat at 300 K)
     * @param massKg   its mass, kg, finite and &gt; 0
     */
    public static ThermalMass of(Material material, double massKg) {
        if (material == null) {
            throw new InvalidQuantityException("material", Double.NaN, "material must be given, was null");
        }
        Check.positive("massKg", massKg);
        return new ThermalMass(massKg * material.specificHeatJPerKgK());
    }

    /**
     * A piece of a material by its volume, with the material's density at 300 K.
     *
     * @param material what it is made of
     * @param volumeM3 its volume, m³, finite and &gt; 0
     */
    public static ThermalMass ofVolume(Material material, double volumeM3) {
        if (material == null) {
            throw new InvalidQuantityException("material", Double.NaN, "material must be given, was null");
        }
        Check.positive("volumeM3", volumeM3);
        return of(material, volumeM3 * material.densityKgPerM3());
    }

    /** This and another piece together, J/K. */
    public ThermalMass plus(ThermalMass other) {
        return new ThermalMass(heatCapacityJPerK + other.heatCapacityJPerK);
    }
}
