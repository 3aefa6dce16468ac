package org.chillwright.physics;

/**
 * A module described by its construction: N couples of one p-type and one n-type leg,
 * electrically in series and thermally in parallel (H.J. Goldsmid, Introduction to Thermoelectricity, 2016,
 * from memory).
 *
 * <p>Source: the standard leg-geometry relations S = N(αp − αn), R = N[ρp·L/Ap + ρn·L/An + contacts],
 * K = N(kp·Ap + kn·An)/L (H.J. Goldsmid, Introduction to Thermoelectricity, 2016, device chapter,
 * from memory), with a specific contact resistance ρc at each of the four leg ends of a couple
 * (D.M. Rowe &amp; G. Min, J. Power Sources 73, 1998, 193, from memory). Ceramic plates, solder and
 * grease are not part of K: put them in the interface resistances of {@link CoolingCase}.
 *
 * @param couples                 number of p-n couples N, ≥ 1
 * @param legAreaPM2              cross-section of a p leg, m², &gt; 0
 * @param legAreaNM2              cross-section of an n leg, m², &gt; 0 (equal to the p area in most modules)
 * @param legLengthM              leg length L, m, &gt; 0
 * @param seebeckPVPerK           Seebeck coefficient of the p legs αp, V/K (positive for p-type)
 * @param seebeckNVPerK           Seebeck coefficient of the n legs αn, V/K (negative for n-type), &lt; αp
 * @param resistivityPOhmM        electrical resistivity of the p legs, Ω·m, &gt; 0
 * @param resistivityNOhmM        electrical resistivity of the n legs, Ω·m, &gt; 0
 * @param conductivityPWPerMK     thermal conductivity of the p legs, W/(m·K), &gt; 0
 * @param conductivityNWPerMK     thermal conductivity of the n legs, W/(m·K), &gt; 0
 * @param contactResistivityOhmM2 specific electrical contact resistance per leg end, Ω·m², ≥ 0
 */
public record LegConstruction(int couples, double legAreaPM2, double legAreaNM2, double legLengthM,
                              double seebeckPVPerK, double seebeckNVPerK,
                              double resistivityPOhmM, double resistivityNOhmM,
                              double conductivityPWPerMK, double conductivityNWPerMK,
                              double contactResistivityOhmM2) {

    public LegConstruction {
        Check.atLeastOne("couples", couples);
        Check.positive("legAreaPM2", legAreaPM2);
        Check.positive("legAreaNM2", legAreaNM2);
        Check.positive("legLengthM", legLengthM);
        Check.finite("seebeckPVPerK", seebeckPVPerK);
        Check.below("seebeckNVPerK", seebeckNVPerK, seebeckPVPerK, "seebeckPVPerK");
        Check.positive("resistivityPOhmM", resistivityPOhmM);
        Check.positive("resistivityNOhmM", resistivityNOhmM);
        Check.positive("conductivityPWPerMK", conductivityPWPerMK);
        Check.positive("conductivityNWPerMK", conductivityNWPerMK);
        Check.nonNegative("contactResistivityOhmM2", contactResistivityOhmM2);
    }

    /** Construction with equal p and n leg areas and no contact resistance. */
    public static LegConstruction ofEqualLegs(int couples, double legAreaM2, double legLengthM,
                                              double seebeckPVPerK, double seebeckNVPerK,
                                              double resistivityPOhmM, double resistivityNOhmM,
                                              double conductivityPWPerMK, double conductivityNWPerMK) {
        return new LegConstruction(couples, legAreaM2, legAreaM2, legLengthM, seebeckPVPerK, seebeckNVPerK,
                resistivityPOhmM, resistivityNOhmM, conductivityPWPerMK, conductivityNWPerMK, 0.0);
    }

    /** The same construction with a specific contact resistance per leg end, Ω·m², ≥ 0. */
    public LegConstruction withContactResistivity(double contactResistivityOhmM2) {
        return new LegConstruction(couples, legAreaPM2, legAreaNM2, legLengthM, seebeckPVPerK, seebeckNVPerK,
                resistivityPOhmM, resistivityNOhmM, conductivityPWPerMK, conductivityNWPerMK,
                contactResistivityOhmM2);
    }

    /**
     * Lumped parameters (Goldsmid 2016, from memory; case S01): S = N(αp − αn);
     * R = N[ρp·L/Ap + ρn·L/An + 2ρc/Ap + 2ρc/An] (two contacts per leg); K = N(kp·Ap/L + kn·An/L).
     * Each leg uses its own A/L.
     */
    public ModuleParameters toParameters() {
        double s = couples * (seebeckPVPerK - seebeckNVPerK);
        double legResistanceOhm = resistivityPOhmM * legLengthM / legAreaPM2
                + resistivityNOhmM * legLengthM / legAreaNM2;
        double contactResistanceOhm = 2 * contactResistivityOhmM2 / legAreaPM2
                + 2 * contactResistivityOhmM2 / legAreaNM2;
        double r = couples * (legResistanceOhm + contactResistanceOhm);
        double k = couples * (conductivityPWPerMK * legAreaPM2 + conductivityNWPerMK * legAreaNM2) / legLengthM;
        return new ModuleParameters(s, r, k);
    }

    /**
     * Dimensionless figure of merit of one material, Z·T = α²T/(ρ·k) (Goldsmid 2016,
     * from memory; case S18).
     *
     * @param seebeckVPerK         α, V/K, finite
     * @param resistivityOhmM      ρ, Ω·m, &gt; 0
     * @param conductivityWPerMK   k, W/(m·K), &gt; 0
     * @param temperatureK         T, K, &gt; 0
     */
    public static double materialZt(double seebeckVPerK, double resistivityOhmM, double conductivityWPerMK,
                                    double temperatureK) {
        Check.finite("seebeckVPerK", seebeckVPerK);
        Check.positive("resistivityOhmM", resistivityOhmM);
        Check.positive("conductivityWPerMK", conductivityWPerMK);
        Check.positive("temperatureK", temperatureK);
        return seebeckVPerK * seebeckVPerK * temperatureK / (resistivityOhmM * conductivityWPerMK);
    }
}
