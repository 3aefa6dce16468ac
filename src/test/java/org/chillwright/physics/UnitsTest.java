package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class UnitsTest {

    @ParameterizedTest
    @ValueSource(doubles = {-40, 0, 25, 80.5})
    void celsiusRoundTripsThroughKelvin(double temperatureC) {
        assertThat(Units.celsiusFromKelvin(Units.kelvinFromCelsius(temperatureC))).isCloseTo(temperatureC,
                within(1e-12));
    }
}
