package org.chillwright.web;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.EnumSource;

/** Conversions against the defining values of NIST SP 811 (2008), Appendix B. */
class UnitsAtTheEdgeTest {

    @ParameterizedTest
    @CsvSource({"C, 25, 25", "F, 212, 100", "F, 32, 0", "F, -40, -40", "K, 273.15, 0", "K, 0, -273.15"})
    void temperaturesConvertToCelsius(TemperatureUnit unit, double value, double celsius) {
        assertThat(unit.toCelsius(value)).isCloseTo(celsius, within(1e-12));
    }

    @ParameterizedTest
    @EnumSource(TemperatureUnit.class)
    void temperaturesRoundTrip(TemperatureUnit unit) {
        assertThat(unit.toCelsius(unit.fromCelsius(-12.345))).isCloseTo(-12.345, within(1e-12));
    }

    @ParameterizedTest
    @CsvSource({"C, 10, 10", "K, 10, 10", "F, 18, 10"})
    void differencesConvertToKelvin(TemperatureUnit unit, double difference, double kelvin) {
        assertThat(unit.differenceToKelvin(difference)).isCloseTo(kelvin, within(1e-12));
    }

    @ParameterizedTest
    @CsvSource({"W, 10, 10", "BTU_PER_HOUR, 100, 29.30711"})
    void powersConvertToWatts(PowerUnit unit, double value, double watts) {
        assertThat(unit.toWatts(value)).isCloseTo(watts, within(1e-9));
        assertThat(unit.fromWatts(unit.toWatts(value))).isCloseTo(value, within(1e-9));
    }
}
