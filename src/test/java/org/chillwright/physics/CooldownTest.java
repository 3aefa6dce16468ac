package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class CooldownTest {

    /** The set-up of check case S16. */
    private static final Cooldown S16 = new Cooldown(new ModuleParameters(0.04, 2.4, 0.25), 2, 300, 50, 2, 300, 20);

    @Test
    void timeToTargetInvertsTheTemperatureCurve() {
        double timeS = S16.timeToTargetS(300, 270).orElseThrow();
        assertThat(S16.temperatureAtK(300, timeS)).isCloseTo(270, within(1e-9));
    }

    @Test
    void targetBelowFinalTemperatureIsNeverReached() {
        assertThat(S16.timeToTargetS(300, S16.finalK() - 0.1)).isEmpty();
    }

    @Test
    void startAtTargetTakesNoTime() {
        assertThat(S16.timeToTargetS(260, 270)).hasValue(0.0);
    }

    @Test
    void settlesAtTheSteadyBalance() {
        // Source: at T∞ the lumped balance Qload + (Tamb - T)/Rleak = Qc(T) holds, lumped capacitance (Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, ch. 5, from memory).
        var module = new ModuleParameters(0.04, 2.4, 0.25);
        double finalK = S16.finalK();
        assertThat(2 + (300 - finalK) / 20).isCloseTo(module.coldSideHeatW(2, finalK, 300), within(1e-9));
    }

    @Test
    void noLeakIsAllowed() {
        var sealed = new Cooldown(new ModuleParameters(0.04, 2.4, 0.25), 2, 300, 50, 2, 300, Double.POSITIVE_INFINITY);
        assertThat(sealed.finalK()).isLessThan(S16.finalK());
    }

    @Test
    void rejectsZeroHeatCapacity() {
        assertThatThrownBy(() -> new Cooldown(new ModuleParameters(0.04, 2.4, 0.25), 2, 300, 0, 2, 300, 20))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("heatCapacityJPerK"));
    }
}
