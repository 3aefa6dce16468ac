package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class ModuleParametersTest {

    /** Synthetic module TM-A of the check cases. */
    private static final ModuleParameters TM_A = new ModuleParameters(0.04, 2.4, 0.25);

    @Test
    void zeroCurrentLeavesOnlyConduction() {
        // Source: ideal equations (Ioffe 1957; Goldsmid 2016, from memory): at I = 0, Qc = -K·ΔT.
        assertThat(TM_A.coldSideHeatW(0, 280, 310)).isCloseTo(-0.25 * 30, within(1e-12));
        assertThat(TM_A.hotSideHeatW(0, 280, 310)).isCloseTo(-0.25 * 30, within(1e-12));
    }

    @Test
    void hotSideHeatIsColdSideHeatPlusPower() {
        // Source: first law, P = Qh - Qc (Ioffe 1957; Goldsmid 2016, from memory).
        double qc = TM_A.coldSideHeatW(2.3, 275, 312);
        double p = TM_A.powerW(2.3, 275, 312);
        assertThat(TM_A.hotSideHeatW(2.3, 275, 312)).isCloseTo(qc + p, within(1e-12));
    }

    @Test
    void ratingsRoundTripReturnsTheParameters() {
        // Source: forward and inverse rating relations (derived from the ideal equations; case S03).
        MaxRatings ratings = TM_A.ratingsAt(323.15);
        ModuleParameters back = ModuleParameters.fromRatings(ratings, RatingsMethod.IMAX_VMAX_DTMAX);
        assertThat(back.seebeckVPerK()).isCloseTo(0.04, within(1e-12));
        assertThat(back.resistanceOhm()).isCloseTo(2.4, within(1e-10));
        assertThat(back.conductanceWPerK()).isCloseTo(0.25, within(1e-10));
    }

    @Test
    void bothRatingMethodsAgreeOnConsistentRatings() {
        // Source: consistency relation (derived from the ideal equations): ideal ratings satisfy it exactly, so the variants coincide.
        MaxRatings ratings = TM_A.ratingsAt(300);
        ModuleParameters fromQmax = ModuleParameters.fromRatings(ratings, RatingsMethod.QMAX_IMAX_DTMAX);
        assertThat(fromQmax.seebeckVPerK()).isCloseTo(0.04, within(1e-12));
        assertThat(ratings.consistency().orElseThrow()).isCloseTo(1.0, within(1e-12));
    }

    @ParameterizedTest
    @ValueSource(doubles = {0, 10, 35, 60})
    void coolingAtImaxIsLinearInTemperatureDifference(double dtK) {
        // Source: identity Qc(Imax, dT) = Qmax(1 - dT/dTmax) (derived from the ideal equations; case S06), at 325 K.
        MaxRatings r = TM_A.ratingsAt(325);
        double qc = TM_A.coldSideHeatW(r.imaxA(), 325 - dtK, 325);
        assertThat(qc).isCloseTo(r.qmaxW() * (1 - dtK / r.dtmaxK()), within(1e-10));
    }

    @Test
    void vmaxIsSeebeckTimesHotSide() {
        // Source: Vmax = S·Th, exact in the ideal model (derived from the ideal equations).
        assertThat(TM_A.ratingsAt(330).vmaxV()).isCloseTo(0.04 * 330, within(1e-12));
    }

    @Test
    void arrayKeepsFigureOfMerit() {
        // Source: Z invariant under series/parallel arrays (circuit algebra of identical modules; case S14).
        assertThat(TM_A.inArray(3, 2).figureOfMeritPerK()).isCloseTo(TM_A.figureOfMeritPerK(), within(1e-15));
    }

    @Test
    void loadAboveFixedTemperatureCapacityHasNoCurrent() {
        // Source: a root exists only if Qc <= S²Tc²/(2R) - K·ΔT, the heat-sink network, derived from the ideal equations.
        double capacityW = TM_A.maxColdSideHeatW(280, 305);
        assertThat(TM_A.currentForLoadA(capacityW + 0.01, 280, 305)).isEmpty();
    }

    @Test
    void copOptimalCurrentIsBelowMaxCoolingCurrent() {
        // Source: I_COPmax < I_Qcmax whenever COPmax > 0, Ioffe 1957, from memory.
        assertThat(TM_A.copOptimalCurrentA(280, 310)).isLessThan(TM_A.maxCoolingCurrentA(280));
    }

    @Test
    void rejectsNegativeResistanceNamingTheField() {
        assertThatThrownBy(() -> new ModuleParameters(0.04, -1.0, 0.25))
                .isInstanceOfSatisfying(InvalidQuantityException.class, e -> {
                    assertThat(e.field()).isEqualTo("resistanceOhm");
                    assertThat(e.value()).isEqualTo(-1.0);
                    assertThat(e).hasMessage("resistanceOhm must be > 0, was -1.0");
                });
    }

    @Test
    void qmaxMethodWithoutQmaxNamesQmax() {
        MaxRatings noQmax = MaxRatings.withoutQmax(3.9, 12.4, 68, 300);
        assertThatThrownBy(() -> ModuleParameters.fromRatings(noQmax, RatingsMethod.QMAX_IMAX_DTMAX))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("qmaxW"));
    }

    @Test
    void rejectsEmptyArray() {
        assertThatThrownBy(() -> TM_A.inArray(0, 2))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("seriesCount"));
    }
}
