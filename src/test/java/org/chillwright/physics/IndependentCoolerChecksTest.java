package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The capacity at the set-point, marginK and the shared-current cascade against values computed in the test
 * by brute-force scans of the raw heat balances ({@link CoolerBruteForce}), not against the solver itself.
 * TM-A is the synthetic module of the check cases (S 0.04 V/K, R 2.4 Ω, K 0.25 W/K); S10 its set-up (10 W at
 * 5 °C, 25 °C ambient, sink 0.3 K/W, cold interface 0.1 K/W, hot interface 0.05 K/W).
 */
class IndependentCoolerChecksTest {

    private static final ModuleParameters TM_A = new ModuleParameters(0.04, 2.4, 0.25);
    private static final CoolingCase S10 = new CoolingCase(278.15, 298.15, 10, 0.3, 0.1, 0.05);

    private final OperatingPointSolver solver = new OperatingPointSolver();

    static Stream<Arguments> cases() {
        return Stream.of(
                Arguments.of("S10", ModuleArray.single(TM_A), S10),
                Arguments.of("S10 without a cold interface", ModuleArray.single(TM_A),
                        new CoolingCase(278.15, 298.15, 10, 0.3, 0, 0.05)),
                Arguments.of("2 x 3 array, 30 W at 0 °C", new ModuleArray(TM_A, 2, 3),
                        new CoolingCase(273.15, 303.15, 30, 0.1, 0.02, 0.01)),
                Arguments.of("small module, weak sink", ModuleArray.single(new ModuleParameters(0.03, 5, 0.1)),
                        new CoolingCase(288.15, 308.15, 2, 1.2, 0.3, 0.1)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void capacityAtTheSetPointMatchesTheBruteForceScan(String name, ModuleArray array, CoolingCase c) {
        Solved point = (Solved) solver.solve(array, c, DriveLimits.NONE);
        double[] scanned = CoolerBruteForce.capacityAtObject(array.equivalent(), c);
        assertThat(point.maxHeatLoadW()).isCloseTo(scanned[0], within(1e-6 * Math.max(1, scanned[0])));
        // the peak is flat in current, so its location is known to the scan's grid only
        assertThat(point.currentAtMaxHeatLoadA()).isCloseTo(scanned[1], within(1e-4 * Math.max(1, scanned[1])));
    }

    static Stream<Arguments> limits() {
        return Stream.of(Arguments.of("no limit", DriveLimits.NONE),
                Arguments.of("Imax 2.5 A", DriveLimits.ofRatedImaxA(2.5)),
                Arguments.of("Imax 3.8 A", DriveLimits.ofRatedImaxA(3.8)),
                Arguments.of("supply 3 A", new DriveLimits(Double.NaN, Double.NaN, 3.0, Double.NaN)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("limits")
    void marginKIsHowMuchColderTheScanCanHoldTheLoad(String name, DriveLimits limits) {
        // marginK = set-point − the lowest object temperature at this load over currents up to the limit, each
        // object temperature from the raw fixed-current balances
        Solved point = (Solved) solver.solve(TM_A, S10, limits);
        double lowestK = CoolerBruteForce.lowestSetPointK(TM_A, S10, limits.currentLimitA());
        assertThat(point.marginK()).isCloseTo(S10.setPointK() - lowestK, within(1e-6));
    }

    static Stream<Arguments> cascades() {
        var coldStage = new ModuleParameters(0.012, 0.72, 0.075); // check case S15's cold stage: 30 TM-A couples
        return Stream.of(Arguments.of(coldStage, TM_A, 1.0, 250.0, 300.0),
                Arguments.of(coldStage, TM_A, 0.5, 240.0, 300.0),
                Arguments.of(coldStage, TM_A.inArray(1, 2), 2.0, 255.0, 305.0));
    }

    @ParameterizedTest(name = "{2} W from {3} K to {4} K")
    @MethodSource("cascades")
    void sharedCurrentCascadeMatchesTheScanOfItsRawBalances(ModuleParameters cold, ModuleParameters hot,
                                                             double loadW, double coldK, double hotK) {
        var point = (CascadeSolved) new TwoStageCascade(cold, hot).sharedCurrentForLoad(loadW, coldK, hotK);
        double[] scanned = CoolerBruteForce.cascadeSharedCurrent(cold, hot, loadW, coldK, hotK);
        assertThat(point.coldStageCurrentA()).isCloseTo(scanned[0], within(1e-8));
        assertThat(point.cop()).isCloseTo(scanned[1], within(1e-8));
    }
}
