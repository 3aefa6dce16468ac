package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

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
    void rejectsAirBeyondTheExtrapolatedRange() {
        assertThatThrownBy(() -> dewPoint.dewPointC(201, 0.5))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e).hasMessage("airC must be within [-100.0, 200.0], was 201.0"));
    }

    @Test
    void hotHumidAirOutsideTheFitStillHasADewPoint() {
        // 55 °C and 90 % RH: the Magnus form extrapolated gives 52.83 °C (hand arithmetic: γ = ln 0.9 +
        // 17.625·55/298.04 = 3.14714, Td = 243.04·γ/(17.625 − γ) = 52.83 °C); it used to be refused
        assertThat(dewPoint.withinFit(55)).isFalse();
        assertThat(dewPoint.dewPointC(55, 0.9)).isCloseTo(52.83, within(0.005));
    }

    /**
     * Above the fit the extrapolation errs high, so a warning based on it comes early. Reference: the dew point
     * from PsychroLib 2.5.0 (npm package psychrolib 1.1.1), a general-purpose psychrometrics library that
     * implements ASHRAE Handbook—Fundamentals (2017) ch. 1 eqs. 5 and 6 (saturation pressure over ice and over
     * water, after Hyland &amp; Wexler 1983): computed with its GetTDewPointFromVapPres(T, RH·GetSatVapPres(T)) in
     * SI units.
     */
    @ParameterizedTest(name = "{0} °C, RH {1}: ASHRAE {2} °C")
    @CsvSource({"55, 0.9, 52.8177", "60, 0.3, 36.1115", "70, 0.9, 67.5837", "80, 0.5, 63.7821",
            "90, 0.9, 87.2502", "100, 0.2, 60.3657", "100, 0.9, 97.0744"})
    void extrapolatedDewPointAbove50CLiesAtOrAboveTheAshraeValue(double airC, double rh, double ashraeC) {
        assertThat(dewPoint.dewPointC(airC, rh)).isGreaterThanOrEqualTo(ashraeC).isCloseTo(ashraeC, within(0.5));
    }

    @Test
    void inTheFitTheDewPointAgreesWithTheAshraeFormulation() {
        // PsychroLib 2.5.0 as above: 25 °C, 60 % → 16.7011 °C; Magnus 16.698 °C (check case S17 prints 16.70)
        assertThat(dewPoint.dewPointC(25, 0.6)).isCloseTo(16.7011, within(0.01));
    }

    /**
     * Frost point with the humidity taken with respect to water. Reference: PsychroLib 2.5.0 as above, whose
     * saturation pressure below 0.01 °C is over ice (ASHRAE 2017 ch. 1 eq. 5), so its dew point from the vapour
     * pressure e = RH·e_w(T) is the frost point.
     */
    @ParameterizedTest(name = "{0} °C, RH {1}: ASHRAE frost point {2} °C")
    @CsvSource({"25, 0.1, -7.7466", "20, 0.15, -6.5769", "10, 0.3, -6.0105", "5, 0.5, -4.0332",
            "30, 0.05, -12.2590", "25, 0.02, -24.9850"})
    void frostPointAgreesWithTheAshraeFormulation(double airC, double rh, double ashraeC) {
        assertThat(dewPoint.frostPointC(airC, rh)).isCloseTo(ashraeC, within(0.05));
    }

    @Test
    void belowZeroTheFrostPointLiesAboveTheDewPoint() {
        // ice holds less vapour than supercooled water at the same temperature (e_i < e_w below 0 °C)
        assertThat(dewPoint.frostPointC(25, 0.1)).isGreaterThan(dewPoint.dewPointC(25, 0.1));
    }

    @Test
    void airSaturatedOverIceIsAtItsFrostPoint() {
        // definition: at −10 °C, RH with respect to water of e_i(−10)/e_w(−10) saturates the air over ice
        double ratio = 6.1121 * Math.exp(22.587 * -10 / (273.86 - 10)) / (6.1094 * Math.exp(17.625 * -10 / (243.04 - 10)));
        assertThat(dewPoint.frostPointC(-10, ratio)).isCloseTo(-10, within(1e-9));
    }
}
