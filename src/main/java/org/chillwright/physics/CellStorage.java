package org.chillwright.physics;

/**
 * A rechargeable cell as a lumped energy store: a capacity, a constant terminal voltage (its nominal voltage;
 * the open-circuit voltage curve and internal resistance are not modelled), a charge acceptance (the largest
 * charging current) and a charge efficiency (energy stored over energy delivered to the cell while charging;
 * discharge is taken as lossless). The cell is full at its capacity; the device is cut off at
 * {@code minimumChargeFraction} of it.
 *
 * @param capacityJ             energy when full, J, finite and &gt; 0 (see {@link #ofMilliampHours})
 * @param nominalV              terminal voltage, V, &gt; 0
 * @param maxChargeCurrentA     largest charging current the cell accepts, A, &gt; 0; what the converter delivers
 *                              above maxChargeCurrentA × nominalV is turned away
 * @param chargeEfficiency      energy stored over energy delivered while charging, in (0, 1]
 * @param minimumChargeFraction fraction of the capacity below which the device is cut off, in [0, 1)
 * @param selfDischargeCurrentA constant self-discharge current, A, ≥ 0
 */
public record CellStorage(double capacityJ, double nominalV, double maxChargeCurrentA, double chargeEfficiency,
                          double minimumChargeFraction, double selfDischargeCurrentA) implements EnergyStorage {

    /** Coulombs in one milliampere-hour: 1e-3 A × 3600 s. */
    private static final double COULOMBS_PER_MILLIAMP_HOUR = 3.6;

    public CellStorage {
        Check.positive("capacityJ", capacityJ);
        Check.positive("nominalV", nominalV);
        Check.positive("maxChargeCurrentA", maxChargeCurrentA);
        Check.fraction("chargeEfficiency", chargeEfficiency);
        Check.within("minimumChargeFraction", minimumChargeFraction, 0, 1);
        if (minimumChargeFraction == 1) {
            throw new InvalidQuantityException("minimumChargeFraction", 1,
                    "minimumChargeFraction must be < 1, was 1.0");
        }
        Check.nonNegative("selfDischargeCurrentA", selfDischargeCurrentA);
    }

    /**
     * A cell given by its charge capacity: capacity in J = mAh × 3.6 C/mAh × nominal V.
     *
     * @param capacityMAh capacity, mAh, &gt; 0
     */
    public static CellStorage ofMilliampHours(double capacityMAh, double nominalV, double maxChargeCurrentA,
                                              double chargeEfficiency, double minimumChargeFraction,
                                              double selfDischargeCurrentA) {
        Check.positive("capacityMAh", capacityMAh);
        Check.positive("nominalV", nominalV);
        return new CellStorage(capacityMAh * COULOMBS_PER_MILLIAMP_HOUR * nominalV, nominalV, maxChargeCurrentA,
                chargeEfficiency, minimumChargeFraction, selfDischargeCurrentA);
    }

    /** Largest power the cell accepts while charging, W: maxChargeCurrentA × nominalV. */
    public double maxChargePowerW() {
        return maxChargeCurrentA * nominalV;
    }

    @Override
    public double floorJ() {
        return minimumChargeFraction * capacityJ;
    }

    @Override
    public double fullJ() {
        return capacityJ;
    }

    @Override
    public double voltageAtV(double storedJ) {
        return nominalV;
    }
}
