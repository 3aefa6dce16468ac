package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * Heat capacities from mass and material. Source of the expected values: F.P. Incropera, D.P. DeWitt, T.L. Bergman
 * &amp; A.S. Lavine, Fundamentals of Heat and Mass Transfer, 7th ed. 2011, Table A.1 (metals) and Table A.2
 * (nonmetals), cp and ρ at 300 K, multiplied by hand.
 */
class ThermalMassTest {

    @ParameterizedTest(name = "{0}: {1} kg → {2} J/K")
    @CsvSource({
            "COPPER, 0.1, 38.5",        // 385 J/(kg·K)
            "ALUMINIUM, 0.05, 45.15",   // 903 J/(kg·K)
            "BRASS, 0.2, 76.0",         // cartridge brass, 380 J/(kg·K)
            "SILICON, 0.002, 1.424",    // 712 J/(kg·K)
            "ALUMINA, 0.01, 7.65",      // polycrystalline aluminium oxide (Table A.2), 765 J/(kg·K)
            "STAINLESS_STEEL_316, 1, 468"})
    void heatCapacityIsMassTimesTheTablesSpecificHeat(Material material, double massKg, double expectedJPerK) {
        assertThat(ThermalMass.of(material, massKg).heatCapacityJPerK()).isCloseTo(expectedJPerK, within(1e-9));
    }

    @Test
    void aVolumeUsesTheTablesDensity() {
        // 1 cm³ of copper: 8933 kg/m³ × 1e-6 m³ = 8.933 g, × 385 J/(kg·K) = 3.439 J/K
        assertThat(ThermalMass.ofVolume(Material.COPPER, 1e-6).heatCapacityJPerK()).isCloseTo(3.439205, within(1e-9));
    }

    @Test
    void piecesAddUp() {
        ThermalMass part = ThermalMass.of(Material.COPPER, 0.1).plus(ThermalMass.of(Material.ALUMINA, 0.01));
        assertThat(part.heatCapacityJPerK()).isCloseTo(38.5 + 7.65, within(1e-9));
    }

    @Test
    void rejectsANegativeMassNamingIt() {
        assertThatThrownBy(() -> ThermalMass.of(Material.COPPER, -0.1))
                .isInstanceOfSatisfying(InvalidQuantityException.class, e -> assertThat(e.field()).isEqualTo("massKg"));
    }
}
