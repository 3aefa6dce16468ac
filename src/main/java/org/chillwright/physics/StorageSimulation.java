package org.chillwright.physics;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

/**
 * Simulates a harvesting system through a schedule of source and sink temperatures: generator, converter,
 * storage and duty-cycled device, step by step, with the state of charge for a chart, the stretches with the
 * device off, and where the energy went.
 *
 * <p><b>Time steps.</b> The schedule is cut at every one of its points and every {@code timeStepS} from its
 * start. Within a step the generator is quasi-steady at the temperatures of the step's midpoint (the midpoint
 * rule: second-order for a linear schedule, exact for a stepwise one, since steps never straddle a point). The
 * generator's and heat exchangers' own heat capacity is not modelled, so a step much shorter than their thermal
 * time constant (seconds to minutes for small modules on their sinks) adds nothing; a minute
 * ({@link #DEFAULT_TIME_STEP_S}) resolves a day's skin or exhaust temperatures and gives 1,441 chart points.
 * The storage and device within a step are integrated as {@link StorageIntegrator} says: exactly where the
 * storage law is linear, by fine Runge–Kutta steps otherwise, with events at their exact times and thresholds
 * found to a nanosecond, so the time step does not limit the storage's accuracy.
 *
 * <p>Stateless and thread-safe.
 */
public final class StorageSimulation {

    /** A minute: resolves daily temperature schedules; see the class comment. */
    public static final double DEFAULT_TIME_STEP_S = 60;
    /** Most steps in one simulation (about 70 days at a minute), so a request stays bounded in time and memory. */
    public static final int MAX_STEPS = 100_000;
    /** Most events one simulation may handle, scheduled or paid by the harvest, so a request stays bounded in time. */
    public static final long MAX_EVENTS = 2_000_000;

    private final PowerConditioning conditioning = new PowerConditioning();

    /**
     * What to simulate.
     *
     * @param system               generator, exchangers, converter, storage and device
     * @param schedule             source and sink temperatures over time
     * @param initialStateOfCharge the storage at the start as a fraction of its usable window, 0 (at the floor)
     *                             to 1 (full)
     * @param timeStepS            the step, s, &gt; 0; at most {@link #MAX_STEPS} steps over the schedule
     */
    public record Request(HarvestSystem system, TemperatureSchedule schedule, double initialStateOfCharge,
                          double timeStepS) {

        public Request {
            if (system == null) {
                throw new InvalidQuantityException("system", Double.NaN, "system must be given, was null");
            }
            if (schedule == null) {
                throw new InvalidQuantityException("schedule", Double.NaN, "schedule must be given, was null");
            }
            Check.within("initialStateOfCharge", initialStateOfCharge, 0, 1);
            Check.positive("timeStepS", timeStepS);
            double durationS = schedule.endS() - schedule.startS();
            if (durationS / timeStepS > MAX_STEPS) {
                throw new InvalidQuantityException("timeStepS", timeStepS, String.format(java.util.Locale.ROOT,
                        "timeStepS must be at least %.6g s for a %.6g s schedule (at most %d steps), was %s",
                        durationS / MAX_STEPS, durationS, MAX_STEPS, timeStepS));
            }
            double eventIntervalS = system.device().eventIntervalS();
            if (durationS / eventIntervalS > MAX_EVENTS) {
                throw new InvalidQuantityException("eventIntervalS", eventIntervalS, String.format(
                        java.util.Locale.ROOT, "eventIntervalS must be at least %.6g s for a %.6g s schedule "
                                + "(at most %d events), was %s", durationS / MAX_EVENTS, durationS, MAX_EVENTS,
                        eventIntervalS));
            }
        }
    }

    /** Runs the simulation. */
    public SimulationResult run(Request request) {
        HarvestSystem system = request.system();
        TemperatureSchedule schedule = request.schedule();
        double[] edgesS = stepEdges(schedule, request.timeStepS());
        int steps = edgesS.length - 1;
        double[] generatorW = new double[steps];
        double[] deliveredW = new double[steps];
        Map<List<Double>, ConditionedPoint> byTemperatures = new HashMap<>(); // a stepwise schedule repeats pairs
        double deliverableJ = 0;
        for (int k = 0; k < steps; k++) {
            double midS = 0.5 * (edgesS[k] + edgesS[k + 1]);
            double hotK = schedule.hotSourceAtK(midS);
            double coldK = schedule.coldSinkAtK(midS);
            if (hotK > coldK) {
                ConditionedPoint p = byTemperatures.computeIfAbsent(List.of(hotK, coldK),
                        key -> conditioning.condition(system.generator(), system.caseAt(hotK, coldK),
                                system.converter()));
                generatorW[k] = p.generatorW();
                deliveredW[k] = p.deliveredW();
            }
            deliverableJ += deliveredW[k] * (edgesS[k + 1] - edgesS[k]);
        }
        EnergyStorage storage = system.storage();
        double initialJ = storage.storedAtJ(request.initialStateOfCharge());
        double eventJ = system.device().eventEnergyJ();
        if (deliverableJ / eventJ + 1 > MAX_EVENTS) {
            // every turn-on after the first follows a recharge of one event from the floor, paid by the harvest:
            // this bounds the turn-ons (and the work) of a device that chatters at its threshold
            throw new InvalidQuantityException("eventEnergyJ", eventJ, String.format(java.util.Locale.ROOT,
                    "eventEnergyJ must be at least %.6g J: the harvest could pay for more than %d events of %s J",
                    deliverableJ / (MAX_EVENTS - 1), MAX_EVENTS, eventJ));
        }

        var off = new OffIntervals(request.timeStepS());
        var integrator = new StorageIntegrator(storage, system.device(), edgesS[0], initialJ, off);
        var samples = new ArrayList<SimulationSample>(steps + 1);
        samples.add(sample(schedule, storage, integrator, generatorW[0], deliveredW[0]));
        for (int k = 0; k < steps; k++) {
            integrator.advance(edgesS[k + 1], generatorW[k], deliveredW[k]);
            samples.add(sample(schedule, storage, integrator, generatorW[k], deliveredW[k]));
        }
        var totals = new EnergyTotals(integrator.generatorJ, integrator.converterLossJ, integrator.rejectedJ,
                integrator.chargeLossJ, integrator.leakageJ, integrator.sleepJ, integrator.eventsJ,
                integrator.storedJ - initialJ);
        return new SimulationResult(samples, off.close(edgesS[steps]), totals, integrator.eventsFired,
                integrator.brownOuts);
    }

    /** Step boundaries: every schedule point and every time step from the start, in order, without repeats. */
    static double[] stepEdges(TemperatureSchedule schedule, double timeStepS) {
        var edges = new TreeSet<Double>();
        for (double t : schedule.timesS()) {
            edges.add(t);
        }
        double start = schedule.startS();
        double end = schedule.endS();
        for (long k = 1; start + k * timeStepS < end; k++) {
            edges.add(start + k * timeStepS);
        }
        return edges.stream().mapToDouble(Double::doubleValue).toArray();
    }

    private static SimulationSample sample(TemperatureSchedule schedule, EnergyStorage storage,
                                           StorageIntegrator integrator, double generatorW, double deliveredW) {
        double t = integrator.timeS;
        double storedJ = integrator.storedJ;
        return new SimulationSample(t, schedule.hotSourceAtK(t), schedule.coldSinkAtK(t), generatorW, deliveredW,
                storedJ, storage.voltageAtV(storedJ), storage.stateOfCharge(storedJ), integrator.deviceOn);
    }

    /** Collects the off stretches, merging brown-outs that follow within one time step. */
    private static final class OffIntervals implements StorageIntegrator.Listener {

        private final double mergeWithinS;
        private final List<OffInterval> closed = new ArrayList<>();
        private double openS = Double.NaN;
        private OffInterval.Cause openCause;

        OffIntervals(double mergeWithinS) {
            this.mergeWithinS = mergeWithinS;
        }

        @Override
        public void deviceOff(double timeS, StorageIntegrator.OffCause cause) {
            var c = cause == StorageIntegrator.OffCause.FIRST_CHARGE
                    ? OffInterval.Cause.FIRST_CHARGE : OffInterval.Cause.BROWN_OUT;
            int last = closed.size() - 1;
            if (last >= 0 && c == OffInterval.Cause.BROWN_OUT && closed.get(last).cause() == c
                    && timeS - closed.get(last).endS() <= mergeWithinS) {
                openS = closed.remove(last).startS();
            } else {
                openS = timeS;
            }
            openCause = c;
        }

        @Override
        public void deviceOn(double timeS) {
            if (!Double.isNaN(openS)) {
                closed.add(new OffInterval(openS, timeS, openCause));
                openS = Double.NaN;
            }
        }

        List<OffInterval> close(double endS) {
            deviceOn(endS);
            return closed;
        }
    }
}
