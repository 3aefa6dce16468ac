package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class TemperatureScheduleTest {

    private static final double[] TIMES_S = {0, 3600, 7200};
    private static final double[] HOT_K = {310, 330, 300};
    private static final double[] COLD_K = {290, 295, 300};

    @ParameterizedTest(name = "{0} s -> {1} K, {2} K")
    @CsvSource({"0, 310, 290", "1800, 320, 292.5", "3600, 330, 295", "5400, 315, 297.5", "-5, 310, 290",
            "9000, 300, 300"})
    void isLinearBetweenPointsAndHeldOutside(double timeS, double hotK, double coldK) {
        var s = new TemperatureSchedule(TIMES_S, HOT_K, COLD_K, TemperatureSchedule.Interpolation.LINEAR);
        assertThat(s.hotSourceAtK(timeS)).isCloseTo(hotK, within(1e-12));
        assertThat(s.coldSinkAtK(timeS)).isCloseTo(coldK, within(1e-12));
    }

    @ParameterizedTest(name = "{0} s -> {1} K")
    @CsvSource({"0, 310", "3599.9, 310", "3600, 330", "7199, 330", "7200, 300"})
    void stepwiseHoldsEachPointUntilTheNext(double timeS, double hotK) {
        var s = new TemperatureSchedule(TIMES_S, HOT_K, COLD_K, TemperatureSchedule.Interpolation.STEPWISE);
        assertThat(s.hotSourceAtK(timeS)).isEqualTo(hotK);
    }

    @Test
    void noInterpolationGivenMeansLinear() {
        assertThat(new TemperatureSchedule(TIMES_S, HOT_K, COLD_K, null).interpolation())
                .isEqualTo(TemperatureSchedule.Interpolation.LINEAR);
    }

    @Test
    void rejectsTimesThatDoNotIncrease() {
        assertThatThrownBy(() -> new TemperatureSchedule(new double[] {0, 60, 60}, HOT_K, COLD_K, null))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("timesS[2]"));
    }

    @Test
    void rejectsAColumnOfTheWrongLength() {
        assertThatThrownBy(() -> new TemperatureSchedule(TIMES_S, new double[] {300, 310}, COLD_K, null))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("hotSourceK"));
    }

    @Test
    void rejectsATemperatureAtOrBelowAbsoluteZero() {
        assertThatThrownBy(() -> new TemperatureSchedule(TIMES_S, HOT_K, new double[] {290, 0, 300}, null))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("coldSinkK[1]"));
    }

    @Test
    void rejectsASinglePoint() {
        assertThatThrownBy(() -> new TemperatureSchedule(new double[] {0}, new double[] {300}, new double[] {290},
                null)).isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("timesS"));
    }
}
