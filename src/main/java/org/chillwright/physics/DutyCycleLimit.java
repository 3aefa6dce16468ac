package org.chillwright.physics;

/** What stops a harvesting system from running its device, if anything. */
public enum DutyCycleLimit {
    /** The device runs: every interval recharges at least one event. */
    NONE,
    /** The generator's open-circuit voltage is below the converter's cold-start voltage. */
    CONVERTER_CANNOT_START,
    /** The storage's usable window holds less than one event's energy. */
    STORAGE_TOO_SMALL,
    /** Sleep and leakage at the turn-on level take all the power that reaches the storage, or more. */
    SLEEP_AND_LEAKAGE_EXCEED_HARVEST,
    /** The storage recharges one event, but not within the interval between events. */
    INTERVAL_TOO_SHORT
}
