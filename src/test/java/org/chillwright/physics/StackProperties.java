package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;

/**
 * Random stacks around the synthetic module TM-A (S 0.04 V/K, R 2.4 Ω, K 0.25 W/K, check-cases.json), scaled in
 * couples and leg geometry, on random heat sinks and loads.
 */
class StackProperties {

    /** Points of the brute-force scan of Qc1(I) over the kernel's search range. */
    private static final int SCAN_POINTS = 20_000;

    @Property(tries = 300)
    void lowerRootIsTheFirstCrossingOfADenseScanAndColdFacesHelp(@ForAll @Scale(4) @DoubleRange(min = 0.2, max = 2.2) double coldCouples,
                                                 @ForAll @Scale(4) @DoubleRange(min = 0.3, max = 3.3) double coldShape,
                                                 @ForAll @Scale(4) @DoubleRange(min = 0.2, max = 4.2) double hotCouples,
                                                 @ForAll @Scale(4) @DoubleRange(min = 0.3, max = 3.3) double hotShape,
                                                 @ForAll @Scale(3) @DoubleRange(min = 20, max = 110) double deltaK,
                                                 @ForAll @Scale(4) @DoubleRange(min = 0, max = 1) double hotPathKPerW,
                                                 @ForAll @Scale(4) @DoubleRange(min = 0.05, max = 5) double loadW) {
        // Brute force written here: scan Qc1(I) on a fine grid and take the first current that reaches the load.
        // The kernel's root must sit within one grid step of it, and be NaN exactly when the scan never gets there.
        double s1 = 0.04 * coldCouples;
        double r1 = 2.4 * coldCouples / coldShape;
        double k1 = 0.25 * coldCouples * coldShape;
        double s2 = 0.04 * hotCouples;
        double r2 = 2.4 * hotCouples / hotShape;
        double k2 = 0.25 * hotCouples * hotShape;
        double tamb = 298.15;
        double tc = tamb - deltaK;
        double endA = StackKernel.searchEndA(s1, r1, k1, s2, r2, k2, tc, tamb, hotPathKPerW);
        double stepA = endA / SCAN_POINTS;
        double scanA = Double.NaN;
        for (int n = 0; n <= SCAN_POINTS; n++) {
            double i = n * stepA;
            if (StackKernel.coolingW(s1, r1, k1, s2, r2, k2, tc, tamb, hotPathKPerW, i) >= loadW) {
                scanA = i;
                break;
            }
        }
        double peakA = StackKernel.peak(s1, r1, k1, s2, r2, k2, tc, tamb, hotPathKPerW)[0];
        for (int n = 0; n <= 50; n++) {
            // the lowest set-point search (TwoStageStack) needs Qc1 to grow with the cold face at a fixed current
            // up to the peak, where the most cooling within a current limit is found
            double i = peakA * n / 50;
            assertThat(StackKernel.coolingW(s1, r1, k1, s2, r2, k2, tc + 0.5, tamb, hotPathKPerW, i))
                    .isGreaterThan(StackKernel.coolingW(s1, r1, k1, s2, r2, k2, tc - 0.5, tamb, hotPathKPerW, i));
        }
        double kernelA = StackKernel.currentForLoadA(s1, r1, k1, s2, r2, k2, tc, tamb, hotPathKPerW, loadW);
        if (Double.isNaN(scanA)) {
            assertThat(kernelA).isNaN();
        } else {
            assertThat(kernelA).isBetween(scanA - stepA, scanA);
            assertThat(StackKernel.coolingW(s1, r1, k1, s2, r2, k2, tc, tamb, hotPathKPerW, kernelA))
                    .isCloseTo(loadW, within(1e-6));
        }
    }

    @Property(tries = 200)
    void everySolvedStackIsPhysicallyPossible(@ForAll @Scale(4) @DoubleRange(min = 0.2, max = 2.2) double coldCouples,
                                              @ForAll @Scale(4) @DoubleRange(min = 0.3, max = 3.3) double coldShape,
                                              @ForAll @Scale(4) @DoubleRange(min = 0.2, max = 4.2) double hotCouples,
                                              @ForAll @Scale(4) @DoubleRange(min = 0.3, max = 3.3) double hotShape,
                                              @ForAll @IntRange(min = 1, max = 3) int hotParallel,
                                              @ForAll @Scale(3) @DoubleRange(min = 20, max = 90) double deltaK,
                                              @ForAll @Scale(4) @DoubleRange(min = 0, max = 0.6) double sinkKPerW,
                                              @ForAll @Scale(4) @DoubleRange(min = 0, max = 0.3) double coldKPerW,
                                              @ForAll @Scale(4) @DoubleRange(min = 0.05, max = 3) double loadW) {
        // Identities (the Ioffe 1957 / Goldsmid 2016 ideal equations; the heat-sink network derived here; the two-stage balance derived here): energy balance at the interstage and through the hot path, Ohm's law
        // per stage, temperatures in order, the cascade COP identity, and a margin of at least zero.
        var cold = new ModuleParameters(0.04 * coldCouples, 2.4 * coldCouples / coldShape, 0.25 * coldCouples * coldShape);
        var hot = new ModuleParameters(0.04 * hotCouples, 2.4 * hotCouples / hotShape, 0.25 * hotCouples * hotShape);
        var c = new CoolingCase(298.15 - deltaK, 298.15, loadW, sinkKPerW, coldKPerW, 0.05);
        var stack = new TwoStageStack(new StageDesign(CandidateModule.of(1, cold), 1, 1),
                new StageDesign(CandidateModule.of(2, hot), 1, hotParallel));
        if (!(stack.solve(c, DriveLimits.NONE) instanceof StackSolved s)) {
            return;
        }
        ModuleParameters hotEq = hot.inArray(1, hotParallel);
        double i = s.currentA();
        assertThat(s.coldSideK()).isLessThan(s.interstageK());
        assertThat(s.interstageK()).isLessThan(s.hotSideK());
        assertThat(cold.coldSideHeatW(i, s.coldSideK(), s.interstageK())).isCloseTo(loadW, within(1e-6));
        assertThat(cold.hotSideHeatW(i, s.coldSideK(), s.interstageK()))
                .isCloseTo(hotEq.coldSideHeatW(i, s.interstageK(), s.hotSideK()), within(1e-6));
        assertThat(s.hotSideK()).isCloseTo(298.15 + c.hotPathKPerW() * (loadW + s.powerW()), within(1e-6));
        assertThat(s.powerW()).isCloseTo(i * s.voltageV(), within(1e-9));
        double cop1 = loadW / s.coldStage().powerW();
        double cop2 = s.hotStage().heatPumpedW() / s.hotStage().powerW();
        assertThat(1 + 1 / s.cop()).isCloseTo((1 + 1 / cop1) * (1 + 1 / cop2), within(1e-6 * (1 + 1 / s.cop())));
        assertThat(s.marginK()).isGreaterThanOrEqualTo(-1e-6);
    }
}
