package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class PowerConditioningTest {

    /** Synthetic module TM-A of check-cases.json. */
    private static final ModuleParameters TM_A = new ModuleParameters(0.04, 2.4, 0.25);
    private static final GeneratorCase IDEAL = GeneratorCase.atJunctions(373.15, 303.15);
    private static final GeneratorCase WITH_EXCHANGERS = new GeneratorCase(400, 300, 0.5, 0.8);

    private final PowerConditioning conditioning = new PowerConditioning();
    private final GeneratorSolver solver = new GeneratorSolver();

    @Test
    void trackingTheMaximumPowerPointWithIdealExchangersDeliversTheMatchedLoadPower() {
        // Source: matched load P = S²ΔT²/(4R), the Ioffe 1957 / Rowe 1995 generator equations (Ioffe, Semiconductor Thermoelements, 1957, from memory).
        var p = conditioning.condition(TM_A, IDEAL, Converter.ideal(InputStrategy.maximumPowerPoint()));
        double expectedW = 0.04 * 0.04 * 70 * 70 / (4 * 2.4);
        assertThat(p.deliveredW()).isCloseTo(expectedW, within(expectedW * 1e-9));
        assertThat(p.input().loadOhm()).isCloseTo(2.4, within(1e-5));
    }

    @Test
    void trackingTheMaximumPowerPointWithExchangersDeliversTheGeneratorMaximumAboveEveryScannedLoad() {
        // Identity: an ideal converter (efficiency 1) passes on the generator's maximum power; checked against a
        // brute-force scan of 4,000 loads from R/100 to 100·R written here.
        var p = conditioning.condition(TM_A, WITH_EXCHANGERS, Converter.ideal(InputStrategy.maximumPowerPoint()));
        assertThat(p.deliveredW()).isEqualTo(solver.maxPower(TM_A, WITH_EXCHANGERS).powerW());
        double bestScannedW = 0;
        for (int n = 0; n <= 4000; n++) {
            double loadOhm = 2.4 * Math.pow(10, -2 + 4.0 * n / 4000);
            bestScannedW = Math.max(bestScannedW, solver.atLoad(TM_A, WITH_EXCHANGERS, loadOhm).powerW());
        }
        assertThat(p.deliveredW()).isGreaterThanOrEqualTo(bestScannedW * (1 - 1e-12));
        assertThat(p.deliveredW()).isCloseTo(bestScannedW, within(bestScannedW * 1e-5));
    }

    @ParameterizedTest(name = "k = {0}")
    @CsvSource({"0.1", "0.3", "0.5", "0.7", "0.95"})
    void aFixedFractionWithIdealExchangersIsTheLoadThatDividesTheVoltage(double k) {
        // Source: I = Voc/(R + RL) and V = I·RL, the Ioffe 1957 / Rowe 1995 generator equations (Ioffe 1957, from memory): V = k·Voc at RL = R·k/(1 − k).
        var p = conditioning.atFractionOfOpenCircuit(TM_A, IDEAL, k);
        assertThat(p.loadOhm()).isCloseTo(2.4 * k / (1 - k), within(2.4 * 1e-9));
        double vocV = 0.04 * 70;
        assertThat(p.powerW()).isCloseTo(k * (1 - k) * vocV * vocV / 2.4, within(1e-9));
    }

    @ParameterizedTest(name = "k = {0}, Rh = {1}, Rc = {2}")
    @CsvSource({"0.5, 0.5, 0.8", "0.2, 2, 0.1", "0.8, 0.05, 3", "0.5, 4, 4", "0.35, 0, 1.5"})
    void aFixedFractionWithExchangersHoldsTheTerminalVoltageAtThatFractionOfTheOpenCircuitVoltage(
            double k, double hotKPerW, double coldKPerW) {
        // Cross-check of the closed-form I–V relation against GeneratorSolver: the load found from the closed
        // form, solved again by GeneratorSolver.atLoad, must give k·Voc.
        var c = new GeneratorCase(420, 295, hotKPerW, coldKPerW);
        var p = conditioning.atFractionOfOpenCircuit(TM_A, c, k);
        assertThat(p.voltageV()).isCloseTo(k * solver.openCircuitV(TM_A, c), within(1e-9));
    }

    @ParameterizedTest(name = "RL = {0} ohm")
    @CsvSource({"0", "0.3", "2.4", "7", "60"})
    void theClosedFormTerminalVoltageAgreesWithTheGeneratorSolverAtItsCurrent(double loadOhm) {
        var point = solver.atLoad(TM_A, WITH_EXCHANGERS, loadOhm);
        assertThat(PowerConditioning.terminalVoltageV(TM_A, WITH_EXCHANGERS, point.currentA()))
                .isCloseTo(point.voltageV(), within(1e-9));
    }

    @ParameterizedTest(name = "RL = {0} ohm")
    @CsvSource({"0.3", "2.4", "7", "60"})
    void theClosedFormPointAgreesWithTheGeneratorSolverFieldByField(double loadOhm) {
        var solved = solver.atLoad(TM_A, WITH_EXCHANGERS, loadOhm);
        var closed = PowerConditioning.pointAt(TM_A, WITH_EXCHANGERS, solved.currentA());
        assertThat(closed.loadOhm()).isCloseTo(loadOhm, within(1e-9));
        assertThat(closed.voltageV()).isCloseTo(solved.voltageV(), within(1e-9));
        assertThat(closed.powerW()).isCloseTo(solved.powerW(), within(1e-9));
        assertThat(closed.hotJunctionK()).isCloseTo(solved.hotJunctionK(), within(1e-9));
        assertThat(closed.coldJunctionK()).isCloseTo(solved.coldJunctionK(), within(1e-9));
        assertThat(closed.heatInW()).isCloseTo(solved.heatInW(), within(1e-9));
        assertThat(closed.efficiency()).isCloseTo(solved.efficiency(), within(1e-12));
    }

    @Test
    void aFixedFractionStaysOnThePhysicalBranchWhereTheColdExchangerWouldRunAway() {
        // Found by PowerConditioningProperties: here S·I·Rc exceeds 1 + Rc·K below S·ΔT/R, so currents beyond
        // I_det have no steady junction temperatures; the bracket ends inside I_det.
        var module = new ModuleParameters(0.0272, 0.05, 0.02);
        var c = new GeneratorCase(329.65, 300, 2.58, 5);
        assertThat(PowerConditioning.physicalCurrentLimitA(module, c)).isLessThan(0.0272 * 29.65 / 0.05);
        var p = conditioning.atFractionOfOpenCircuit(module, c, 0.05);
        assertThat(p.voltageV()).isCloseTo(0.05 * solver.openCircuitV(module, c), within(1e-12));
        assertThat(p.coldJunctionK()).isBetween(300.0, p.hotJunctionK());
        assertThat(p.hotJunctionK()).isLessThanOrEqualTo(329.65);
        assertThat(p.hotJunctionK()).isCloseTo(329.65 - 2.58 * p.heatInW(), within(1e-9));
        assertThat(p.coldJunctionK()).isCloseTo(300 + 5 * p.heatOutW(), within(1e-9));
    }

    @Test
    void halfTheOpenCircuitVoltageWithExchangersGivesLessThanTracking() {
        // With finite exchangers the best load is no longer at Voc/2 (the Ioffe 1957 / Rowe 1995 generator equations), so tracking gets more.
        var half = conditioning.atFractionOfOpenCircuit(TM_A, WITH_EXCHANGERS, 0.5);
        assertThat(half.powerW()).isLessThan(solver.maxPower(TM_A, WITH_EXCHANGERS).powerW());
        assertThat(half.powerW()).isGreaterThan(0.95 * solver.maxPower(TM_A, WITH_EXCHANGERS).powerW());
    }

    @Test
    void theDeliveredPowerIsTheTableEfficiencyAtTheInputPoint() {
        var converter = Converter.demo();
        var p = conditioning.condition(TM_A, WITH_EXCHANGERS, converter);
        assertThat(p.efficiency()).isEqualTo(converter.efficiency().at(p.input().voltageV(), p.input().powerW()));
        assertThat(p.deliveredW()).isCloseTo(p.efficiency() * p.input().powerW(), within(1e-15));
        assertThat(p.converterLossW() + p.deliveredW()).isCloseTo(p.input().powerW(), within(1e-15));
    }

    @Test
    void aConverterCannotStartBelowItsColdStartVoltage() {
        var c = GeneratorCase.atJunctions(300.5, 300); // Voc = 0.04 V/K × 0.5 K = 20 mV
        var converter = new Converter("needs 50 mV", 0.05, ConverterEfficiencyTable.constant(0.8),
                InputStrategy.maximumPowerPoint());
        var p = conditioning.condition(TM_A, c, converter);
        assertThat(p.openCircuitV()).isCloseTo(0.02, within(1e-12));
        assertThat(p.starts()).isFalse();
        assertThat(p.deliveredW()).isZero();
        assertThat(p.generatorW()).isZero();
        assertThat(p.input().powerW()).isPositive();
    }

    @Test
    void rankingPutsTheMostDeliveredPowerFirstAndSetsApartDesignsThatCannotStart() {
        // Voc = S·ΔT/(1 + (Rh + Rc)·K) at no current (the Ioffe 1957 / Rowe 1995 generator equations): 0.20 V for one module, 0.27, 0.32 and 0.36 V
        // for 2, 4 and 8 in series (K grows with the series count, so each gets a smaller ΔT).
        var c = new GeneratorCase(310, 300, 2, 2);
        var converter = new Converter("starts at 0.25 V", 0.25, ConverterEfficiencyTable.constant(0.8),
                InputStrategy.maximumPowerPoint());
        var designs = List.of(ModuleArray.single(TM_A), new ModuleArray(TM_A, 4, 1), new ModuleArray(TM_A, 2, 1),
                new ModuleArray(TM_A, 8, 1));
        var ranking = conditioning.rank(designs, c, converter);
        assertThat(ranking.cannotStart()).extracting(ConditionedDesign::index).containsExactly(0);
        assertThat(ranking.cannotStart().get(0).point().openCircuitV()).isLessThan(0.25);
        assertThat(ranking.ranked()).extracting(ConditionedDesign::index).containsExactlyInAnyOrder(1, 2, 3);
        for (int i = 1; i < ranking.ranked().size(); i++) {
            assertThat(ranking.ranked().get(i - 1).point().deliveredW())
                    .isGreaterThanOrEqualTo(ranking.ranked().get(i).point().deliveredW());
        }
    }

    @ParameterizedTest(name = "k = {0}")
    @CsvSource({"0", "1", "-0.5", "1.5", "NaN"})
    void rejectsAFractionOutsideZeroToOne(double k) {
        assertThatThrownBy(() -> InputStrategy.fractionOfOpenCircuit(k))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("fractionOfOpenCircuit"));
    }

    @Test
    void rejectsAMissingConverter() {
        assertThatThrownBy(() -> conditioning.condition(TM_A, IDEAL, null))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("converter"));
    }

    @Test
    void rejectsANegativeColdStartVoltage() {
        assertThatThrownBy(() -> new Converter("x", -0.01, ConverterEfficiencyTable.constant(1),
                InputStrategy.maximumPowerPoint()))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("coldStartV"));
    }
}
