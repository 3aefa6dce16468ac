package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.withinPercentage;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;

class RatingsRoundTripProperties {

    @Property
    void parametersSurviveRatingsAndBack(@ForAll @Scale(6) @DoubleRange(min = 0.005, max = 0.2) double s,
                                         @ForAll @Scale(6) @DoubleRange(min = 0.2, max = 10) double r,
                                         @ForAll @Scale(6) @DoubleRange(min = 0.05, max = 2) double k,
                                         @ForAll @Scale(6) @DoubleRange(min = 250, max = 400) double hotK,
                                         @ForAll boolean useQmax) {
        // Source: forward and inverse ideal rating relations (derived from the ideal equations; case S03).
        var m = new ModuleParameters(s, r, k);
        RatingsMethod method = useQmax ? RatingsMethod.QMAX_IMAX_DTMAX : RatingsMethod.IMAX_VMAX_DTMAX;
        ModuleParameters back = ModuleParameters.fromRatings(m.ratingsAt(hotK), method);
        assertThat(back.seebeckVPerK()).isCloseTo(s, withinPercentage(1e-7));
        assertThat(back.resistanceOhm()).isCloseTo(r, withinPercentage(1e-7));
        assertThat(back.conductanceWPerK()).isCloseTo(k, withinPercentage(1e-7));
    }
}
