package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;

import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;

class CopProperties {

    @Property
    void copStaysBelowCarnot(@ForAll @Scale(6) @DoubleRange(min = 0.005, max = 0.2) double s,
                             @ForAll @Scale(6) @DoubleRange(min = 0.2, max = 10) double r,
                             @ForAll @Scale(6) @DoubleRange(min = 0.05, max = 2) double k,
                             @ForAll @Scale(6) @DoubleRange(min = 0.01, max = 20) double currentA,
                             @ForAll @Scale(6) @DoubleRange(min = 200, max = 320) double coldK,
                             @ForAll @Scale(6) @DoubleRange(min = 0.5, max = 80) double dtK) {
        // Source: second law, COP <= Tc/(Th - Tc) (Ioffe 1957, from memory).
        var m = new ModuleParameters(s, r, k);
        double hotK = coldK + dtK;
        double qc = m.coldSideHeatW(currentA, coldK, hotK);
        Assume.that(qc > 0);
        double cop = qc / m.powerW(currentA, coldK, hotK);
        assertThat(cop).isLessThan(ModuleParameters.carnotCop(coldK, hotK));
        assertThat(cop).isLessThanOrEqualTo(m.maxCop(coldK, hotK) * (1 + 1e-12));
    }

    @Property
    void bestCopStaysBelowCarnotForAnyFigureOfMerit(@ForAll @Scale(6) @DoubleRange(min = 1e-4, max = 100) double zPerK,
                                                    @ForAll @Scale(6) @DoubleRange(min = 100, max = 320) double coldK,
                                                    @ForAll @Scale(6) @DoubleRange(min = 0.5, max = 100) double dtK) {
        // Source: COPmax < COP_Carnot, Ioffe 1957, from memory.
        assertThat(ModuleParameters.maxCop(zPerK, coldK, coldK + dtK))
                .isLessThan(ModuleParameters.carnotCop(coldK, coldK + dtK));
    }
}
