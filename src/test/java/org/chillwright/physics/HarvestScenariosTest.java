package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

class HarvestScenariosTest {

    private static final double SQUARE_CENTIMETRES_PER_SQUARE_METRE = 1e4;

    private final GeneratorSolver solver = new GeneratorSolver();

    static Stream<HarvestScenario> scenarios() {
        return HarvestScenarios.all().stream();
    }

    @Test
    void theWristGeneratorGivesAPowerPerAreaWithinPublishedBodyHeatMeasurements() {
        // Plausibility bounds, not a reference value (the scenario is invented):
        // - upper: "a simulated power of up to 60 µW/cm² at 0 °C" ambient, validated with wearable modules
        //   (V. Leonov, Human Machine and Thermoelectric Energy Scavenging for Wearable Devices, ISRN Renewable
        //   Energy 2011, article 785380, abstract). The scenario's 22 °C room is a smaller difference, so its
        //   power per area must stay below.
        // - lower: mean harvested power of stationary subjects inside a building, 12.2 µW/cm² (elderly) to
        //   26.2 µW/cm² (children) ("Thermal Harvesting Potential of the Human Body", 2018, observational study
        //   of 56 subjects, abstract; the ambient temperature is not stated there). Loose: half the lowest mean.
        var wrist = HarvestScenarios.wristSensor();
        double powerW = solver.maxPower(wrist.system().generator(), wrist.designCase()).powerW();
        double microwattsPerSquareCentimetre = powerW * 1e6
                / (wrist.generatorFootprintM2() * SQUARE_CENTIMETRES_PER_SQUARE_METRE);
        assertThat(microwattsPerSquareCentimetre).isBetween(12.2 / 2, 60.0);
    }

    @Test
    void theHeatThroughTheWristPlateIsWithinPublishedSkinHeatFluxes() {
        // Plausibility: mean heat flux of stationary subjects 9.4 (elderly) to 13.9 (children) mW/cm², adults 11.4
        // ("Thermal Harvesting Potential of the Human Body", 2018, abstract). Loose: half the lowest to twice the
        // highest.
        var wrist = HarvestScenarios.wristSensor();
        double heatW = solver.maxPower(wrist.system().generator(), wrist.designCase()).heatInW();
        double milliwattsPerSquareCentimetre = heatW * 1e3
                / (wrist.generatorFootprintM2() * SQUARE_CENTIMETRES_PER_SQUARE_METRE);
        assertThat(milliwattsPerSquareCentimetre).isBetween(9.4 / 2, 2 * 13.9);
    }

    @Test
    void theWristExchangerResistancesFollowFromTheNamedCoefficients() {
        // 440 cm²·K/W over 9 cm² (Leonov 2011, Table 2); 1/(10 W/(m²·K) × 30 cm² + 5.5 W/(m²·K) × 9 cm²).
        var wrist = HarvestScenarios.wristSensor().system();
        assertThat(wrist.hotResistanceKPerW()).isCloseTo(440.0 / 9, org.assertj.core.api.Assertions.within(1e-9));
        assertThat(HarvestScenarios.WRIST_RADIATION_W_PER_M2K).isBetween(5.4, 5.6);
        assertThat(wrist.coldResistanceKPerW()).isBetween(28.0, 29.0);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("scenarios")
    void eachScenarioRunsItsDeviceAtItsDesignPoint(HarvestScenario scenario) {
        var answer = new DutyCycle().answer(scenario.system(), scenario.hotSourceK(), scenario.coldSinkK());
        assertThat(answer.runs()).as(answer.detail()).isTrue();
        assertThat(answer.conditioned().openCircuitV()).isGreaterThan(Converter.TYPICAL_COLD_START_HIGH_V);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("scenarios")
    void eachScenarioSimulatesItsDayMinuteByMinuteWithBalancedBooks(HarvestScenario scenario) {
        var result = new StorageSimulation().run(new StorageSimulation.Request(scenario.system(), scenario.day(),
                0.5, StorageSimulation.DEFAULT_TIME_STEP_S));
        assertThat(result.samples()).hasSize(1441);
        EnergyTotals t = result.totals();
        assertThat(Math.abs(t.imbalanceJ())).isLessThan(1e-10 * t.generatorJ());
        assertThat(result.eventsFired()).isPositive();
    }

    @Test
    void theWristSensorBrownsOutOnlyAtNightUnderTheCovers() {
        // The demo's story: under the covers (air 28 °C) the harvest is below the sensor's need; by day it runs.
        var wrist = HarvestScenarios.wristSensor();
        var result = new StorageSimulation().run(new StorageSimulation.Request(wrist.system(), wrist.day(), 0.5,
                StorageSimulation.DEFAULT_TIME_STEP_S));
        assertThat(result.offIntervals()).isNotEmpty();
        assertThat(result.offIntervals()).allSatisfy(o -> assertThat(o.startS() >= 23 * 3600 || o.endS() <= 7 * 3600)
                .isTrue());
    }

    @Test
    void theStoveFanStopsWhileTheStoveIsColdBetweenItsFires() {
        var stove = HarvestScenarios.stoveFan();
        var result = new StorageSimulation().run(new StorageSimulation.Request(stove.system(), stove.day(), 0.5,
                StorageSimulation.DEFAULT_TIME_STEP_S));
        assertThat(result.offIntervals()).anySatisfy(o -> {
            assertThat(o.startS()).isLessThan(12 * 3600);
            assertThat(o.endS()).isGreaterThan(16 * 3600);
        });
    }

    @Test
    void theStoveModulesHotFaceStaysNearTheTemperatureTheScenarioWarnsAbout() {
        // Open circuit is the hottest state: only conduction K·ΔT crosses the module, so (the Ioffe 1957 / Rowe 1995 generator equations at I = 0)
        // ΔT = (Tsrc − Tsnk)/(1 + (Rh + Rc)K) and Th = Tsrc − Rh·K·ΔT.
        var stove = HarvestScenarios.stoveFan();
        var s = stove.system();
        double k = s.generator().conductanceWPerK();
        double dtK = (stove.hotSourceK() - stove.coldSinkK())
                / (1 + (s.hotResistanceKPerW() + s.coldResistanceKPerW()) * k);
        double hotFaceC = Units.celsiusFromKelvin(stove.hotSourceK() - s.hotResistanceKPerW() * k * dtK);
        assertThat(hotFaceC).isBetween(140.0, 160.0);
        assertThat(stove.basis()).contains("150 C");
    }

    @Test
    void everyScenarioIsLabelledInventedAndHasItsOwnKey() {
        List<HarvestScenario> all = HarvestScenarios.all();
        assertThat(all).extracting(HarvestScenario::key).doesNotHaveDuplicates();
        assertThat(all).allSatisfy(s -> assertThat(s.summary()).startsWith("Invented demo scenario"));
        assertThat(all).allSatisfy(s -> assertThat(s.day().endS()).isEqualTo(86_400.0));
    }
}
