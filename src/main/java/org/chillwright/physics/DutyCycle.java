package org.chillwright.physics;

import java.util.Locale;
import java.util.OptionalDouble;

/**
 * Steady answers for a harvesting system at one pair of source and sink temperatures: does the device run at
 * its interval, with what margin, how soon does it first wake, and how often could it wake.
 *
 * <p>Definitions (derived here; the device model is that of {@link StorageIntegrator}: the device is connected
 * once the storage holds one event above the floor of its usable window, and cut off at the floor):
 * <ul>
 *   <li><b>Time to the first event</b>: the storage charges from the floor to the floor plus one event's energy
 *       with the device off (only leakage draws). {@code timeFromEmptyS} starts instead from a completely empty
 *       storage.</li>
 *   <li><b>Shortest sustainable interval</b> T_min: the time to recharge one event from the floor with the
 *       device asleep. Sleep and leakage grow with the stored energy (a current at a capacitor's voltage, a
 *       leakage resistance), so the lowest cycle, floor to floor plus one event, is the cheapest: a device that
 *       runs there runs, and one that does not cannot run higher up.</li>
 *   <li><b>Runs</b> when the converter starts, the window holds an event, and interval ≥ T_min. The margin is
 *       given in power: over the recharge, sleep and leakage take P̄ = P_in − E_event/T_min on average, so the
 *       device needs P̄ + E_event/interval and the headroom is P_in minus that. It is ≥ 0 exactly when
 *       interval ≥ T_min; the ratio P_in/needed is ≥ 1 then. This is "harvested − sleep − leakage ≥ event
 *       energy / interval" with the sleep and leakage taken over the lowest cycle.</li>
 * </ul>
 * Stateless and thread-safe.
 */
public final class DutyCycle {

    private final PowerConditioning conditioning = new PowerConditioning();

    /**
     * The steady answers.
     *
     * @param system     generator, exchangers, converter, storage and device
     * @param hotSourceK source temperature, K, &gt; coldSinkK
     * @param coldSinkK  sink temperature, K, &gt; 0
     */
    public DutyCycleAnswer answer(HarvestSystem system, double hotSourceK, double coldSinkK) {
        if (system == null) {
            throw new InvalidQuantityException("system", Double.NaN, "system must be given, was null");
        }
        ConditionedPoint point = conditioning.condition(system.generator(), system.caseAt(hotSourceK, coldSinkK),
                system.converter());
        EnergyStorage storage = system.storage();
        DutyCycledDevice device = system.device();
        StorageFlows off = StorageFlows.of(storage, device, false, point.deliveredW());
        StorageFlows asleep = StorageFlows.of(storage, device, true, point.deliveredW());
        double floorJ = storage.floorJ();
        double turnOnJ = system.turnOnJ();
        double scaleJ = StorageIntegrator.ENERGY_SCALE_OF_FULL * storage.fullJ();
        boolean fits = turnOnJ <= storage.fullJ();
        boolean possible = point.starts() && fits;
        OptionalDouble firstS = possible ? StorageIntegrator.timeToReachS(off, floorJ, turnOnJ, scaleJ) : none();
        OptionalDouble fromEmptyS = possible ? StorageIntegrator.timeToReachS(off, 0, turnOnJ, scaleJ) : none();
        OptionalDouble shortestS = possible ? StorageIntegrator.timeToReachS(asleep, floorJ, turnOnJ, scaleJ) : none();

        double inW = asleep.inW();
        double eventJ = device.eventEnergyJ();
        double drawsW = shortestS.isPresent()
                ? inW - eventJ / shortestS.getAsDouble()
                : asleep.sleepAtW(turnOnJ) + asleep.leakAtW(turnOnJ);
        double neededW = drawsW + eventJ / device.eventIntervalS();
        DutyCycleLimit limit;
        if (!point.starts()) {
            limit = DutyCycleLimit.CONVERTER_CANNOT_START;
        } else if (!fits) {
            limit = DutyCycleLimit.STORAGE_TOO_SMALL;
        } else if (shortestS.isEmpty()) {
            limit = DutyCycleLimit.SLEEP_AND_LEAKAGE_EXCEED_HARVEST;
        } else if (device.eventIntervalS() < shortestS.getAsDouble()) {
            limit = DutyCycleLimit.INTERVAL_TOO_SHORT;
        } else {
            limit = DutyCycleLimit.NONE;
        }
        return new DutyCycleAnswer(point, inW, firstS, fromEmptyS, shortestS, drawsW, neededW, inW - neededW,
                inW / neededW, limit, detail(limit, point, storage, device, inW, drawsW, neededW, shortestS));
    }

    private static OptionalDouble none() {
        return OptionalDouble.empty();
    }

    private static String detail(DutyCycleLimit limit, ConditionedPoint point, EnergyStorage storage,
                                 DutyCycledDevice device, double inW, double drawsW, double neededW,
                                 OptionalDouble shortestS) {
        return switch (limit) {
            case CONVERTER_CANNOT_START -> format("the open-circuit voltage %s V is below the converter's %s V "
                    + "cold start", point.openCircuitV(), point.coldStartV());
            case STORAGE_TOO_SMALL -> format("the storage holds %s J between its floor and full, less than one "
                    + "event's %s J", storage.usableJ(), device.eventEnergyJ());
            case SLEEP_AND_LEAKAGE_EXCEED_HARVEST -> format("sleep and leakage take %s W at the turn-on level, "
                    + "not less than the %s W reaching the storage", drawsW, inW);
            case INTERVAL_TOO_SHORT -> format("events every %s s need %s W against %s W reaching the storage; "
                    + "the shortest sustainable interval is %s s", device.eventIntervalS(), neededW, inW,
                    shortestS.getAsDouble());
            case NONE -> format("runs: %s W reach the storage against %s W needed (sleep and leakage %s W); "
                    + "the shortest sustainable interval is %s s", inW, neededW, drawsW, shortestS.getAsDouble());
        };
    }

    private static String format(String pattern, double... values) {
        Object[] shown = new Object[values.length];
        for (int i = 0; i < values.length; i++) {
            shown[i] = String.format(Locale.ROOT, "%.3g", values[i]);
        }
        return String.format(Locale.ROOT, pattern, shown);
    }
}
