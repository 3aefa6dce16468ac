package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;

class OperatingPointProperties {

    private final OperatingPointSolver solver = new OperatingPointSolver();

    @Property(tries = 500)
    void neverReturnsTheUpperRoot(@ForAll @Scale(6) @DoubleRange(min = 0.01, max = 0.1) double s,
                                  @ForAll @Scale(6) @DoubleRange(min = 0.5, max = 5) double r,
                                  @ForAll @Scale(6) @DoubleRange(min = 0.1, max = 1) double k,
                                  @ForAll @Scale(6) @DoubleRange(min = 250, max = 320) double setPointK,
                                  @ForAll @Scale(6) @DoubleRange(min = 0, max = 30) double loadW,
                                  @ForAll @Scale(6) @DoubleRange(min = 0, max = 1.5) double sinkKPerW,
                                  @ForAll @Scale(6) @DoubleRange(min = 0, max = 0.3) double coldKPerW) {
        // Source: root choice, the lower-root choice of the heat-sink network: the returned current is at or below the capacity
        // peak, it pumps the load, and no smaller current does.
        var m = new ModuleParameters(s, r, k);
        var c = new CoolingCase(setPointK, 298.15, loadW, sinkKPerW, coldKPerW, 0.05);
        double coldK = c.coldSideAtLoadK();
        CapacityPeak peak = OperatingPointSolver.capacityPeak(m, coldK, 298.15, c.hotPathKPerW());
        OperatingPoint point = solver.solve(m, c, DriveLimits.NONE);
        if (point instanceof Solved p) {
            assertThat(p.currentA()).isLessThanOrEqualTo(peak.currentA() + 1e-6);
            if (p.currentA() > 0) {
                assertThat(m.coldSideHeatW(p.currentA(), coldK, p.hotSideK())).isCloseTo(loadW, within(1e-6));
                double lowerA = 0.999 * p.currentA();
                double hotK = OperatingPointSolver.hotSideK(s, r, k, coldK, 298.15, c.hotPathKPerW(), lowerA);
                assertThat(m.coldSideHeatW(lowerA, coldK, hotK)).isLessThan(loadW);
            }
        } else {
            assertThat(peak.heatW()).isLessThan(loadW);
        }
    }

    @Property
    void passiveCaseNeedsNoCurrent(@ForAll @Scale(6) @DoubleRange(min = 0.01, max = 0.1) double s,
                                   @ForAll @Scale(6) @DoubleRange(min = 0.5, max = 5) double r,
                                   @ForAll @Scale(6) @DoubleRange(min = 0.1, max = 1) double k,
                                   @ForAll @Scale(6) @DoubleRange(min = 5, max = 40) double setPointAboveAmbientK,
                                   @ForAll @Scale(6) @DoubleRange(min = 0, max = 0.999) double fractionOfConduction) {
        // Source: passive case, the heat-sink network, derived from the ideal equations: Qc(0) >= Qload returns I = 0.
        double setPointK = 298.15 + setPointAboveAmbientK;
        double conductedW = k * setPointAboveAmbientK / (1 + 0.35 * k); // Qc(0) with Rh = 0.35 K/W, Rint,c = 0
        var c = new CoolingCase(setPointK, 298.15, fractionOfConduction * conductedW, 0.3, 0, 0.05);
        OperatingPoint point = solver.solve(new ModuleParameters(s, r, k), c, DriveLimits.NONE);
        assertThat(point).isInstanceOfSatisfying(Solved.class, p -> assertThat(p.currentA()).isZero());
    }

    @Property(tries = 300)
    void fastPathAgreesWithTheFullSolve(@ForAll @Scale(6) @DoubleRange(min = 0.01, max = 0.1) double s,
                                        @ForAll @Scale(6) @DoubleRange(min = 0.5, max = 5) double r,
                                        @ForAll @Scale(6) @DoubleRange(min = 0.1, max = 1) double k,
                                        @ForAll @Scale(6) @DoubleRange(min = 250, max = 300) double setPointK,
                                        @ForAll @Scale(6) @DoubleRange(min = 0, max = 30) double loadW) {
        var c = new CoolingCase(setPointK, 298.15, loadW, 0.3, 0.1, 0.05);
        double fastA = OperatingPointSolver.currentForLoadA(s, r, k, c.coldSideAtLoadK(), 298.15, 0.35, loadW);
        OperatingPoint point = solver.solve(new ModuleParameters(s, r, k), c, DriveLimits.NONE);
        if (point instanceof Solved p) {
            assertThat(fastA).isEqualTo(p.currentA());
        } else {
            assertThat(fastA).isNaN();
        }
    }

    @Property(tries = 300)
    void solvedPointsHaveNonNegativeMargins(@ForAll @Scale(6) @DoubleRange(min = 0.01, max = 0.1) double s,
                                            @ForAll @Scale(6) @DoubleRange(min = 0.5, max = 5) double r,
                                            @ForAll @Scale(6) @DoubleRange(min = 0.1, max = 1) double k,
                                            @ForAll @Scale(6) @DoubleRange(min = 250, max = 300) double setPointK,
                                            @ForAll @Scale(6) @DoubleRange(min = 0.1, max = 30) double loadW,
                                            @ForAll @Scale(6) @DoubleRange(min = 0.5, max = 20) double imaxA) {
        // A feasible point within the current limit leaves capacity and temperature margin of at least zero.
        var c = new CoolingCase(setPointK, 298.15, loadW, 0.3, 0.1, 0.05);
        if (solver.solve(new ModuleParameters(s, r, k), c, DriveLimits.ofRatedImaxA(imaxA)) instanceof Solved p) {
            assertThat(p.maxHeatLoadW()).isGreaterThanOrEqualTo(loadW - 1e-6);
            assertThat(p.marginK()).isGreaterThanOrEqualTo(-1e-6);
        }
    }
}
