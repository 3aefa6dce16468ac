package org.chillwright.physics;

/**
 * Heat leaking into a cold object from warmer surroundings: convection, radiation and conduction
 * through leads and supports. All flows are positive when the ambient is warmer than the object.
 *
 * @param convectionCoefficientWPerM2K h of the air around the object, W/(m²·K), ≥ 0 (natural convection in
 *                                     still air is roughly 5 to 10: common practice, no source)
 * @param exposedAreaM2                area of the cold object exposed to the air and the surroundings, m², ≥ 0
 * @param emissivity                   emissivity of that surface, [0, 1]
 * @param leadConductanceWPerK         total conductance of leads, fibres, screws and supports to ambient, W/K, ≥ 0
 */
public record ParasiticLoad(double convectionCoefficientWPerM2K, double exposedAreaM2, double emissivity,
                            double leadConductanceWPerK) {

    /**
     * Stefan–Boltzmann constant, W/(m²·K⁴): CODATA 2018 (exact since the 2019 SI redefinition),
     * P.J. Mohr et al., "CODATA recommended values of the fundamental physical constants: 2018".
     */
    public static final double STEFAN_BOLTZMANN_W_PER_M2K4 = 5.670374419e-8;

    public ParasiticLoad {
        Check.nonNegative("convectionCoefficientWPerM2K", convectionCoefficientWPerM2K);
        Check.nonNegative("exposedAreaM2", exposedAreaM2);
        Check.within("emissivity", emissivity, 0, 1);
        Check.nonNegative("leadConductanceWPerK", leadConductanceWPerK);
    }

    /** Newton's law of cooling, h·A·(Tamb − Tobj), W (Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, ch. 1). */
    public double convectionW(double setPointK, double ambientK) {
        return convectionCoefficientWPerM2K * exposedAreaM2 * (ambientK - setPointK);
    }

    /**
     * Radiation exchange of a small grey surface with large surroundings at ambient, ε·σ·A·(Tamb⁴ − Tobj⁴), W
     * (Incropera & DeWitt, ch. 1, small body in a large enclosure).
     */
    public double radiationW(double setPointK, double ambientK) {
        Check.positive("setPointK", setPointK);
        Check.positive("ambientK", ambientK);
        double ambient2 = ambientK * ambientK;
        double object2 = setPointK * setPointK;
        return emissivity * STEFAN_BOLTZMANN_W_PER_M2K4 * exposedAreaM2 * (ambient2 * ambient2 - object2 * object2);
    }

    /** Conduction through leads and supports, G·(Tamb − Tobj), W (Fourier's law in lumped form). */
    public double conductionW(double setPointK, double ambientK) {
        return leadConductanceWPerK * (ambientK - setPointK);
    }

    /** The three together, W. */
    public double totalW(double setPointK, double ambientK) {
        return convectionW(setPointK, ambientK) + radiationW(setPointK, ambientK) + conductionW(setPointK, ambientK);
    }
}
