package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatCode;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;

/**
 * The solvers that iterate numerically answer every valid input with a point or an infeasible result,
 * never with an exception (which the API would turn into a 500): a wide sweep of modules and cases.
 */
class SolversNeverThrowOnValidInputProperties {

    private final OperatingPointSolver solver = new OperatingPointSolver();
    private final GeneratorSolver generator = new GeneratorSolver();

    @Property(tries = 300)
    void fixedVoltageDriveAlwaysAnswers(@ForAll @DoubleRange(min = 0.005, max = 0.2) @Scale(4) double s,
                                        @ForAll @DoubleRange(min = 0.05, max = 20) double r,
                                        @ForAll @DoubleRange(min = 0.02, max = 3) double k,
                                        @ForAll @DoubleRange(min = 0.01, max = 60) double voltageV,
                                        @ForAll @DoubleRange(min = 0, max = 50) double loadW,
                                        @ForAll @DoubleRange(min = 0, max = 3) double sinkKPerW,
                                        @ForAll @IntRange(min = 1, max = 4) int series,
                                        @ForAll @IntRange(min = 1, max = 4) int parallel) {
        var array = new ModuleArray(new ModuleParameters(s, r, k), series, parallel);
        var c = new CoolingCase(290, 310, loadW, sinkKPerW, 0.1, 0.05);
        assertThatCode(() -> solver.atVoltage(array, c, DriveLimits.NONE, voltageV)).doesNotThrowAnyException();
        assertThatCode(() -> solver.solve(array, c, DriveLimits.NONE)).doesNotThrowAnyException();
    }

    @Property(tries = 300)
    void generatorAlwaysAnswers(@ForAll @DoubleRange(min = 0.005, max = 0.2) @Scale(4) double s,
                                @ForAll @DoubleRange(min = 0.05, max = 20) double r,
                                @ForAll @DoubleRange(min = 0.02, max = 3) double k,
                                @ForAll @DoubleRange(min = 1, max = 300) double differenceK,
                                @ForAll @DoubleRange(min = 0, max = 5) double hotKPerW,
                                @ForAll @DoubleRange(min = 0, max = 5) double coldKPerW,
                                @ForAll @DoubleRange(min = 0, max = 1000) double loadOhm) {
        var module = new ModuleParameters(s, r, k);
        var c = new GeneratorCase(300 + differenceK, 300, hotKPerW, coldKPerW);
        assertThatCode(() -> generator.atLoad(module, c, loadOhm)).doesNotThrowAnyException();
        var best = generator.maxPower(module, c);
        assertThat(best.powerW()).isGreaterThanOrEqualTo(generator.atLoad(module, c, loadOhm).powerW() - 1e-9);
        assertThatCode(() -> generator.maxEfficiency(module, c)).doesNotThrowAnyException();
    }

    @Property(tries = 300)
    void cascadeWithASharedCurrentAlwaysAnswers(@ForAll @DoubleRange(min = 0.005, max = 0.1) @Scale(4) double s1,
                                                @ForAll @DoubleRange(min = 0.1, max = 10) double r1,
                                                @ForAll @DoubleRange(min = 0.02, max = 1) double k1,
                                                @ForAll @DoubleRange(min = 1, max = 5) double scale,
                                                @ForAll @DoubleRange(min = 0, max = 20) double loadW,
                                                @ForAll @DoubleRange(min = 10, max = 120) double differenceK) {
        var cascade = new TwoStageCascade(new ModuleParameters(s1, r1, k1),
                new ModuleParameters(s1 * scale, r1, k1 * scale));
        assertThatCode(() -> cascade.sharedCurrentForLoad(loadW, 300 - differenceK, 300)).doesNotThrowAnyException();
    }

    @Property(tries = 300)
    void stackOnTheHeatSinkNetworkAlwaysAnswers(@ForAll @DoubleRange(min = 0.005, max = 0.1) @Scale(4) double s1,
                                                @ForAll @DoubleRange(min = 0.1, max = 10) double r1,
                                                @ForAll @DoubleRange(min = 0.02, max = 1) double k1,
                                                @ForAll @DoubleRange(min = 0.2, max = 6) double scale,
                                                @ForAll @IntRange(min = 1, max = 4) int hotParallel,
                                                @ForAll @DoubleRange(min = 0, max = 20) double loadW,
                                                @ForAll @DoubleRange(min = 0, max = 3) double sinkKPerW,
                                                @ForAll @DoubleRange(min = 0, max = 140) double differenceK,
                                                @ForAll @DoubleRange(min = 0.1, max = 30) double limitA) {
        var stack = new TwoStageStack(new StageDesign(CandidateModule.of(1, new ModuleParameters(s1, r1, k1)), 1, 1),
                new StageDesign(new CandidateModule(2, new ModuleParameters(s1 * scale, r1, k1 * scale), limitA,
                        Double.NaN), 1, hotParallel));
        var c = new CoolingCase(310 - differenceK, 310, loadW, sinkKPerW, 0.1, 0.05);
        assertThatCode(() -> stack.solve(c, DriveLimits.NONE)).doesNotThrowAnyException();
        assertThatCode(() -> stack.solve(c, new DriveLimits(Double.NaN, 24, limitA, 350))).doesNotThrowAnyException();
    }

    @Property(tries = 200)
    void coolDownRippleAndDriverSheetAlwaysAnswer(@ForAll @DoubleRange(min = 0.005, max = 0.2) @Scale(4) double s,
                                                  @ForAll @DoubleRange(min = 0.05, max = 20) double r,
                                                  @ForAll @DoubleRange(min = 0.02, max = 3) double k,
                                                  @ForAll @DoubleRange(min = 0, max = 30) double loadW,
                                                  @ForAll @DoubleRange(min = 0, max = 3) double sinkKPerW,
                                                  @ForAll @DoubleRange(min = 0, max = 2000) double sinkJPerK,
                                                  @ForAll @DoubleRange(min = 0.01, max = 20) double currentA,
                                                  @ForAll @DoubleRange(min = 0.05, max = 1) double duty) {
        var array = ModuleArray.single(new ModuleParameters(s, r, k));
        var c = new CoolingCase(285, 305, loadW, sinkKPerW, 0.1, 0.05);
        var setup = new CooldownSetup(30, 0, sinkJPerK, 0.1);
        var limits = DriveLimits.ofRatedImaxA(currentA);
        assertThatCode(() -> new CooldownSolver().run(array, c, setup, currentA, Double.NaN))
                .doesNotThrowAnyException();
        assertThatCode(() -> new CooldownSolver().analyse(array, c, limits, setup)).doesNotThrowAnyException();
        assertThatCode(() -> new RippleAnalysis().analyse(array, c, limits, new Drive.Pwm(duty, 25_000)))
                .doesNotThrowAnyException();
        assertThatCode(() -> new DriverSheetCalculator().sheet(array, c, limits, setup,
                new HeatingDemand(250, 5))).doesNotThrowAnyException();
    }
}
