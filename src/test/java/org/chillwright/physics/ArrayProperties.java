package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.withinPercentage;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;
import net.jqwik.api.constraints.IntRange;

class ArrayProperties {

    @Property
    void seriesAndParallelKeepTheFigureOfMerit(@ForAll @Scale(6) @DoubleRange(min = 0.005, max = 0.2) double s,
                                               @ForAll @Scale(6) @DoubleRange(min = 0.2, max = 10) double r,
                                               @ForAll @Scale(6) @DoubleRange(min = 0.05, max = 2) double k,
                                               @ForAll @IntRange(min = 1, max = 12) int seriesCount,
                                               @ForAll @IntRange(min = 1, max = 12) int parallelCount) {
        // Source: Z invariant under arrays (circuit algebra of identical modules; case S14).
        var m = new ModuleParameters(s, r, k);
        assertThat(m.inArray(seriesCount, parallelCount).figureOfMeritPerK())
                .isCloseTo(m.figureOfMeritPerK(), withinPercentage(1e-10));
    }

    @Property
    void arrayRatingsAreScaledModuleRatings(@ForAll @Scale(6) @DoubleRange(min = 0.005, max = 0.2) double s,
                                            @ForAll @Scale(6) @DoubleRange(min = 0.2, max = 10) double r,
                                            @ForAll @Scale(6) @DoubleRange(min = 0.05, max = 2) double k,
                                            @ForAll @IntRange(min = 1, max = 12) int seriesCount,
                                            @ForAll @IntRange(min = 1, max = 12) int parallelCount) {
        // Source: circuit algebra of identical modules: Imax·np, Vmax·ns, Qmax·N for the equivalent module.
        var m = new ModuleParameters(s, r, k);
        MaxRatings scaled = m.ratingsAt(300).inArray(seriesCount, parallelCount);
        MaxRatings ofArray = m.inArray(seriesCount, parallelCount).ratingsAt(300);
        assertThat(ofArray.imaxA()).isCloseTo(scaled.imaxA(), withinPercentage(1e-10));
        assertThat(ofArray.vmaxV()).isCloseTo(scaled.vmaxV(), withinPercentage(1e-10));
        assertThat(ofArray.qmaxW()).isCloseTo(scaled.qmaxW(), withinPercentage(1e-10));
    }
}
