package org.chillwright.physics;

/**
 * A module for the detailed leg model ({@link DetailedSolver}): N couples of one p and one n leg,
 * electrically in series and thermally in parallel between the cold and the hot face, with
 * temperature-dependent materials, an electrical contact resistance and a thermal contact resistance
 * at each of the four leg ends of a couple (physics.md c and d).
 *
 * <p>Sources: leg geometry and contact treatment as {@link LegConstruction} (H.J. Goldsmid,
 * Introduction to Thermoelectricity, 2016; D.M. Rowe &amp; G. Min, J. Power Sources 73 (1998) 193,
 * both from memory). A thermal contact resistance (solder, metallisation) sits in series between a
 * face and the leg end; the ceramic plates and grease stay in the interface resistances of
 * {@link CoolingCase}, as in the lumped model.
 *
 * @param couples                   number of couples N, ≥ 1
 * @param legAreaPM2                cross-section of a p leg, m², &gt; 0
 * @param legAreaNM2                cross-section of an n leg, m², &gt; 0
 * @param legLengthM                leg length L, m, &gt; 0
 * @param contactResistivityOhmM2   specific electrical contact resistance per leg end, Ω·m², ≥ 0
 * @param thermalContactM2KPerW     specific thermal contact resistance per leg end, K·m²/W, ≥ 0
 * @param material                  the p and n materials
 */
public record DetailedModule(int couples, double legAreaPM2, double legAreaNM2, double legLengthM,
                             double contactResistivityOhmM2, double thermalContactM2KPerW, MaterialSet material) {

    /** Leg area and length of the equivalent couple built from lumped parameters: any fixed pair would do. */
    private static final double EQUIVALENT_AREA_M2 = 1e-6;
    private static final double EQUIVALENT_LENGTH_M = 1e-3;

    public DetailedModule {
        Check.atLeastOne("couples", couples);
        Check.positive("legAreaPM2", legAreaPM2);
        Check.positive("legAreaNM2", legAreaNM2);
        Check.positive("legLengthM", legLengthM);
        Check.nonNegative("contactResistivityOhmM2", contactResistivityOhmM2);
        Check.nonNegative("thermalContactM2KPerW", thermalContactM2KPerW);
        if (material == null) {
            throw new InvalidQuantityException("material", Double.NaN, "material must be given");
        }
    }

    /**
     * The detailed twin of a lumped module with constant properties: one equivalent couple with
     * αp = −αn = S/2, ρ = R·A/(2L), k = K·L/(2A) and no contacts, so that S, R and K are exactly the
     * lumped ones at every temperature ("constant properties"; the detailed model then reproduces the
     * ideal equations, see {@link DetailedSolver}).
     */
    public static DetailedModule ofConstantParameters(ModuleParameters lumped) {
        double a = EQUIVALENT_AREA_M2;
        double l = EQUIVALENT_LENGTH_M;
        LegMaterial p = LegMaterial.constant(lumped.seebeckVPerK() / 2, lumped.resistanceOhm() * a / (2 * l),
                lumped.conductanceWPerK() * l / (2 * a));
        MaterialSet set = MaterialSet.symmetric("constant properties", "lumped S, R, K held constant", p, 1.0, 1e4);
        return new DetailedModule(1, a, a, l, 0.0, 0.0, set);
    }

    /**
     * The geometry and electrical contacts of a construction with a temperature-dependent material
     * (the construction's own constant α, ρ, k are not used).
     *
     * @param thermalContactM2KPerW specific thermal contact resistance per leg end, K·m²/W, ≥ 0
     */
    public static DetailedModule of(LegConstruction construction, MaterialSet material, double thermalContactM2KPerW) {
        return new DetailedModule(construction.couples(), construction.legAreaPM2(), construction.legAreaNM2(),
                construction.legLengthM(), construction.contactResistivityOhmM2(), thermalContactM2KPerW, material);
    }

    /** The same module with the material scaled (see {@link MaterialSet#scaled}). */
    public DetailedModule withMaterial(MaterialSet other) {
        return new DetailedModule(couples, legAreaPM2, legAreaNM2, legLengthM, contactResistivityOhmM2,
                thermalContactM2KPerW, other);
    }

    /**
     * Lumped parameters with every property taken at one temperature (physics.md c and d, "Simplest:
     * evaluate α, ρ, k at Tm"): S = N(αp − αn), R = N[ρp·L/Ap + ρn·L/An + 2ρc/Ap + 2ρc/An],
     * K = N[1/(L/(kp·Ap) + 2rt/Ap) + 1/(L/(kn·An) + 2rt/An)] (thermal contacts in series with each leg).
     *
     * @param temperatureK the temperature the properties are taken at, K, &gt; 0
     */
    public ModuleParameters lumpedAt(double temperatureK) {
        Check.positive("temperatureK", temperatureK);
        LegMaterial p = material.p();
        LegMaterial n = material.n();
        double s = couples * material.coupleSeebeckVPerK(temperatureK);
        double r = couples * (p.resistivityOhmM().valueAt(temperatureK) * legLengthM / legAreaPM2
                + n.resistivityOhmM().valueAt(temperatureK) * legLengthM / legAreaNM2
                + 2 * contactResistivityOhmM2 / legAreaPM2 + 2 * contactResistivityOhmM2 / legAreaNM2);
        double k = couples * (1 / (legLengthM / (p.conductivityWPerMK().valueAt(temperatureK) * legAreaPM2)
                + 2 * thermalContactM2KPerW / legAreaPM2)
                + 1 / (legLengthM / (n.conductivityWPerMK().valueAt(temperatureK) * legAreaNM2)
                + 2 * thermalContactM2KPerW / legAreaNM2));
        return new ModuleParameters(s, r, k);
    }
}
