package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class ParasiticLoadTest {

    @Test
    void blackBodyAtRoomTemperatureRadiatesTheTextbookFlux() {
        // σT⁴ at 300 K is 459.3 W/m² (Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, ch. 1,
        // from memory); against surroundings at 0 K the net exchange of 1 m² is that flux
        var load = new ParasiticLoad(0, 1, 1, 0);
        assertThat(-load.radiationW(300, 1e-9)).isCloseTo(459.3, within(0.1));
    }

    @Test
    void convectionFollowsNewtonsLawOfCooling() {
        // h = 10 W/m²K on 10 cm² with 20 K difference: 10 · 1e-3 · 20 = 0.2 W (hand arithmetic)
        var load = new ParasiticLoad(10, 1e-3, 0, 0);
        assertThat(load.convectionW(278.15, 298.15)).isCloseTo(0.2, within(1e-12));
    }

    @Test
    void totalIsTheSumAndVanishesWithoutATemperatureDifference() {
        var load = new ParasiticLoad(8, 2e-3, 0.9, 0.004);
        assertThat(load.totalW(290, 290)).isZero();
        assertThat(load.totalW(280, 300)).isCloseTo(
                load.convectionW(280, 300) + load.radiationW(280, 300) + load.conductionW(280, 300), within(1e-15));
    }

    @Test
    void rejectsAnEmissivityAboveOne() {
        assertThatThrownBy(() -> new ParasiticLoad(5, 1e-3, 1.2, 0))
                .isInstanceOf(InvalidQuantityException.class).hasMessageContaining("emissivity");
    }
}
