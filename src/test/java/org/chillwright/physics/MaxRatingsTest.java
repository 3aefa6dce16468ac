package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class MaxRatingsTest {

    @Test
    void rejectsDtmaxAtOrAboveHotSide() {
        assertThatThrownBy(() -> new MaxRatings(3.9, 12.4, 27, 300, 300))
                .isInstanceOfSatisfying(InvalidQuantityException.class, e -> {
                    assertThat(e.field()).isEqualTo("dtmaxK");
                    assertThat(e).hasMessage("dtmaxK must be < hotSideK (300.0), was 300.0");
                });
    }

    @Test
    void rejectsNegativeQmax() {
        assertThatThrownBy(() -> new MaxRatings(3.9, 12.4, -2, 68, 300))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("qmaxW"));
    }

    @Test
    void hasNoConsistencyWithoutQmax() {
        MaxRatings ratings = MaxRatings.withoutQmax(3.9, 12.4, 68, 300);
        assertThat(ratings.hasQmax()).isFalse();
        assertThat(ratings.consistency()).isEmpty();
    }

    @Test
    void impliedQmaxFollowsTheConsistencyRelation() {
        // Source: Qmax = Imax·Vmax(Th + dTmax)/(2Th) (derived from the ideal equations); hand arithmetic:
        // 3.9 · 12.4 · 368 / 600 = 29.6608 W.
        assertThat(MaxRatings.withoutQmax(3.9, 12.4, 68, 300).impliedQmaxW()).isCloseTo(29.6608, within(1e-9));
    }

    @Test
    void arrayRatingsScaleByWiring() {
        // Source: circuit algebra of identical modules: Imax·np, Vmax·ns, Qmax·N, dTmax unchanged.
        MaxRatings array = new MaxRatings(3.9, 12.4, 27, 68, 300).inArray(2, 3);
        assertThat(array.imaxA()).isCloseTo(11.7, within(1e-12));
        assertThat(array.vmaxV()).isCloseTo(24.8, within(1e-12));
        assertThat(array.qmaxW()).isCloseTo(162, within(1e-12));
        assertThat(array.dtmaxK()).isEqualTo(68);
    }
}
