package org.chillwright.physics;

/**
 * Dew point by the Magnus form over water with the constants of O.A. Alduchov &amp; R.E. Eskridge,
 * "Improved Magnus form approximation of saturation vapor pressure", J. Appl. Meteorol. 35(4),
 * 601–609, 1996: γ = ln(RH) + a·T/(b + T), Td = b·γ/(a − γ), a = 17.625, b = 243.04 °C
 * (physics.md k; case S17). Valid for air from about −40 °C to +50 °C.
 */
public final class DewPointMagnus implements DewPoint {

    /** Magnus coefficient a (dimensionless), Alduchov &amp; Eskridge 1996. */
    private static final double MAGNUS_A = 17.625;
    /** Magnus coefficient b, °C, Alduchov &amp; Eskridge 1996. */
    private static final double MAGNUS_B_C = 243.04;
    /** Lower end of the published fit, °C. */
    static final double LOWEST_AIR_C = -40.0;
    /** Upper end of the published fit, °C. */
    static final double HIGHEST_AIR_C = 50.0;

    /**
     * {@inheritDoc}
     *
     * @param airC             air temperature, °C, from −40 to +50
     * @param relativeHumidity relative humidity as a fraction, (0, 1]
     */
    @Override
    public double dewPointC(double airC, double relativeHumidity) {
        Check.within("airC", airC, LOWEST_AIR_C, HIGHEST_AIR_C);
        Check.fraction("relativeHumidity", relativeHumidity);
        double gamma = Math.log(relativeHumidity) + MAGNUS_A * airC / (MAGNUS_B_C + airC);
        return MAGNUS_B_C * gamma / (MAGNUS_A - gamma);
    }
}
