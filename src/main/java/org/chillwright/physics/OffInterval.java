package org.chillwright.physics;

/**
 * A stretch of a simulation during which the device is off.
 *
 * @param startS when it went off, s
 * @param endS   when it came back on, or the end of the simulation, s
 * @param cause  why
 */
public record OffInterval(double startS, double endS, Cause cause) {

    /** Why the device is off. */
    public enum Cause {
        /** Not yet on: the storage has not yet held one event above its floor since the start. */
        FIRST_CHARGE,
        /** Cut off after running: the storage fell to its floor, or could not pay an event that came due. */
        BROWN_OUT
    }

    /** Length, s. */
    public double durationS() {
        return endS - startS;
    }
}
