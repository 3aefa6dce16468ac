package org.chillwright.physics;

/**
 * Dew and frost point by the Magnus form with the constants of O.A. Alduchov &amp; R.E. Eskridge, "Improved
 * Magnus form approximation of saturation vapor pressure", J. Appl. Meteorol. 35(4), 601–609, 1996.
 *
 * <p>Over water: e_w(T) = 6.1094·exp(17.625·T/(243.04 + T)) hPa, fitted for air from −40 °C to +50 °C;
 * inverted, γ = ln(RH) + 17.625·T/(243.04 + T) and Td = 243.04·γ/(17.625 − γ). Over ice:
 * e_i(T) = 6.1121·exp(22.587·T/(273.86 + T)) hPa (the same paper's ice constants; range below 0 °C). The
 * frost point takes the vapour pressure from the humidity with respect to water, e = RH·e_w(T), and
 * inverts the ice form: γi = ln(e/6.1121), Tf = 273.86·γi/(22.587 − γi).
 *
 * <p>Outside the fit the formulas are extrapolated, from −100 °C to +200 °C air. Above +50 °C the
 * extrapolated dew point lies above the one from the ASHRAE Handbook—Fundamentals (2017) ch. 1 formulation
 * (Hyland &amp; Wexler 1983) up to 100 °C (checked in DewPointMagnusTest against PsychroLib), so a warning
 * based on it comes early rather than late; callers say when a value is extrapolated.
 */
public final class DewPointMagnus implements DewPoint {

    /** Magnus coefficient a over water (dimensionless), Alduchov &amp; Eskridge 1996. */
    private static final double WATER_A = 17.625;
    /** Magnus coefficient b over water, °C, Alduchov &amp; Eskridge 1996. */
    private static final double WATER_B_C = 243.04;
    /** Saturation vapour pressure over water at 0 °C, hPa, Alduchov &amp; Eskridge 1996. */
    private static final double WATER_E0_HPA = 6.1094;
    /** Magnus coefficient a over ice (dimensionless), Alduchov &amp; Eskridge 1996. */
    private static final double ICE_A = 22.587;
    /** Magnus coefficient b over ice, °C, Alduchov &amp; Eskridge 1996. */
    private static final double ICE_B_C = 273.86;
    /** Saturation vapour pressure over ice at 0 °C, hPa, Alduchov &amp; Eskridge 1996. */
    private static final double ICE_E0_HPA = 6.1121;
    /** Lower end of the published fit over water, °C. */
    static final double LOWEST_FIT_C = -40.0;
    /** Upper end of the published fit over water, °C. */
    static final double HIGHEST_FIT_C = 50.0;
    /** Coldest air accepted (extrapolated), °C. */
    static final double LOWEST_AIR_C = -100.0;
    /** Hottest air accepted (extrapolated), °C. */
    static final double HIGHEST_AIR_C = 200.0;

    /**
     * {@inheritDoc}
     *
     * @param airC             air temperature, °C, from −100 to +200 (fitted from −40 to +50)
     * @param relativeHumidity relative humidity as a fraction, (0, 1]
     */
    @Override
    public double dewPointC(double airC, double relativeHumidity) {
        double gamma = Math.log(relativeHumidity) + waterExponent(airC, relativeHumidity);
        return WATER_B_C * gamma / (WATER_A - gamma);
    }

    /**
     * {@inheritDoc}
     *
     * @param airC             air temperature, °C, from −100 to +200 (fitted from −40 to +50)
     * @param relativeHumidity relative humidity with respect to water as a fraction, (0, 1]
     */
    @Override
    public double frostPointC(double airC, double relativeHumidity) {
        // e = RH·e_w(T); γi = ln(e/e_i0) = ln(RH) + ln(e_w0/e_i0) + a_w·T/(b_w + T)
        double gamma = Math.log(relativeHumidity) + Math.log(WATER_E0_HPA / ICE_E0_HPA)
                + waterExponent(airC, relativeHumidity);
        return ICE_B_C * gamma / (ICE_A - gamma);
    }

    @Override
    public boolean withinFit(double airC) {
        return airC >= LOWEST_FIT_C && airC <= HIGHEST_FIT_C;
    }

    @Override
    public double lowestAirC() {
        return LOWEST_AIR_C;
    }

    @Override
    public double highestAirC() {
        return HIGHEST_AIR_C;
    }

    private static double waterExponent(double airC, double relativeHumidity) {
        Check.within("airC", airC, LOWEST_AIR_C, HIGHEST_AIR_C);
        Check.fraction("relativeHumidity", relativeHumidity);
        return WATER_A * airC / (WATER_B_C + airC);
    }
}
