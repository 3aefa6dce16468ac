package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class StorageSimulationTest {

    /** Synthetic module TM-A of check-cases.json. */
    private static final ModuleParameters TM_A = new ModuleParameters(0.04, 2.4, 0.25);
    private static final TemperatureSchedule DAY = new TemperatureSchedule(
            new double[] {0, 21_600, 28_800, 61_200, 64_800, 86_400},
            new double[] {306, 306, 312, 314, 300, 306},
            new double[] {303, 300, 298, 297, 303, 302},
            TemperatureSchedule.Interpolation.LINEAR); // source below the sink from about 17:20 to 18:00

    private final StorageSimulation simulation = new StorageSimulation();

    private static HarvestSystem system(EnergyStorage storage, DutyCycledDevice device) {
        return new HarvestSystem(TM_A, 2, 3, Converter.demo(), storage, device);
    }

    private static double largestTermJ(EnergyTotals t) {
        return Math.max(Math.max(Math.max(t.generatorJ(), t.eventsJ()), Math.max(t.leakageJ(), t.sleepJ())),
                Math.max(Math.abs(t.storedChangeJ()), t.rejectedJ() + t.converterLossJ() + t.chargeLossJ()));
    }

    @Test
    void aCapacitorWithEveryKindOfLeakageAndDrawConservesEnergyToRounding() {
        // First law: generator = converter loss + turned away + leakage + sleep + events + stored change.
        var storage = new CapacitorStorage(0.1, 1.8, 3.3, 2e5, 0.5e-6);
        var device = new DutyCycledDevice(2e-6, 3e-6, 0.004, 120);
        var r = simulation.run(new StorageSimulation.Request(system(storage, device), DAY, 0.3, 60));
        EnergyTotals t = r.totals();
        assertThat(t.generatorJ()).isPositive();
        assertThat(t.leakageJ()).isPositive();
        assertThat(t.sleepJ()).isPositive();
        assertThat(Math.abs(t.imbalanceJ())).isLessThan(1e-12 * largestTermJ(t));
    }

    @Test
    void aCellAtItsChargeAcceptanceConservesEnergyToRounding() {
        var cell = new CellStorage(30, 3.0, 5e-6, 0.85, 0.2, 0.2e-6);
        var device = new DutyCycledDevice(1e-6, 0, 0.002, 300);
        var r = simulation.run(new StorageSimulation.Request(system(cell, device), DAY, 1, 60)); // full: holds at full
        EnergyTotals t = r.totals();
        assertThat(t.rejectedJ()).isPositive();
        assertThat(t.chargeLossJ()).isPositive();
        assertThat(Math.abs(t.imbalanceJ())).isLessThan(1e-12 * largestTermJ(t));
    }

    @Test
    void aFullStorageTurnsTheSurplusAwayAndStaysFull() {
        var storage = new CapacitorStorage(0.01, 1, 2, Double.POSITIVE_INFINITY, 0);
        var device = new DutyCycledDevice(0, 1e-6, 1e-4, 3600);
        var r = simulation.run(new StorageSimulation.Request(system(storage, device),
                TemperatureSchedule.constant(330, 300, 3000), 1, 60));
        var last = r.samples().get(r.samples().size() - 1);
        assertThat(last.stateOfCharge()).isEqualTo(1.0);
        assertThat(last.voltageV()).isCloseTo(2, within(1e-9));
        assertThat(r.totals().rejectedJ()).isPositive();
        assertThat(r.offIntervals()).isEmpty();
    }

    @Test
    void aDeviceThatAlwaysHasEnoughFiresAnEventAtTheStartAndEveryIntervalUpToTheEnd() {
        // Identity: events at 0, T, 2T, …, the end included: floor(D/T) + 1 of them.
        var storage = new CapacitorStorage(1, 1, 5, Double.POSITIVE_INFINITY, 0);
        var device = new DutyCycledDevice(0, 0, 1e-3, 70);
        var r = simulation.run(new StorageSimulation.Request(system(storage, device),
                TemperatureSchedule.constant(330, 300, 7000), 1, 60));
        assertThat(r.eventsFired()).isEqualTo(101);
        assertThat(r.totals().eventsJ()).isCloseTo(0.101, within(1e-12));
        assertThat(r.brownOuts()).isZero();
    }

    @Test
    void theDeviceBrownsOutWhenTheSourceGoesColdAndComesBackWhenItWarms() {
        var schedule = new TemperatureSchedule(new double[] {0, 3600, 7200, 10_800},
                new double[] {320, 300, 320, 320}, new double[] {300, 300, 300, 300},
                TemperatureSchedule.Interpolation.STEPWISE); // no harvest in the second hour
        var storage = new CapacitorStorage(0.01, 1.8, 3.3, Double.POSITIVE_INFINITY, 0);
        var device = new DutyCycledDevice(0, 20e-6, 1e-3, 30);
        var r = simulation.run(new StorageSimulation.Request(system(storage, device), schedule, 0.5, 60));
        assertThat(r.brownOuts()).isEqualTo(1);
        var brownOut = r.offIntervals().stream().filter(o -> o.cause() == OffInterval.Cause.BROWN_OUT).findFirst()
                .orElseThrow();
        assertThat(brownOut.startS()).isBetween(3600.0, 7200.0);
        assertThat(brownOut.endS()).isBetween(7200.0, 7300.0);
        // while it was off, only the converter's output could change the storage: none came in
        var during = r.samples().stream().filter(p -> p.timeS() > brownOut.startS() + 60 && p.timeS() < 7200)
                .toList();
        assertThat(during).allSatisfy(p -> assertThat(p.deviceOn()).isFalse());
    }

    @Test
    void samplesStartAtTheStartAndEndAtTheEndOnEveryStepAndSchedulePoint() {
        var storage = new CapacitorStorage(0.1, 1.8, 3.3, 1e6, 0);
        var device = new DutyCycledDevice(0, 1e-6, 1e-3, 600);
        var r = simulation.run(new StorageSimulation.Request(system(storage, device), DAY, 0, 7000));
        assertThat(r.samples()).extracting(SimulationSample::timeS)
                .containsExactly(0.0, 7000.0, 14_000.0, 21_000.0, 21_600.0, 28_000.0, 28_800.0, 35_000.0, 42_000.0,
                        49_000.0, 56_000.0, 61_200.0, 63_000.0, 64_800.0, 70_000.0, 77_000.0, 84_000.0, 86_400.0);
        assertThat(r.samples()).allSatisfy(p -> assertThat(p.stateOfCharge()).isBetween(0.0, 1.0));
    }

    @Test
    void rejectsATimeStepThatWouldMakeTooManySteps() {
        var s = system(new CapacitorStorage(0.1, 1.8, 3.3, 1e6, 0), new DutyCycledDevice(0, 0, 1e-3, 600));
        assertThatThrownBy(() -> new StorageSimulation.Request(s, DAY, 0, 0.5))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("timeStepS"));
    }

    @Test
    void rejectsAnInitialStateOfChargeAboveOne() {
        var s = system(new CapacitorStorage(0.1, 1.8, 3.3, 1e6, 0), new DutyCycledDevice(0, 0, 1e-3, 600));
        assertThatThrownBy(() -> new StorageSimulation.Request(s, DAY, 1.2, 60))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("initialStateOfCharge"));
    }

    @Test
    void rejectsAnEventSoSmallThatTheHarvestWouldPayForMoreEventsThanTheLimit() {
        var s = system(new CapacitorStorage(1, 1, 5, Double.POSITIVE_INFINITY, 0),
                new DutyCycledDevice(0, 0, 1e-12, 1e6));
        assertThatThrownBy(() -> simulation.run(new StorageSimulation.Request(s,
                TemperatureSchedule.constant(330, 300, 86_400), 0, 60)))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("eventEnergyJ"));
    }
}
