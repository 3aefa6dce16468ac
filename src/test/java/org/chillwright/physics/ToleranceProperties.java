package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;

class ToleranceProperties {

    @Property(tries = 40)
    void anyValidDesignAndSpreadGivesOrderedPercentilesAndAProbability(
            @ForAll @DoubleRange(min = 0.02, max = 0.08) double s,
            @ForAll @DoubleRange(min = 0.5, max = 5) double r,
            @ForAll @DoubleRange(min = 0.1, max = 1) double k,
            @ForAll @DoubleRange(min = 0, max = 30) double loadW,
            @ForAll @DoubleRange(min = 0, max = 0.19) double partsFraction,
            @ForAll @DoubleRange(min = 0, max = 0.19) double sinkFraction,
            @ForAll @IntRange(min = 1, max = 3) int series,
            @ForAll @IntRange(min = 1, max = 2) int parallel,
            @ForAll @LongRange(min = 0, max = 1000) long seed) {
        var c = new CoolingCase(280, 303, loadW, 0.2, 0.05, 0.05);
        var spread = new ToleranceSpread(partsFraction, partsFraction, partsFraction, sinkFraction, sinkFraction,
                sinkFraction);
        ToleranceResult t = new ToleranceAnalysis().run(new ToleranceAnalysis.Request(
                new ModuleArray(new ModuleParameters(s, r, k), series, parallel), c,
                new DriveLimits(Double.NaN, 24, 10, Double.NaN), spread, 293, 300, seed));
        assertThat(t.probabilityHolds()).isBetween(0.0, 1.0);
        assertThat(t.samples()).isEqualTo(300);
        if (!Double.isNaN(t.marginK().p50())) {
            assertThat(t.marginK().p5()).isLessThanOrEqualTo(t.marginK().p50());
            assertThat(t.marginK().p50()).isLessThanOrEqualTo(t.marginK().p95());
        }
        if (t.probabilityHolds() > 0) {
            assertThat(t.currentA().p5()).isLessThanOrEqualTo(t.currentA().p95());
            assertThat(t.hotSideK().p5()).isGreaterThan(c.ambientK() - 10);
        }
    }
}
