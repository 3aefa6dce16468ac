package org.chillwright.physics;

/**
 * Where a harvester keeps its energy between a device's events: a capacitor or supercapacitor
 * ({@link CapacitorStorage}) or a rechargeable cell ({@link CellStorage}). The state is the stored energy, J;
 * the usable window runs from {@link #floorJ()} (below it the device is cut off) to {@link #fullJ()}.
 */
public sealed interface EnergyStorage permits CapacitorStorage, CellStorage {

    /** Stored energy at the lower bound of the usable window, J: below it the device is cut off. */
    double floorJ();

    /** Stored energy when full, J (&gt; {@link #floorJ()}). */
    double fullJ();

    /** Terminal voltage at a stored energy, V. */
    double voltageAtV(double storedJ);

    /** Energy between the floor and full, J. */
    default double usableJ() {
        return fullJ() - floorJ();
    }

    /** Fraction of the usable window that is filled: 0 at (or below) the floor, 1 full. */
    default double stateOfCharge(double storedJ) {
        return Math.max(0, Math.min(1, (storedJ - floorJ()) / usableJ()));
    }

    /**
     * Stored energy at a fraction of the usable window, J.
     *
     * @param stateOfCharge 0 (at the floor) to 1 (full)
     */
    default double storedAtJ(double stateOfCharge) {
        Check.within("stateOfCharge", stateOfCharge, 0, 1);
        return floorJ() + stateOfCharge * usableJ();
    }
}
