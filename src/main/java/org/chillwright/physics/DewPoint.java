package org.chillwright.physics;

/** Dew-point temperature of moist air: the role behind which a published model sits (physics.md k). */
public interface DewPoint {

    /**
     * Dew point, °C. The published formulas are written in °C, so this is the one place physics
     * takes Celsius.
     *
     * @param airC             air temperature, °C, within the model's valid range
     * @param relativeHumidity relative humidity as a fraction, (0, 1]
     */
    double dewPointC(double airC, double relativeHumidity);

    /** Dew point, K, of air at {@code airK} (K, &gt; 0) and relative humidity (fraction, (0, 1]). */
    default double dewPointK(double airK, double relativeHumidity) {
        return Units.kelvinFromCelsius(dewPointC(Units.celsiusFromKelvin(airK), relativeHumidity));
    }
}
