package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;

/**
 * Random valid harvesting systems and schedules: the simulation and the steady answers never throw, the energy
 * books balance to rounding (first law), and every sample is a possible state. The generators are kept within
 * the documented work limits (at most {@link StorageSimulation#MAX_EVENTS} events a run).
 */
class StorageSimulationProperties {

    @Provide
    Arbitrary<EnergyStorage> storages() {
        Arbitrary<EnergyStorage> capacitors = Combinators.combine(
                Arbitraries.doubles().between(1e-3, 10).ofScale(9),
                Arbitraries.doubles().between(0, 2.5).ofScale(9),
                Arbitraries.doubles().between(0.05, 3).ofScale(9),
                Arbitraries.of(1e3, 1e5, 1e7, Double.POSITIVE_INFINITY),
                Arbitraries.doubles().between(0, 5e-5).ofScale(9))
                .as((c, vMin, span, leakOhm, leakA) -> new CapacitorStorage(c, vMin, vMin + span, leakOhm, leakA));
        Arbitrary<EnergyStorage> cells = Combinators.combine(
                Arbitraries.doubles().between(1, 2000).ofScale(9),
                Arbitraries.doubles().between(1.2, 4.2).ofScale(9),
                Arbitraries.doubles().between(1e-6, 0.1).ofScale(9),
                Arbitraries.doubles().between(0.5, 1).ofScale(9),
                Arbitraries.doubles().between(0, 0.9).ofScale(9),
                Arbitraries.doubles().between(0, 1e-5).ofScale(9))
                .as(CellStorage::new);
        return Arbitraries.oneOf(capacitors, cells);
    }

    @Provide
    Arbitrary<DutyCycledDevice> devices() {
        return Combinators.combine(
                Arbitraries.doubles().between(0, 5e-5).ofScale(9),
                Arbitraries.doubles().between(0, 5e-4).ofScale(9),
                Arbitraries.doubles().between(1e-3, 0.5).ofScale(9),
                Arbitraries.doubles().between(1, 3600).ofScale(9))
                .as(DutyCycledDevice::new);
    }

    @Provide
    Arbitrary<TemperatureSchedule> schedules() {
        return Arbitraries.integers().between(2, 7).flatMap(n -> Combinators.combine(
                Arbitraries.doubles().between(60, 20_000).ofScale(9).array(double[].class).ofSize(n - 1),
                Arbitraries.doubles().between(285, 330).ofScale(9).array(double[].class).ofSize(n),
                Arbitraries.doubles().between(285, 310).ofScale(9).array(double[].class).ofSize(n),
                Arbitraries.of(TemperatureSchedule.Interpolation.class))
                .as((gapsS, hotK, coldK, interpolation) -> {
                    double[] timesS = new double[n];
                    for (int i = 1; i < n; i++) {
                        timesS[i] = timesS[i - 1] + gapsS[i - 1];
                    }
                    for (int i = 0; i < n; i++) {
                        hotK[i] = Math.min(hotK[i], coldK[i] + 20); // keeps the harvest within the event limit
                    }
                    return new TemperatureSchedule(timesS, hotK, coldK, interpolation);
                }));
    }

    private static HarvestSystem system(double s, double r, double figureOfMeritPerK, double hotKPerW,
                                        double coldKPerW, boolean tracking, EnergyStorage storage,
                                        DutyCycledDevice device) {
        var module = new ModuleParameters(s, r, s * s / (r * figureOfMeritPerK)); // K from a realistic Z
        var converter = Converter.demo().withInput(tracking
                ? InputStrategy.maximumPowerPoint() : InputStrategy.fractionOfOpenCircuit(0.5));
        return new HarvestSystem(module, hotKPerW, coldKPerW, converter, storage, device);
    }

    @Property(tries = 60)
    void anyValidSystemAndScheduleSimulatesWithoutThrowingAndBalancesItsEnergy(
            @ForAll @DoubleRange(min = 0.01, max = 0.06) @Scale(5) double s,
            @ForAll @DoubleRange(min = 0.5, max = 10) double r,
            @ForAll @DoubleRange(min = 1e-3, max = 3e-3) @Scale(7) double figureOfMeritPerK,
            @ForAll @DoubleRange(min = 5, max = 50) double hotKPerW,
            @ForAll @DoubleRange(min = 5, max = 50) double coldKPerW,
            @ForAll boolean tracking,
            @ForAll("storages") EnergyStorage storage,
            @ForAll("devices") DutyCycledDevice device,
            @ForAll("schedules") TemperatureSchedule schedule,
            @ForAll @DoubleRange(min = 0, max = 1) double initialStateOfCharge,
            @ForAll @IntRange(min = 120, max = 3600) int timeStepS) {
        var system = system(s, r, figureOfMeritPerK, hotKPerW, coldKPerW, tracking, storage, device);
        var result = new StorageSimulation().run(
                new StorageSimulation.Request(system, schedule, initialStateOfCharge, timeStepS));
        EnergyTotals t = result.totals();
        double largestJ = Math.max(Math.max(t.generatorJ(), t.eventsJ() + t.sleepJ() + t.leakageJ()),
                Math.max(storage.fullJ(), t.rejectedJ() + t.converterLossJ() + t.chargeLossJ()));
        // to rounding: up to some 1e5 steps and events each add a few roundings of 1.1e-16 to the books
        assertThat(Math.abs(t.imbalanceJ())).isLessThanOrEqualTo(1e-10 * largestJ);
        assertThat(t.converterLossJ()).isGreaterThanOrEqualTo(0);
        assertThat(t.rejectedJ()).isGreaterThanOrEqualTo(-1e-12 * largestJ);
        assertThat(t.leakageJ()).isGreaterThanOrEqualTo(-1e-12 * largestJ);
        assertThat(result.samples()).allSatisfy(p -> {
            assertThat(p.storedJ()).isBetween(0.0, storage.fullJ());
            assertThat(p.stateOfCharge()).isBetween(0.0, 1.0);
            assertThat(p.deliveredW()).isLessThanOrEqualTo(p.generatorW());
        });
        double previousEndS = Double.NEGATIVE_INFINITY;
        for (OffInterval o : result.offIntervals()) {
            assertThat(o.startS()).isGreaterThanOrEqualTo(previousEndS);
            assertThat(o.endS()).isGreaterThanOrEqualTo(o.startS());
            previousEndS = o.endS();
        }
    }

    @Property(tries = 200)
    void theSteadyAnswerNeverThrowsAndItsHeadroomAgreesWithItsVerdict(
            @ForAll @DoubleRange(min = 0.01, max = 0.06) @Scale(5) double s,
            @ForAll @DoubleRange(min = 0.5, max = 10) double r,
            @ForAll @DoubleRange(min = 1e-3, max = 3e-3) @Scale(7) double figureOfMeritPerK,
            @ForAll @DoubleRange(min = 0, max = 50) double hotKPerW,
            @ForAll @DoubleRange(min = 0, max = 50) double coldKPerW,
            @ForAll boolean tracking,
            @ForAll("storages") EnergyStorage storage,
            @ForAll("devices") DutyCycledDevice device,
            @ForAll @DoubleRange(min = 0.1, max = 60) double differenceK) {
        var system = system(s, r, figureOfMeritPerK, hotKPerW, coldKPerW, tracking, storage, device);
        DutyCycleAnswer a = new DutyCycle().answer(system, 295 + differenceK, 295);
        assertThat(a.detail()).isNotBlank();
        if (a.conditioned().starts() && system.turnOnJ() <= storage.fullJ()) {
            assertThat(a.runs()).isEqualTo(a.headroomW() >= 0);
            assertThat(a.powerRatio() >= 1).isEqualTo(a.runs());
        }
        if (a.runs()) {
            assertThat(a.timeToFirstEventS()).isPresent();
            assertThat(a.timeFromEmptyS().getAsDouble())
                    .isGreaterThanOrEqualTo(a.timeToFirstEventS().getAsDouble() * (1 - 1e-12)); // equal at floor 0
        }
    }
}
