package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;

class EnergyBalanceProperties {

    @Property
    void heatRejectedIsHeatPumpedPlusPower(@ForAll @Scale(6) @DoubleRange(min = 0.005, max = 0.2) double s,
                                           @ForAll @Scale(6) @DoubleRange(min = 0.2, max = 10) double r,
                                           @ForAll @Scale(6) @DoubleRange(min = 0.05, max = 2) double k,
                                           @ForAll @Scale(6) @DoubleRange(min = 0, max = 20) double currentA,
                                           @ForAll @Scale(6) @DoubleRange(min = 200, max = 350) double coldK,
                                           @ForAll @Scale(6) @DoubleRange(min = 250, max = 400) double hotK) {
        // Source: first law P = Qh - Qc (Ioffe 1957; Goldsmid 2016, from memory).
        var m = new ModuleParameters(s, r, k);
        double qh = m.hotSideHeatW(currentA, coldK, hotK);
        double sum = m.coldSideHeatW(currentA, coldK, hotK) + m.powerW(currentA, coldK, hotK);
        assertThat(qh).isCloseTo(sum, within(1e-9 * (1 + Math.abs(qh))));
    }

    @Property
    void solvedPointsCloseTheHotSideBalance(@ForAll @Scale(6) @DoubleRange(min = 0.01, max = 0.1) double s,
                                            @ForAll @Scale(6) @DoubleRange(min = 0.5, max = 5) double r,
                                            @ForAll @Scale(6) @DoubleRange(min = 0.1, max = 1) double k,
                                            @ForAll @Scale(6) @DoubleRange(min = 260, max = 300) double setPointK,
                                            @ForAll @Scale(6) @DoubleRange(min = 0, max = 20) double loadW,
                                            @ForAll @Scale(6) @DoubleRange(min = 0, max = 1) double sinkKPerW) {
        // Source: thermal network Th = Tamb + Qh·Rh with Qh = Qc + P, the heat-sink network, derived from the ideal equations.
        var c = new CoolingCase(setPointK, 298.15, loadW, sinkKPerW, 0.05, 0.05);
        if (new OperatingPointSolver().solve(new ModuleParameters(s, r, k), c, DriveLimits.NONE) instanceof Solved p
                && p.currentA() > 0) {
            assertThat(p.hotSideK()).isCloseTo(298.15 + c.hotPathKPerW() * p.heatRejectedW(), within(1e-6));
            assertThat(p.heatRejectedW()).isCloseTo(p.heatLoadW() + p.powerW(), within(1e-9));
        }
    }
}
