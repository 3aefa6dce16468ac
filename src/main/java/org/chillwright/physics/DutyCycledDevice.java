package org.chillwright.physics;

/**
 * A device that sleeps and wakes for events at a fixed interval: a sensor node that measures and sends. Between
 * events it draws a sleep current at the storage voltage (through a linear regulator, say) and/or a constant
 * sleep power (through a switching regulator); an event takes a fixed energy from the storage. A device that runs
 * continuously (a fan) puts its running power into {@code sleepPowerW}.
 *
 * @param sleepCurrentA  current drawn between events at the storage voltage, A, ≥ 0
 * @param sleepPowerW    power drawn between events, W, ≥ 0
 * @param eventEnergyJ   energy one event takes from the storage, J, &gt; 0
 * @param eventIntervalS time from one event to the next, s, &gt; 0
 */
public record DutyCycledDevice(double sleepCurrentA, double sleepPowerW, double eventEnergyJ, double eventIntervalS) {

    public DutyCycledDevice {
        Check.nonNegative("sleepCurrentA", sleepCurrentA);
        Check.nonNegative("sleepPowerW", sleepPowerW);
        Check.positive("eventEnergyJ", eventEnergyJ);
        Check.positive("eventIntervalS", eventIntervalS);
    }

    /** The same device with another interval between events. */
    public DutyCycledDevice withEventIntervalS(double intervalS) {
        return new DutyCycledDevice(sleepCurrentA, sleepPowerW, eventEnergyJ, intervalS);
    }
}
