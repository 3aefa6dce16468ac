package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class TwoStageCascadeTest {

    /** Cold stage of case S15 (30 couples of the TM-A legs) on TM-A. */
    private static final TwoStageCascade CASCADE = new TwoStageCascade(new ModuleParameters(0.012, 0.72, 0.075),
            new ModuleParameters(0.04, 2.4, 0.25));

    @Test
    void sharedCurrentPumpsTheLoad() {
        CascadePoint point = CASCADE.sharedCurrentForLoad(1.0, 250, 300);
        assertThat(point).isInstanceOfSatisfying(CascadeSolved.class, s -> {
            assertThat(s.heatLoadW()).isCloseTo(1.0, within(1e-7));
            assertThat(s.coldStageCurrentA()).isEqualTo(s.hotStageCurrentA());
        });
    }

    @Test
    void hotSideCarriesLoadPlusAllPower() {
        // Source: energy conservation Qh2 = Qload + P1 + P2, the cascade balance Qh1 = Qc2, derived from the ideal equations.
        CascadeSolved s = (CascadeSolved) CASCADE.atCurrents(2, 3, 250, 300);
        double qh2 = new ModuleParameters(0.04, 2.4, 0.25).hotSideHeatW(3, s.interstageK(), 300);
        assertThat(qh2).isCloseTo(s.heatRejectedW(), within(1e-9));
    }

    @Test
    void explainsLoadAboveSharedCurrentCapacity() {
        CascadePoint point = CASCADE.sharedCurrentForLoad(50, 250, 300);
        assertThat(point).isInstanceOfSatisfying(Infeasible.class, i -> {
            assertThat(i.reason()).isEqualTo(Reason.LOAD_ABOVE_CAPACITY);
            assertThat(i.detail()).contains("needs 50.00 W");
        });
    }

    @Test
    void explainsInterstageOutOfRange() {
        // With the hot stage off, Ti cannot sit below Th.
        CascadePoint point = CASCADE.atCurrents(2, 0, 250, 300);
        assertThat(point).isInstanceOfSatisfying(Infeasible.class,
                i -> assertThat(i.reason()).isEqualTo(Reason.INTERSTAGE_OUT_OF_RANGE));
    }

    @Test
    void rejectsHotSideNotAboveColdSide() {
        assertThatThrownBy(() -> CASCADE.atCurrents(2, 3, 300, 300))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("hotSideK"));
    }
}
