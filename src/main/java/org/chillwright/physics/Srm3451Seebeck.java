package org.chillwright.physics;

/**
 * Certified Seebeck coefficient of the NIST Bi2Te3 reference material SRM 3451 (n-type, certified
 * 10 K to 390 K), a reference curve only, not a property set (physics.md d; case S19):
 * S(T) = S295 + a(T − 295) + b(T − 295)² + c(T − 295)³ + d(T − 295)⁴ in µV/K.
 *
 * <p>Source: N.D. Lowhorn, W. Wong-Ng et al., "Development of a Seebeck coefficient Standard
 * Reference Material", J. Mater. Res. 26(15), 2011, and the NIST certificate of SRM 3451. The
 * coefficients were transcribed from public research code citing the certificate; the certificate
 * itself was not read (verify before relying on them).
 */
public final class Srm3451Seebeck {

    private static final double REFERENCE_K = 295.0;
    private static final double S295_UV_PER_K = -230.03;
    private static final double A_UV_PER_K2 = -2.2040e-1;
    private static final double B_UV_PER_K3 = 3.9706e-3;
    private static final double C_UV_PER_K4 = 7.2922e-6;
    private static final double D_UV_PER_K5 = -1.0864e-9;
    private static final double VOLTS_PER_MICROVOLT = 1e-6;
    /** Certified range, K. */
    private static final double LOWEST_K = 10.0;
    private static final double HIGHEST_K = 390.0;

    private Srm3451Seebeck() {
    }

    /**
     * Seebeck coefficient, V/K (negative: n-type).
     *
     * @param temperatureK temperature, K, within the certified 10 K to 390 K
     */
    public static double seebeckVPerK(double temperatureK) {
        Check.within("temperatureK", temperatureK, LOWEST_K, HIGHEST_K);
        double x = temperatureK - REFERENCE_K;
        double microVoltsPerK = S295_UV_PER_K + x * (A_UV_PER_K2 + x * (B_UV_PER_K3 + x * (C_UV_PER_K4 + x * D_UV_PER_K5)));
        return microVoltsPerK * VOLTS_PER_MICROVOLT;
    }
}
