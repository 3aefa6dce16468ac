package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

class GeneratorRisksTest {

    @Test
    void aModuleWithoutAStatedMaximumIsFlaggedAsUnchecked() {
        assertThat(GeneratorRisks.of(3, 400, Double.NaN)).extracting(Warning::code)
                .containsExactly(Warning.Code.HOT_SIDE_LIMIT_UNCHECKED);
    }

    @Test
    void aHotJunctionAboveTheStatedMaximumIsWarnedAbout() {
        assertThat(GeneratorRisks.of(3, 473.16, 473.15)).extracting(Warning::code)
                .containsExactly(Warning.Code.HOT_SIDE_ABOVE_LIMIT);
        assertThat(GeneratorRisks.of(3, 473.15, 473.15)).isEmpty();
    }

    @Test
    void anOpenCircuitVoltageAbove60VIsAShockHazard() {
        // 60 V DC: the usual extra-low-voltage limit for dry locations (common practice, no source)
        assertThat(GeneratorRisks.of(60.0, 400, 473.15)).isEmpty();
        assertThat(GeneratorRisks.of(60.01, 400, 473.15)).extracting(Warning::code)
                .containsExactly(Warning.Code.SHOCK_HAZARD_VOLTAGE);
    }
}
