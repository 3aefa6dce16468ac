package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatCode;
import static org.assertj.core.api.Assertions.within;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

class DetailedModelProperties {

    private static DetailedModule module(double lengthMm, double contactOhmM2, double thermalContactM2KPerW) {
        return new DetailedModule(31, 1e-6, 1.2e-6, lengthMm * 1e-3, contactOhmM2, thermalContactM2KPerW,
                MaterialSet.BI2TE3_COUPLE_AVERAGE);
    }

    @Property(tries = 200)
    void heatRejectedIsHeatPumpedPlusPowerBetweenAnyFaces(
            @ForAll @DoubleRange(min = -4, max = 8) double currentA,
            @ForAll @DoubleRange(min = 220, max = 330) double coldK,
            @ForAll @DoubleRange(min = -20, max = 90) double differenceK,
            @ForAll @DoubleRange(min = 0.3, max = 3) double lengthMm,
            @ForAll @DoubleRange(min = 0, max = 10) double contactNanoOhmM2,
            @ForAll @DoubleRange(min = 0, max = 10) double thermalContactMicroM2KPerW,
            @ForAll @IntRange(min = 1, max = 40) int cells) {
        // First law Qh − Qc = I·V (the ideal equations: Ioffe 1957; Goldsmid 2016), which the box scheme keeps to the Newton residual.
        var array = DetailedArray.single(module(lengthMm, contactNanoOhmM2 * 1e-9, thermalContactMicroM2KPerW * 1e-6));
        new DetailedSolver(cells).atFaces(array, currentA, coldK, coldK + differenceK).ifPresent(f -> {
            double scale = Math.max(Math.abs(f.hotSideHeatW()), Math.max(Math.abs(f.coldSideHeatW()),
                    Math.abs(f.powerW())));
            assertThat(f.hotSideHeatW() - f.coldSideHeatW()).isCloseTo(f.powerW(), within(1e-9 * scale));
        });
    }

    @Property(tries = 60)
    void theCoolingSolveAlwaysAnswersAndItsPointsObeyTheNetwork(
            @ForAll @DoubleRange(min = 250, max = 310) double setPointK,
            @ForAll @DoubleRange(min = 280, max = 320) double ambientK,
            @ForAll @DoubleRange(min = 0, max = 25) double loadW,
            @ForAll @DoubleRange(min = 0, max = 1.5) double sinkKPerW,
            @ForAll @DoubleRange(min = 0, max = 0.3) double interfaceKPerW,
            @ForAll @DoubleRange(min = 0.5, max = 2.5) double lengthMm) {
        var array = DetailedArray.single(module(lengthMm, 1e-10, 1e-6));
        var c = new CoolingCase(setPointK, ambientK, loadW, sinkKPerW, interfaceKPerW, interfaceKPerW);
        assertThatCode(() -> new DetailedSolver().solve(array, c, DriveLimits.NONE)).doesNotThrowAnyException();
        // passive points (I = 0) report heat rejected = load, as the lumped solve does
        if (new DetailedSolver().solve(array, c, DriveLimits.NONE) instanceof DetailedPoint p && p.currentA() > 0) {
            assertThat(p.hotSideK()).isCloseTo(ambientK + c.hotPathKPerW() * p.heatRejectedW(), within(1e-6));
            assertThat(p.heatRejectedW()).isCloseTo(p.heatLoadW() + p.powerW(),
                    within(1e-9 * Math.max(1, p.heatRejectedW())));
            assertThat(p.currentA()).isGreaterThanOrEqualTo(0);
        }
    }

    @Property(tries = 15)
    void theCoolingSolveFindsTheFirstCurrentABruteForceScanFinds(
            @ForAll @DoubleRange(min = 270, max = 295) double setPointK,
            @ForAll @DoubleRange(min = 1, max = 12) double loadW,
            @ForAll @DoubleRange(min = 0.05, max = 0.8) double sinkKPerW) {
        // Brute force written here: step the current up from 0 in small steps, close the hot balance
        // Th = Tamb + Rh·Qh by plain fixed-point iteration at each step, and take the first step at which
        // Qc reaches the load (the lower root, the heat-sink network of OperatingPointSolver); the solver must agree within one step.
        var module = module(1.2, 0, 0);
        var array = DetailedArray.single(module);
        double ambientK = 300;
        var c = new CoolingCase(setPointK, ambientK, loadW, sinkKPerW, 0.05, 0.05);
        var solver = new DetailedSolver();
        double tc = c.coldSideAtLoadK();
        double stepA = 0.005;
        double scanA = Double.NaN;
        double th = ambientK;
        for (double i = 0; i <= 8; i += stepA) {
            for (int n = 0; n < 200; n++) {
                var f = solver.atFaces(array, i, tc, th);
                if (f.isEmpty()) {
                    break;
                }
                double next = ambientK + c.hotPathKPerW() * f.get().hotSideHeatW();
                boolean settled = Math.abs(next - th) < 1e-9;
                th = next;
                if (settled) {
                    break;
                }
            }
            var f = solver.atFaces(array, i, tc, th);
            if (f.isPresent() && f.get().coldSideHeatW() >= loadW) {
                scanA = i;
                break;
            }
            if (th > 450) {
                break; // beyond the runaway: no steady hot side
            }
        }
        DetailedResult result = solver.solve(array, c, DriveLimits.NONE);
        double foundA = scanA;
        if (Double.isNaN(foundA)) {
            assertThat(result.feasible()).isFalse();
        } else {
            assertThat(result).isInstanceOfSatisfying(DetailedPoint.class,
                    p -> assertThat(p.currentA()).isBetween(foundA - 0.005 - 1e-9, foundA + 1e-9));
        }
    }
}
