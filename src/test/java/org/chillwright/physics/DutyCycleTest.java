package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class DutyCycleTest {

    /** Synthetic module TM-A of check-cases.json. */
    private static final ModuleParameters TM_A = new ModuleParameters(0.04, 2.4, 0.25);
    /** Matched-load power at a 1 K junction difference, ideal exchangers: S²ΔT²/(4R) (the Ioffe 1957 / Rowe 1995 generator equations). */
    private static final double POWER_W = 0.04 * 0.04 / (4 * 2.4);
    private static final double HOT_K = 301;
    private static final double COLD_K = 300;
    private static final Converter IDEAL = Converter.ideal(InputStrategy.maximumPowerPoint());
    private static final CapacitorStorage LOSSLESS = new CapacitorStorage(0.1, 2, 3.3, Double.POSITIVE_INFINITY, 0);

    private final DutyCycle dutyCycle = new DutyCycle();

    private static HarvestSystem system(Converter converter, EnergyStorage storage, DutyCycledDevice device) {
        return new HarvestSystem(TM_A, 0, 0, converter, storage, device);
    }

    @Test
    void withConstantDrawsTheShortestIntervalIsTheEventEnergyOverWhatIsLeft() {
        // Derived: with constant powers and no leakage, one event recharges in E/(P − sleep); at that interval
        // "harvested − sleep − leakage ≥ event energy / interval" holds with equality.
        var device = new DutyCycledDevice(0, 20e-6, 0.003, 60);
        var a = dutyCycle.answer(system(IDEAL, LOSSLESS, device), HOT_K, COLD_K);
        double expectedS = 0.003 / (POWER_W - 20e-6);
        assertThat(a.storageInW()).isCloseTo(POWER_W, within(POWER_W * 1e-9));
        assertThat(a.shortestIntervalS().getAsDouble()).isCloseTo(expectedS, within(expectedS * 1e-9));
        assertThat(a.sleepAndLeakageW()).isCloseTo(20e-6, within(1e-12));
        assertThat(a.headroomW()).isCloseTo(POWER_W - 20e-6 - 0.003 / 60, within(1e-12));
        assertThat(a.runs()).isTrue();
    }

    @Test
    void theFirstEventComesWhenTheStorageHoldsOneEventAboveItsFloor() {
        // Derived from E = ½CV² (Halliday, Resnick & Walker, from memory): no draws while off, so
        // t = E_event/P from the floor and (½C·Vmin² + E_event)/P from 0 V.
        var device = new DutyCycledDevice(1e-6, 0, 0.003, 60);
        var a = dutyCycle.answer(system(IDEAL, LOSSLESS, device), HOT_K, COLD_K);
        assertThat(a.timeToFirstEventS().getAsDouble()).isCloseTo(0.003 / POWER_W, within(1e-6));
        assertThat(a.timeFromEmptyS().getAsDouble()).isCloseTo((0.5 * 0.1 * 4 + 0.003) / POWER_W, within(1e-6));
    }

    @ParameterizedTest(name = "interval {0} s")
    @CsvSource({"5", "30", "200", "3600"})
    void runsExactlyWhenTheIntervalIsAtLeastTheShortestAndTheHeadroomSaysSo(double intervalS) {
        var storage = new CapacitorStorage(0.22, 1.8, 3.6, 5e5, 2e-6);
        var device = new DutyCycledDevice(3e-6, 5e-6, 0.004, intervalS);
        var a = dutyCycle.answer(system(IDEAL, storage, device), HOT_K, COLD_K);
        boolean longEnough = intervalS >= a.shortestIntervalS().getAsDouble();
        assertThat(a.runs()).isEqualTo(longEnough);
        assertThat(a.headroomW() >= 0).isEqualTo(longEnough);
        assertThat(a.powerRatio() >= 1).isEqualTo(longEnough);
        assertThat(a.limit()).isEqualTo(longEnough ? DutyCycleLimit.NONE : DutyCycleLimit.INTERVAL_TOO_SHORT);
    }

    @Test
    void aConverterThatCannotStartRunsNothing() {
        var converter = new Converter("needs 0.1 V", 0.1, ConverterEfficiencyTable.constant(1),
                InputStrategy.maximumPowerPoint()); // Voc = 40 mV here
        var a = dutyCycle.answer(system(converter, LOSSLESS, new DutyCycledDevice(0, 0, 0.003, 60)), HOT_K, COLD_K);
        assertThat(a.limit()).isEqualTo(DutyCycleLimit.CONVERTER_CANNOT_START);
        assertThat(a.storageInW()).isZero();
        assertThat(a.timeToFirstEventS()).isEmpty();
        assertThat(a.headroomW()).isNegative();
        assertThat(a.detail()).contains("cold start");
    }

    @Test
    void aStorageSmallerThanOneEventRunsNothing() {
        var tiny = new CapacitorStorage(1e-4, 2, 3, Double.POSITIVE_INFINITY, 0); // 0.25 mJ usable
        var a = dutyCycle.answer(system(IDEAL, tiny, new DutyCycledDevice(0, 0, 0.001, 60)), HOT_K, COLD_K);
        assertThat(a.limit()).isEqualTo(DutyCycleLimit.STORAGE_TOO_SMALL);
        assertThat(a.shortestIntervalS()).isEmpty();
    }

    @Test
    void sleepAboveTheHarvestRunsNothing() {
        var a = dutyCycle.answer(system(IDEAL, LOSSLESS, new DutyCycledDevice(0, 2 * POWER_W, 0.001, 60)),
                HOT_K, COLD_K);
        assertThat(a.limit()).isEqualTo(DutyCycleLimit.SLEEP_AND_LEAKAGE_EXCEED_HARVEST);
        assertThat(a.timeToFirstEventS()).isPresent(); // the device is off while the storage first charges
        assertThat(a.sleepAndLeakageW()).isCloseTo(2 * POWER_W, within(1e-15));
    }

    @Test
    void aCellTakesOnlyItsChargeAcceptanceAtItsEfficiency() {
        // Derived: P_in = η·min(P, Imax·V) = 0.8 × min(167 µW, 10 µA × 3.7 V).
        var cell = new CellStorage(500, 3.7, 10e-6, 0.8, 0.1, 0);
        var a = dutyCycle.answer(system(IDEAL, cell, new DutyCycledDevice(0, 0, 0.01, 600)), HOT_K, COLD_K);
        assertThat(a.storageInW()).isCloseTo(0.8 * 37e-6, within(1e-15));
    }

    @ParameterizedTest(name = "interval = {0} × the shortest")
    @CsvSource({"1.001, 0", "0.999, 1"})
    void theSimulationBrownsOutExactlyWhenTheSteadyAnswerSaysTheIntervalIsTooShort(double factor, int minBrownOuts) {
        // The steady definition against the step-by-step simulation, on the Runge–Kutta path (a leakage current
        // and a sleep current at the capacitor's voltage).
        var storage = new CapacitorStorage(0.05, 1.8, 3.6, 2e5, 1e-6);
        var device = new DutyCycledDevice(2e-6, 0, 0.002, 60);
        double shortestS = dutyCycle.answer(system(IDEAL, storage, device), HOT_K, COLD_K).shortestIntervalS()
                .getAsDouble();
        var s = system(IDEAL, storage, device.withEventIntervalS(factor * shortestS));
        var result = new StorageSimulation().run(new StorageSimulation.Request(s,
                TemperatureSchedule.constant(HOT_K, COLD_K, 40 * shortestS), 0, shortestS / 4));
        if (minBrownOuts == 0) {
            assertThat(result.brownOuts()).isZero();
            assertThat(result.eventsFired()).isGreaterThan(30);
        } else {
            assertThat(result.brownOuts()).isGreaterThanOrEqualTo(minBrownOuts);
        }
    }

    @Test
    void theSimulationFirstTurnsTheDeviceOnAtTheTimeToTheFirstEvent() {
        var storage = new CapacitorStorage(0.05, 1.8, 3.6, 2e5, 1e-6);
        var device = new DutyCycledDevice(2e-6, 0, 0.002, 60);
        var s = system(IDEAL, storage, device);
        double firstS = dutyCycle.answer(s, HOT_K, COLD_K).timeToFirstEventS().getAsDouble();
        var result = new StorageSimulation().run(new StorageSimulation.Request(s,
                TemperatureSchedule.constant(HOT_K, COLD_K, 10 * firstS), 0, 7));
        var first = result.offIntervals().get(0);
        assertThat(first.cause()).isEqualTo(OffInterval.Cause.FIRST_CHARGE);
        assertThat(first.endS()).isCloseTo(firstS, within(firstS * 1e-7));
    }

    @Test
    void rejectsASourceNotHotterThanTheSink() {
        var s = system(IDEAL, LOSSLESS, new DutyCycledDevice(0, 0, 0.001, 60));
        assertThatThrownBy(() -> dutyCycle.answer(s, 300, 300))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("hotSourceK"));
    }

    @Test
    void rejectsANonPositiveEventEnergy() {
        assertThatThrownBy(() -> new DutyCycledDevice(0, 0, 0, 60))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("eventEnergyJ"));
    }
}
