package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class LegConstructionTest {

    @Test
    void eachLegUsesItsOwnArea() {
        // Source: leg relations R = N(ρp L/Ap + ρn L/An), K = N(kp Ap + kn An)/L (Goldsmid 2016,
        // from memory); hand arithmetic for 10 couples, Ap = 1 mm², An = 2 mm², L = 1 mm:
        // R = 10(0.01 + 0.005) = 0.15 Ω, K = 10(1.5e-3 + 3e-3) = 0.045 W/K.
        var legs = new LegConstruction(10, 1e-6, 2e-6, 1e-3, 2e-4, -2e-4, 1e-5, 1e-5, 1.5, 1.5, 0);
        ModuleParameters p = legs.toParameters();
        assertThat(p.resistanceOhm()).isCloseTo(0.15, within(1e-12));
        assertThat(p.conductanceWPerK()).isCloseTo(0.045, within(1e-12));
        assertThat(p.seebeckVPerK()).isCloseTo(0.004, within(1e-15));
    }

    @Test
    void contactsOnlyAddResistance() {
        // Source: contacts are electrical only in the Min & Rowe treatment (J. Power Sources 73, 1998, from memory).
        var legs = LegConstruction.ofEqualLegs(100, 1e-6, 1.2e-3, 2e-4, -2e-4, 1e-5, 1e-5, 1.5, 1.5);
        ModuleParameters without = legs.toParameters();
        ModuleParameters with = legs.withContactResistivity(5e-10).toParameters();
        assertThat(with.conductanceWPerK()).isEqualTo(without.conductanceWPerK());
        assertThat(with.resistanceOhm()).isGreaterThan(without.resistanceOhm());
    }

    @Test
    void rejectsNLegSeebeckNotBelowPLeg() {
        assertThatThrownBy(() -> LegConstruction.ofEqualLegs(10, 1e-6, 1e-3, 2e-4, 3e-4, 1e-5, 1e-5, 1.5, 1.5))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("seebeckNVPerK"));
    }

    @Test
    void rejectsNegativeContactResistivity() {
        var legs = LegConstruction.ofEqualLegs(10, 1e-6, 1e-3, 2e-4, -2e-4, 1e-5, 1e-5, 1.5, 1.5);
        assertThatThrownBy(() -> legs.withContactResistivity(-1e-10))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("contactResistivityOhmM2"));
    }
}
