package org.chillwright.physics;

import java.util.OptionalDouble;

/**
 * Whether a harvesting system runs its device at one pair of source and sink temperatures, and by how much
 * (see {@link DutyCycle#answer} for the definitions).
 *
 * @param conditioned          the generator through the converter
 * @param storageInW           power entering the storage, W: the converter output after a cell's charge
 *                             acceptance and efficiency
 * @param timeToFirstEventS    from the floor of the usable window to one event's energy above it, device off, s;
 *                             empty when never
 * @param timeFromEmptyS       the same from a completely empty storage (0 V, or a cell at 0 %), s; empty when never
 * @param shortestIntervalS    the shortest sustainable interval between events: the time to recharge one event
 *                             from the floor with the device asleep, s; empty when it never recharges
 * @param sleepAndLeakageW     mean sleep and leakage power over that recharge, W (at the turn-on level when it
 *                             never recharges)
 * @param neededW              sleep and leakage plus event energy over the interval, W
 * @param headroomW            storageInW − neededW, W: ≥ 0 exactly when the device runs (unless it cannot start
 *                             or the storage is too small)
 * @param powerRatio           storageInW / neededW: ≥ 1 when the device runs
 * @param limit                what stops the device, or {@link DutyCycleLimit#NONE}
 * @param detail               one sentence with the numbers
 */
public record DutyCycleAnswer(ConditionedPoint conditioned, double storageInW, OptionalDouble timeToFirstEventS,
                              OptionalDouble timeFromEmptyS, OptionalDouble shortestIntervalS,
                              double sleepAndLeakageW, double neededW, double headroomW, double powerRatio,
                              DutyCycleLimit limit, String detail) {

    /** The device runs at its interval. */
    public boolean runs() {
        return limit == DutyCycleLimit.NONE;
    }
}
