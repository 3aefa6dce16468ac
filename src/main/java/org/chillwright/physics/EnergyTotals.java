package org.chillwright.physics;

/**
 * Where the energy of a simulation went, J. The first law for the storage and converter:
 * generator = converter loss + turned away + charging loss + leakage + sleep + events + stored change.
 *
 * @param generatorJ     electrical energy the generator gave the converter
 * @param converterLossJ lost in the converter
 * @param rejectedJ      converter output the storage could not take (full, or above a cell's charge acceptance)
 * @param chargeLossJ    lost charging a cell
 * @param leakageJ       lost to the storage's leakage or self-discharge
 * @param sleepJ         drawn by the device between events
 * @param eventsJ        drawn by the device's events
 * @param storedChangeJ  stored energy at the end minus at the start
 */
public record EnergyTotals(double generatorJ, double converterLossJ, double rejectedJ, double chargeLossJ,
                           double leakageJ, double sleepJ, double eventsJ, double storedChangeJ) {

    /** What the first law leaves over, J: 0 to rounding. */
    public double imbalanceJ() {
        return generatorJ - converterLossJ - rejectedJ - chargeLossJ - leakageJ - sleepJ - eventsJ - storedChangeJ;
    }

    /** Energy the device used, J: sleep plus events. */
    public double deviceJ() {
        return sleepJ + eventsJ;
    }
}
