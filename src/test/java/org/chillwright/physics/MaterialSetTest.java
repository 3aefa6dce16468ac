package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class MaterialSetTest {

    private static final MaterialSet SET = MaterialSet.BI2TE3_COUPLE_AVERAGE;

    @Test
    void theBismuthTellurideFitGivesTypicalRoomTemperatureValues() {
        // Sanity against physics.md d (Goldsmid; Rowe CRC Handbook 1995, from memory): |α| about 200 µV/K,
        // ρ about 1e-5 Ω·m, k about 1.5 W/(m·K), ZT about 0.7 to 1 at 300 K. Values of the fit at 300 K
        // evaluated by hand from the printed coefficients: α = 2.2224e-5 + 9.306e-7·300 − 9.905e-10·300².
        LegMaterial p = SET.p();
        assertThat(p.seebeckVPerK().valueAt(300)).isCloseTo(2.2224e-5 + 2.7918e-4 - 8.9145e-5, within(1e-12));
        assertThat(p.resistivityOhmM().valueAt(300)).isCloseTo(1.106e-5, within(0.01e-5));
        assertThat(p.conductivityWPerMK().valueAt(300)).isCloseTo(1.648, within(0.001));
        double zt = LegConstruction.materialZt(p.seebeckVPerK().valueAt(300), p.resistivityOhmM().valueAt(300),
                p.conductivityWPerMK().valueAt(300), 300);
        assertThat(zt).isBetween(0.7, 0.8);
        assertThat(SET.n().seebeckVPerK().valueAt(300)).isEqualTo(-p.seebeckVPerK().valueAt(300));
    }

    @Test
    void theThomsonCoefficientIsTemperatureTimesTheSeebeckSlope() {
        // Kelvin's second relation τ = T·dα/dT (physics.md d); positive for this fit near room temperature.
        double slope = 9.306e-7 - 2 * 9.905e-10 * 300;
        assertThat(SET.p().thomsonVPerK(300)).isCloseTo(300 * slope, within(1e-15));
        assertThat(SET.p().thomsonVPerK(300)).isPositive();
    }

    @Test
    void polynomialAntiderivativeIsExact() {
        var c = new PolynomialCurve(295, new double[] {1, 2, 3});
        // ∫ from 295 to 305 of 1 + 2x + 3x² dx with x = T − 295: 10 + 100 + 1000
        assertThat(c.antiderivativeAt(305) - c.antiderivativeAt(295)).isCloseTo(1110, within(1e-9));
    }

    @Test
    void tableCurveInterpolatesAndIntegratesPiecewise() {
        var t = new TableCurve(new double[] {250, 300, 350}, new double[] {1e-5, 2e-5, 2e-5});
        assertThat(t.valueAt(275)).isCloseTo(1.5e-5, within(1e-15));
        assertThat(t.antiderivativeAt(350) - t.antiderivativeAt(250)).isCloseTo(50 * 1.5e-5 + 50 * 2e-5,
                within(1e-15));
        assertThat(t.valueAt(400)).isEqualTo(2e-5); // held at the end value
    }

    @Test
    void aUserDefinedSetWithANegativeResistivityIsRefusedNamingTheField() {
        var p = new LegMaterial(PolynomialCurve.inKelvin(2e-4), PolynomialCurve.inKelvin(2e-5, -1e-7),
                PolynomialCurve.inKelvin(1.5));
        assertThatThrownBy(() -> MaterialSet.symmetric("mine", "user-defined", p, 200, 400))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("p.resistivityOhmM"));
    }

    @Test
    void aUserDefinedSetWhoseLegsDoNotFormACoupleIsRefused() {
        var p = LegMaterial.constant(-1e-4, 1e-5, 1.5);
        var n = LegMaterial.constant(1e-4, 1e-5, 1.5);
        assertThatThrownBy(() -> new MaterialSet("mine", "user-defined", p, n, 250, 350))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("p.seebeckVPerK"));
    }

    @Test
    void aTableWithTemperaturesOutOfOrderIsRefused() {
        assertThatThrownBy(() -> new TableCurve(new double[] {300, 250}, new double[] {1, 2}))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("temperaturesK[1]"));
    }
}
