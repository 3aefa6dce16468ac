package org.chillwright.physics;

/**
 * The rates of a storage over a stretch of time with a constant converter output and the device either on or
 * off. With E the stored energy (J):
 * <pre>dE/dt = inW − sleepW − leakW − (sleepPerRootW + leakPerRootW)·√E − leakPerS·E.</pre>
 * For a capacitor, V = √(2E/C), so a current I drawn at the storage voltage takes I·√(2/C)·√E and a leakage
 * resistance R takes V²/R = (2/(R·C))·E (derived from E = ½CV²). For a cell every draw is at the nominal
 * voltage, so every term is constant. The rate falls as E grows in both cases.
 *
 * @param deliveredW       converter output, W
 * @param chargeEfficiency energy stored over energy accepted while charging (1 for a capacitor)
 * @param inW              power entering the store, W: chargeEfficiency × accepted power
 * @param rejectedW        converter output above the cell's charge acceptance, W (0 for a capacitor)
 * @param chargeLossW      accepted power lost in charging, W
 * @param sleepW           constant part of the device's draw, W (0 when off)
 * @param sleepPerRootW    coefficient of √E in the device's draw, W/√J (0 when off)
 * @param leakW            constant part of the leakage, W
 * @param leakPerRootW     coefficient of √E in the leakage, W/√J
 * @param leakPerS         coefficient of E in the leakage, 1/s
 */
record StorageFlows(double deliveredW, double chargeEfficiency, double inW, double rejectedW, double chargeLossW,
                    double sleepW, double sleepPerRootW, double leakW, double leakPerRootW, double leakPerS) {

    static StorageFlows of(EnergyStorage storage, DutyCycledDevice device, boolean deviceOn, double deliveredW) {
        double sleepCurrentA = deviceOn ? device.sleepCurrentA() : 0;
        double sleepPowerW = deviceOn ? device.sleepPowerW() : 0;
        if (storage instanceof CapacitorStorage cap) {
            double perRootVolt = Math.sqrt(2 / cap.capacitanceF()); // V = perRootVolt·√E
            double leakPerS = cap.leakageResistanceOhm() == Double.POSITIVE_INFINITY
                    ? 0 : 2 / (cap.leakageResistanceOhm() * cap.capacitanceF());
            return new StorageFlows(deliveredW, 1, deliveredW, 0, 0, sleepPowerW, sleepCurrentA * perRootVolt, 0,
                    cap.leakageCurrentA() * perRootVolt, leakPerS);
        }
        var cell = (CellStorage) storage;
        double acceptedW = Math.min(deliveredW, cell.maxChargePowerW());
        double efficiency = cell.chargeEfficiency();
        return new StorageFlows(deliveredW, efficiency, efficiency * acceptedW, deliveredW - acceptedW,
                (1 - efficiency) * acceptedW, sleepPowerW + sleepCurrentA * cell.nominalV(), 0,
                cell.selfDischargeCurrentA() * cell.nominalV(), 0, 0);
    }

    /** Coefficient of √E in all draws together, W/√J. */
    double perRootW() {
        return sleepPerRootW + leakPerRootW;
    }

    /** True when the rate is linear in E (no current drawn at a capacitor's voltage): then a step is exact. */
    boolean linear() {
        return perRootW() == 0;
    }

    /** The constant part of the rate, W. */
    double constantW() {
        return inW - sleepW - leakW;
    }

    /** dE/dt at a stored energy, W. */
    double netW(double storedJ) {
        return constantW() - perRootW() * Math.sqrt(Math.max(0, storedJ)) - leakPerS * storedJ;
    }

    /** The device's draw at a stored energy, W. */
    double sleepAtW(double storedJ) {
        return sleepW + sleepPerRootW * Math.sqrt(Math.max(0, storedJ));
    }

    /** The leakage at a stored energy, W. */
    double leakAtW(double storedJ) {
        return leakW + leakPerRootW * Math.sqrt(Math.max(0, storedJ)) + leakPerS * storedJ;
    }
}
