package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class DewPointMagnusTest {

    private final DewPoint dewPoint = new DewPointMagnus();

    @Test
    void saturatedAirIsAtItsDewPoint() {
        // Source: definition of the dew point; the Magnus form gives γ = a·T/(b + T) at RH = 1, hence Td = T.
        assertThat(dewPoint.dewPointC(21.3, 1.0)).isCloseTo(21.3, within(1e-12));
    }

    @Test
    void kelvinFormAgreesWithCelsiusForm() {
        double airK = Units.kelvinFromCelsius(25);
        assertThat(Units.celsiusFromKelvin(dewPoint.dewPointK(airK, 0.6)))
                .isCloseTo(dewPoint.dewPointC(25, 0.6), within(1e-12));
    }

    @Test
    void rejectsZeroHumidity() {
        assertThatThrownBy(() -> dewPoint.dewPointC(25, 0))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("relativeHumidity"));
    }

    @Test
    void rejectsAirOutsideTheFit() {
        assertThatThrownBy(() -> dewPoint.dewPointC(60, 0.5))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e).hasMessage("airC must be within [-40.0, 50.0], was 60.0"));
    }
}
