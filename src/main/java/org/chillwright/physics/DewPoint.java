package org.chillwright.physics;

/**
 * Dew and frost point of moist air: the role behind which a published model sits. Relative humidity is
 * taken with respect to water at every air temperature, as meteorological practice defines it (WMO Guide to
 * Instruments and Methods of Observation, WMO-No. 8, from memory).
 */
public interface DewPoint {

    /**
     * Dew point (over water), °C. The published formulas are written in °C, so this is the one place
     * physics takes Celsius.
     *
     * @param airC             air temperature, °C, within {@link #lowestAirC()} to {@link #highestAirC()}
     * @param relativeHumidity relative humidity with respect to water as a fraction, (0, 1]
     */
    double dewPointC(double airC, double relativeHumidity);

    /**
     * Frost point (over ice), °C: the temperature at which the air's vapour is saturated over ice. Above the
     * dew point whenever that is below 0 °C, so it is the one to check a cold face against there.
     *
     * @param airC             air temperature, °C, as {@link #dewPointC}
     * @param relativeHumidity relative humidity with respect to water as a fraction, (0, 1]
     */
    double frostPointC(double airC, double relativeHumidity);

    /** Whether the model was fitted at this air temperature, °C; outside it the value is extrapolated. */
    boolean withinFit(double airC);

    /** Lowest air temperature the model accepts at all, °C (extrapolated below the fit). */
    double lowestAirC();

    /** Highest air temperature the model accepts at all, °C (extrapolated above the fit). */
    double highestAirC();

    /** Dew point, K, of air at {@code airK} (K, &gt; 0) and relative humidity (fraction, (0, 1]). */
    default double dewPointK(double airK, double relativeHumidity) {
        return Units.kelvinFromCelsius(dewPointC(Units.celsiusFromKelvin(airK), relativeHumidity));
    }

    /** Frost point, K, of air at {@code airK} (K, &gt; 0) and relative humidity (fraction, (0, 1]). */
    default double frostPointK(double airK, double relativeHumidity) {
        return Units.kelvinFromCelsius(frostPointC(Units.celsiusFromKelvin(airK), relativeHumidity));
    }
}
