package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

class OperatingPointSolverTest {

    /** Synthetic module TM-A of the check cases. */
    private static final ModuleParameters TM_A = new ModuleParameters(0.04, 2.4, 0.25);
    /** The set-up of check case S10: 10 W at 278.15 K, ambient 298.15 K, sink 0.3, cold 0.1, hot 0.05 K/W. */
    private static final CoolingCase S10 = new CoolingCase(278.15, 298.15, 10, 0.3, 0.1, 0.05);

    private final OperatingPointSolver solver = new OperatingPointSolver();

    private Solved solved(OperatingPoint point) {
        assertThat(point).isInstanceOf(Solved.class);
        return (Solved) point;
    }

    private Infeasible infeasible(OperatingPoint point) {
        assertThat(point).isInstanceOf(Infeasible.class);
        return (Infeasible) point;
    }

    @Test
    void needsNoCurrentWhenConductionCarriesTheLoad() {
        // Source: passive case, the heat-sink network, derived from the ideal equations: Qc(0) >= Qload needs no current.
        var warmObject = new CoolingCase(310, 298.15, 1, 0.3, 0.1, 0.05);
        Solved point = solved(solver.solve(TM_A, warmObject, DriveLimits.NONE));
        assertThat(point.currentA()).isZero();
        assertThat(point.powerW()).isZero();
    }

    @Test
    void returnsTheLowerRootBelowThePeak() {
        // Source: root choice, the lower-root choice of the heat-sink network: the lower root has the smaller current.
        Solved point = solved(solver.solve(TM_A, S10, DriveLimits.NONE));
        CapacityPeak peak = OperatingPointSolver.capacityPeak(TM_A, S10.coldSideAtLoadK(), S10.ambientK(),
                S10.hotPathKPerW());
        assertThat(point.currentA()).isLessThan(peak.currentA());
        assertThat(TM_A.coldSideHeatW(point.currentA(), point.coldSideK(), point.hotSideK()))
                .isCloseTo(10, within(1e-9));
    }

    @Test
    void satisfiesTheHotSideNetwork() {
        // Source: thermal network Th = Tamb + Qh·Rh, the heat-sink network, derived from the ideal equations.
        Solved point = solved(solver.solve(TM_A, S10, DriveLimits.NONE));
        assertThat(point.hotSideK()).isCloseTo(298.15 + 0.35 * point.heatRejectedW(), within(1e-9));
    }

    @Test
    void fastPathMatchesTheFullSolve() {
        Solved point = solved(solver.solve(TM_A, S10, DriveLimits.NONE));
        double currentA = OperatingPointSolver.currentForLoadA(0.04, 2.4, 0.25, S10.coldSideAtLoadK(), 298.15, 0.35, 10);
        double cop = OperatingPointSolver.copAtLoad(0.04, 2.4, 0.25, S10.coldSideAtLoadK(), 298.15, 0.35, 10);
        assertThat(currentA).isEqualTo(point.currentA());
        assertThat(cop).isCloseTo(point.cop(), within(1e-12));
    }

    @Test
    void fastPathIsNaNAboveCapacity() {
        assertThat(OperatingPointSolver.currentForLoadA(0.04, 2.4, 0.25, 275.65, 298.15, 0.35, 25)).isNaN();
    }

    @Test
    void fastPathWithAnIdealSinkIsTheClosedForm() {
        // Source: the Rh = 0 closed form of the quadratic Qc(I) (case S09): Qc is then exactly quadratic, so the
        // Taylor start of the Newton iteration is already the root.
        double hotK = 298.15;
        double fastA = OperatingPointSolver.currentForLoadA(0.04, 2.4, 0.25, 277.15, hotK, 0, 10);
        assertThat(fastA).isCloseTo(TM_A.currentForLoadA(10, 277.15, hotK).orElseThrow(), within(1e-12));
    }

    @Test
    void fastPathIsNaNWhenEvenTheTaylorBoundStaysBelowTheLoad() {
        // The quadratic bound at I = 0 peaks at 14.21 W for Tc = 275.65 K (its coefficients at I = 0); 15 W is
        // above it, so the iteration starts from zero and runs past the peak.
        assertThat(OperatingPointSolver.currentForLoadA(0.04, 2.4, 0.25, 275.65, 298.15, 0.35, 15)).isNaN();
    }

    @Test
    void maxHeatLoadIsTheEdgeOfFeasibility() {
        // Self-consistency: just below the reported capacity the load is solved, just above it is not.
        Solved point = solved(solver.solve(TM_A, S10, DriveLimits.NONE));
        double maxW = point.maxHeatLoadW();
        assertThat(solver.solve(TM_A, S10.withHeatLoadW(maxW * (1 - 1e-6)), DriveLimits.NONE).feasible()).isTrue();
        assertThat(infeasible(solver.solve(TM_A, S10.withHeatLoadW(maxW * (1 + 1e-6)), DriveLimits.NONE)).reason())
                .isEqualTo(Reason.LOAD_ABOVE_CAPACITY);
    }

    @Test
    void capacityRestartsFromTheBracketedPeakWhenItsSeedLeavesTheDomain() {
        // A seed beyond the runaway current (1 + Rh·K)/(Rh·S) = 77.7 A makes the first 2-D Newton give up.
        Solved point = solved(solver.solve(TM_A, S10, DriveLimits.NONE));
        OperatingPointSolver.PeakPoint restarted = OperatingPointSolver.capacityAtObject(0.04, 2.4, 0.25, 278.15,
                0.1, 298.15, 0.35, 10, 100, 277.15);
        assertThat(restarted.heatW()).isCloseTo(point.maxHeatLoadW(), within(1e-9));
        assertThat(restarted.currentA()).isCloseTo(point.currentAtMaxHeatLoadA(), within(1e-9));
    }

    @Test
    void capacityFallsBackToTheNestedIterationWhenBothNewtonStartsFail() {
        // A start of 3000 W puts the restart's cold face at 278.15 − 300 K, below absolute zero, so only the
        // nested iteration in Q is left; it must reach the same capacity.
        Solved point = solved(solver.solve(TM_A, S10, DriveLimits.NONE));
        OperatingPointSolver.PeakPoint nested = OperatingPointSolver.capacityAtObject(0.04, 2.4, 0.25, 278.15,
                0.1, 298.15, 0.35, 3000, 100, 277.15);
        assertThat(nested.heatW()).isCloseTo(point.maxHeatLoadW(), within(1e-6));
        assertThat(nested.currentA()).isCloseTo(point.currentAtMaxHeatLoadA(), within(1e-6));
    }

    @ParameterizedTest
    @MethodSource("overDrivenCurrents")
    void capacityAndMarginDependOnlyOnTheSetPointAndLoad(double currentA) {
        // At a fixed current beyond the peak (3.8 A) the capacity search starts on the falling side of
        // Qc(I); the answers must still be those of the same object temperature and load.
        var c = new CoolingCase(278.15, 298.15, 10, 0.3, 0.1, 0.05);
        Solved driven = solved(solver.atCurrent(ModuleArray.single(TM_A), c, DriveLimits.NONE, currentA));
        Solved designed = solved(solver.solve(TM_A, setPointAt(driven.setPointK()), DriveLimits.NONE));
        assertThat(driven.maxHeatLoadW()).isCloseTo(designed.maxHeatLoadW(), within(1e-9));
        assertThat(driven.marginK()).isCloseTo(designed.marginK(), within(1e-9));
    }

    static Stream<Double> overDrivenCurrents() {
        return Stream.of(4.5, 6.0);
    }

    @Test
    void loadMarginIsSpareCapacityOverLoad() {
        Solved point = solved(solver.solve(TM_A, S10, DriveLimits.NONE));
        assertThat(point.loadMarginPct()).isCloseTo((point.maxHeatLoadW() - 10) / 10 * 100, within(1e-9));
        assertThat(point.maxHeatLoadW()).isGreaterThan(10);
    }

    static Stream<DriveLimits> currentLimits() {
        return Stream.of(DriveLimits.NONE, DriveLimits.ofRatedImaxA(2.5), DriveLimits.ofRatedImaxA(3.8),
                new DriveLimits(Double.NaN, Double.NaN, 3.0, Double.NaN));
    }

    @ParameterizedTest
    @MethodSource("currentLimits")
    void marginKIsTheLowestSetPointWithinTheCurrentLimit(DriveLimits limits) {
        // Self-consistency: at setPointK - marginK the load is just reachable within the current limit, not below it.
        Solved point = solved(solver.solve(TM_A, S10, limits));
        double lowestK = S10.setPointK() - point.marginK();
        assertThat(point.marginK()).isPositive();
        assertThat(solver.solve(TM_A, setPointAt(lowestK + 1e-4), limits).feasible()).isTrue();
        assertThat(solver.solve(TM_A, setPointAt(lowestK - 1e-4), limits).feasible()).isFalse();
    }

    private static CoolingCase setPointAt(double setPointK) {
        return new CoolingCase(setPointK, 298.15, 10, 0.3, 0.1, 0.05);
    }

    @Test
    void copStaysBelowTheBestCopAtTheSameJunctions() {
        // Source: COPmax at fixed Tc, Th, Ioffe 1957, from memory.
        Solved point = solved(solver.solve(TM_A, S10, DriveLimits.NONE));
        assertThat(point.cop()).isLessThanOrEqualTo(point.maxCop());
        assertThat(point.copOptimalCurrentA()).isLessThan(point.currentA());
    }

    @Test
    void reportsFractionOfImax() {
        Solved point = solved(solver.solve(TM_A, S10, DriveLimits.ofRatedImaxA(3.9)));
        assertThat(point.fractionOfImax()).isCloseTo(point.currentA() / 3.9, within(1e-15));
    }

    @Test
    void raisesNoWarningInAComfortablePoint() {
        assertThat(solved(solver.solve(TM_A, S10, DriveLimits.NONE)).warnings()).isEmpty();
    }

    @Test
    void explainsLoadAboveCapacity() {
        Infeasible point = infeasible(solver.solve(TM_A, S10.withHeatLoadW(25), DriveLimits.NONE));
        assertThat(point.reason()).isEqualTo(Reason.LOAD_ABOVE_CAPACITY);
        assertThat(point.detail()).contains("needs 25.00 W", "peak there is 14.12 W at 3.8");
    }

    @Test
    void explainsTemperatureDifferenceBeyondReach() {
        var tooCold = new CoolingCase(200, 298.15, 0.1, 0.3, 0.1, 0.05);
        Infeasible point = infeasible(solver.solve(TM_A, tooCold, DriveLimits.NONE));
        assertThat(point.reason()).isEqualTo(Reason.DELTA_T_BEYOND_REACH);
        assertThat(point.detail()).contains("199.99 K", "even with no load");
    }

    @Test
    void explainsColdFaceBelowAbsoluteZero() {
        var impossible = new CoolingCase(5, 298.15, 10, 0.3, 1.0, 0.05);
        Infeasible point = infeasible(solver.solve(TM_A, impossible, DriveLimits.NONE));
        assertThat(point.reason()).isEqualTo(Reason.DELTA_T_BEYOND_REACH);
        assertThat(point.detail()).contains("-5.00 K", "absolute zero");
    }

    @Test
    void explainsCurrentAboveImax() {
        Infeasible point = infeasible(solver.solve(TM_A, S10, DriveLimits.ofRatedImaxA(1.5)));
        assertThat(point.reason()).isEqualTo(Reason.CURRENT_ABOVE_IMAX);
        assertThat(point.detail()).isEqualTo("needs 1.96 A, above the rated Imax of 1.50 A");
    }

    @Test
    void explainsSupplyCurrentExceeded() {
        var limits = new DriveLimits(Double.NaN, Double.NaN, 1.5, Double.NaN);
        Infeasible point = infeasible(solver.solve(TM_A, S10, limits));
        assertThat(point.reason()).isEqualTo(Reason.SUPPLY_CURRENT_EXCEEDED);
        assertThat(point.detail()).isEqualTo("needs 1.96 A, above the supply's 1.50 A");
    }

    @Test
    void explainsSupplyVoltageExceeded() {
        var limits = new DriveLimits(Double.NaN, 5.0, Double.NaN, Double.NaN);
        Infeasible point = infeasible(solver.solve(TM_A, S10, limits));
        assertThat(point.reason()).isEqualTo(Reason.SUPPLY_VOLTAGE_EXCEEDED);
        assertThat(point.detail()).isEqualTo("needs 5.85 V at 1.96 A, above the supply's 5.00 V");
    }

    @Test
    void explainsRunawayAtFixedCurrent() {
        // Source: det = K + S·I - Rh·S²·I² <= 0 has no steady state, the fixed-current balance; with Rh = 10 K/W the
        // determinant vanishes at (1 + √(1 + 4·Rh·K))/(2·Rh·S) = 5.40 A (hand arithmetic).
        var weakSink = new CoolingCase(278.15, 298.15, 1, 9.95, 0.1, 0.05);
        Infeasible point = infeasible(solver.atCurrent(ModuleArray.single(TM_A), weakSink, DriveLimits.NONE, 6));
        assertThat(point.reason()).isEqualTo(Reason.HEAT_SINK_RUNAWAY);
        assertThat(point.detail()).contains("runaway from 5.40 A");
    }

    @Test
    void aLoadAboveCapacityStillCarriesTheCapacityAtTheSetPoint() {
        // check case S11: 25 W on the S10 set-up cannot be held. The most that can be removed at 5 °C with this
        // heat sink, and its current, from a brute-force scan of the raw balances (CoolerBruteForce)
        var s11 = S10.withHeatLoadW(25);
        Infeasible point = infeasible(solver.solve(TM_A, s11, DriveLimits.NONE));
        double[] capacity = CoolerBruteForce.capacityAtObject(TM_A, s11);
        assertThat(point.reason()).isEqualTo(Reason.LOAD_ABOVE_CAPACITY);
        assertThat(point.maxHeatLoadW()).isCloseTo(capacity[0], within(1e-6)).isLessThan(25);
        assertThat(point.currentAtMaxHeatLoadA()).isCloseTo(capacity[1], within(1e-4));
    }

    @Test
    void aPointRefusedForItsCurrentLimitStillCarriesItsCapacity() {
        // S10 needs 1.96 A; a 1.5 A rating refuses it, but the set-point capacity is the design's all the same
        Infeasible point = infeasible(solver.solve(TM_A, S10, DriveLimits.ofRatedImaxA(1.5)));
        double[] capacity = CoolerBruteForce.capacityAtObject(TM_A, S10);
        assertThat(point.reason()).isEqualTo(Reason.CURRENT_ABOVE_IMAX);
        assertThat(point.maxHeatLoadW()).isCloseTo(capacity[0], within(1e-6));
        assertThat(point.currentAtMaxHeatLoadA()).isCloseTo(capacity[1], within(1e-4));
    }

    @Test
    void aRunawayAtFixedCurrentStillCarriesTheCapacityAtTheCaseTemperature() {
        var weakSink = new CoolingCase(278.15, 298.15, 1, 9.95, 0.1, 0.05);
        Infeasible point = infeasible(solver.atCurrent(ModuleArray.single(TM_A), weakSink, DriveLimits.NONE, 6));
        assertThat(point.reason()).isEqualTo(Reason.HEAT_SINK_RUNAWAY);
        assertThat(point.maxHeatLoadW()).isCloseTo(CoolerBruteForce.capacityAtObject(TM_A, weakSink)[0],
                within(1e-6));
    }

    @Test
    void warnsNearImax() {
        // Threshold 0.8·Imax: common practice (no source).
        Solved point = solved(solver.solve(TM_A, S10, DriveLimits.ofRatedImaxA(2.2)));
        assertThat(point.hasWarning(Warning.Code.NEAR_IMAX)).isTrue();
    }

    @Test
    void warnsNearDtmax() {
        // Threshold 0.7·ΔTmax: common practice (no source).
        var deep = new CoolingCase(245, 298.15, 0.5, 0.05, 0.0, 0.0);
        Solved point = solved(solver.solve(TM_A, deep, DriveLimits.NONE));
        assertThat(point.hasWarning(Warning.Code.NEAR_DTMAX)).isTrue();
    }

    @Test
    void aHotFaceAboveTheStatedMaximumIsInfeasible() {
        // the S10 point runs its hot face at about 303 K (check case S10), above a stated 300 K
        var limits = new DriveLimits(Double.NaN, Double.NaN, Double.NaN, 300);
        Infeasible point = infeasible(solver.solve(TM_A, S10, limits));
        assertThat(point.reason()).isEqualTo(Reason.HOT_SIDE_ABOVE_LIMIT);
        assertThat(point.detail()).contains("stated maximum of 26.9 °C");
    }

    /**
     * Object temperature at a fixed current, written here from the raw balances rather than the solver's
     * 2x2 system: the cold face pumps the load, Q = S·I·Tc − ½I²R − K(Th − Tc), and the hot path carries the
     * load plus the electrical power, Th = Tamb + Rh·(Q + I·(S(Th − Tc) + I·R)) (ideal equations, A.F. Ioffe,
     * Semiconductor Thermoelements and Thermoelectric Cooling, 1957, from memory; first law). Linear in (Tc, Th).
     */
    private static double partAtCurrentK(ModuleParameters m, CoolingCase c, double i) {
        double s = m.seebeckVPerK();
        double r = m.resistanceOhm();
        double k = m.conductanceWPerK();
        double rh = c.hotPathKPerW();
        double q = c.heatLoadW();
        // (S·I + K)·Tc − K·Th = Q + ½I²R;  Rh·S·I·Tc + (1 − Rh·S·I)·Th = Tamb + Rh·(Q + I²R)
        double a11 = s * i + k;
        double a12 = -k;
        double a21 = rh * s * i;
        double a22 = 1 - rh * s * i;
        double b1 = q + 0.5 * i * i * r;
        double b2 = c.ambientK() + rh * (q + i * i * r);
        double tc = (b1 * a22 - a12 * b2) / (a11 * a22 - a12 * a21);
        return tc + c.coldInterfaceKPerW() * q;
    }

    @Test
    void theS10SetUpAt8AIsOverDrivenAndEndsWarmerThanTheAmbient() {
        // The set-up of check case S10 driven at 8 A, beyond its 3.8 A capacity peak: the object settles at
        // 311.64 K (the raw balances above), 13.5 K above the 298.15 K ambient; the warnings list was empty.
        Solved point = solved(solver.atCurrent(ModuleArray.single(TM_A), S10, DriveLimits.NONE, 8));
        assertThat(point.setPointK()).isCloseTo(partAtCurrentK(TM_A, S10, 8), within(1e-9))
                .isCloseTo(311.64, within(0.005));
        // more current warms it: the sign of dQc/dI < 0, seen on the raw balances
        assertThat(partAtCurrentK(TM_A, S10, 8.01)).isGreaterThan(partAtCurrentK(TM_A, S10, 8));
        assertThat(point.warnings()).extracting(Warning::code)
                .contains(Warning.Code.OVER_DRIVEN, Warning.Code.COOLED_PART_ABOVE_AMBIENT);
    }

    @Test
    void aCurrentBelowThePeakIsNotOverDriven() {
        // at 2 A the S10 set-up still cools as current rises (raw balances) and stays below ambient
        Solved point = solved(solver.atCurrent(ModuleArray.single(TM_A), S10, DriveLimits.NONE, 2));
        assertThat(partAtCurrentK(TM_A, S10, 2.01)).isLessThan(partAtCurrentK(TM_A, S10, 2));
        assertThat(point.warnings()).extracting(Warning::code)
                .doesNotContain(Warning.Code.OVER_DRIVEN, Warning.Code.COOLED_PART_ABOVE_AMBIENT);
    }

    @Test
    void theSetPointSolveIsNeverOverDriven() {
        // the lower root lies left of the capacity peak (physics: the upper root is the over-driven one)
        Solved point = solved(solver.solve(TM_A, S10, DriveLimits.NONE));
        assertThat(point.warnings()).extracting(Warning::code).doesNotContain(Warning.Code.OVER_DRIVEN);
    }

    @Test
    void hundredVoltsThroughA3KPerWHotPathIsInfeasibleNotThousandsOfKelvin() {
        // The S10 set-up with a 3 K/W hot path (2.95 sink + 0.05 interface) at 100 V: the equations give a hot
        // face near 3,380 K. A module without a stated maximum is allowed 250 °C (common practice, no source).
        var weak = new CoolingCase(298.15, 298.15, 10, 2.95, 0.1, 0.05);
        Infeasible point = infeasible(solver.atVoltage(ModuleArray.single(TM_A), weak, DriveLimits.NONE, 100));
        assertThat(point.reason()).isEqualTo(Reason.HOT_SIDE_BEYOND_USE);
        assertThat(point.detail()).contains("250.0 °C").contains("states no maximum");
    }

    @Test
    void warnsOfCondensation() {
        // Dew point 16.7 °C at 25 °C and 60 % (case S17); the cold face is at 4 °C. Margin 2 K: common practice.
        Solved point = solved(solver.solve(TM_A, S10.withRelativeHumidity(0.6), DriveLimits.NONE));
        assertThat(point.hasWarning(Warning.Code.CONDENSATION_RISK)).isTrue();
        assertThat(Units.celsiusFromKelvin(point.dewPointK())).isCloseTo(16.7, within(0.01));
    }

    @Test
    void hotHumidAirOutsideTheMagnusFitStillWarnsAndSaysItIsExtrapolated() {
        // 55 °C and 90 % RH: dew point 52.8 °C by the extrapolated Magnus form (52.82 °C by the ASHRAE 2017
        // formulation, see DewPointMagnusTest); a 25 °C cold face is far below it. This used to be silent.
        var tropical = new CoolingCase(Units.kelvinFromCelsius(25), Units.kelvinFromCelsius(55), 2, 0.3, 0, 0.05)
                .withRelativeHumidity(0.9);
        Solved point = solved(solver.solve(TM_A, tropical, DriveLimits.NONE));
        assertThat(Units.celsiusFromKelvin(point.dewPointK())).isCloseTo(52.83, within(0.005));
        assertThat(point.warnings()).filteredOn(w -> w.code() == Warning.Code.CONDENSATION_RISK).singleElement()
                .satisfies(w -> assertThat(w.sentence()).contains("below the ambient dew point 52.8 °C")
                        .contains("extrapolated"));
    }

    @Test
    void aColdFaceBelowTheFrostPointWarnsWithTheFrostPoint() {
        // 25 °C air at 10 % RH: dew point −8.76 °C, frost point −7.77 °C (ASHRAE 2017 via PsychroLib: −7.75 °C,
        // see DewPointMagnusTest). A cold face at −8 °C is above the dew point but below the frost point.
        var dry = new CoolingCase(Units.kelvinFromCelsius(-8), Units.kelvinFromCelsius(25), 1, 0.1, 0, 0)
                .withRelativeHumidity(0.1);
        Solved point = solved(solver.solve(TM_A, dry, DriveLimits.NONE));
        assertThat(Units.celsiusFromKelvin(point.frostPointK())).isCloseTo(-7.77, within(0.005));
        assertThat(point.warnings()).filteredOn(w -> w.code() == Warning.Code.FROST_RISK).singleElement()
                .satisfies(w -> assertThat(w.sentence()).contains("below the ambient frost point -7.8 °C")
                        .contains("ice"));
    }

    @Test
    void anArrayAbove60VIsAShockHazard() {
        // eight small modules in series (S 0.04 V/K, R 24 Ω, K 0.025 W/K each) on the S10 set-up: 11 W needs
        // 63.3 V at the terminals, 10 W 55.8 V. 60 V DC: the usual extra-low-voltage limit for dry locations
        // (common practice, no source).
        var string = new ModuleArray(new ModuleParameters(0.04, 24, 0.025), 8, 1);
        Solved high = solved(solver.solve(string, S10.withHeatLoadW(11), DriveLimits.NONE));
        Solved low = solved(solver.solve(string, S10, DriveLimits.NONE));
        assertThat(high.voltageV()).isGreaterThan(60);
        assertThat(high.warnings()).filteredOn(w -> w.code() == Warning.Code.SHOCK_HAZARD_VOLTAGE).singleElement()
                .satisfies(w -> assertThat(w.sentence()).contains("63.3 V").contains("local codes"));
        assertThat(low.voltageV()).isLessThan(60);
        assertThat(low.hasWarning(Warning.Code.SHOCK_HAZARD_VOLTAGE)).isFalse();
    }

    @Test
    void aDewPointAboveFreezingHasNoFrostPoint() {
        Solved point = solved(solver.solve(TM_A, S10.withRelativeHumidity(0.6), DriveLimits.NONE));
        assertThat(point.frostPointK()).isNaN();
    }

    @Test
    void fixedVoltageReachesTheFixedCurrentPoint() {
        // Consistency of e.2 and e.3: driving at the voltage of a 2.5 A point gives 2.5 A back.
        var c = new CoolingCase(298.15, 298.15, 8, 0.35, 0.1, 0.0);
        ModuleArray single = ModuleArray.single(TM_A);
        Solved atCurrent = solved(solver.atCurrent(single, c, DriveLimits.NONE, 2.5));
        Solved atVoltage = solved(solver.atVoltage(single, c, DriveLimits.NONE, atCurrent.voltageV()));
        assertThat(atVoltage.currentA()).isCloseTo(2.5, within(1e-8));
        assertThat(atVoltage.setPointK()).isCloseTo(atCurrent.setPointK(), within(1e-6));
    }

    @Test
    void splitsAnArrayIntoModuleShares() {
        // Source: circuit algebra of identical modules: I per string, V per series position, heat per module.
        var array = new ModuleArray(TM_A, 2, 3);
        var shared = new CoolingCase(278.15, 298.15, 30, 0.05, 0.02, 0.01);
        Solved point = solved(solver.solve(array, shared, DriveLimits.NONE));
        assertThat(point.perModule().currentA()).isCloseTo(point.currentA() / 3, within(1e-12));
        assertThat(point.perModule().voltageV()).isCloseTo(point.voltageV() / 2, within(1e-12));
        assertThat(point.perModule().heatLoadW()).isCloseTo(5, within(1e-12));
    }

    @Test
    void rejectsNegativeSinkResistance() {
        assertThatThrownBy(() -> new CoolingCase(278.15, 298.15, 10, -1.0, 0.1, 0.05))
                .isInstanceOfSatisfying(InvalidQuantityException.class, e -> {
                    assertThat(e.field()).isEqualTo("sinkResistanceKPerW");
                    assertThat(e).hasMessage("sinkResistanceKPerW must be >= 0, was -1.0");
                });
    }

    @Test
    void rejectsNegativeDriveCurrent() {
        assertThatThrownBy(() -> solver.atCurrent(ModuleArray.single(TM_A), S10, DriveLimits.NONE, -1))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("currentA"));
    }
}
