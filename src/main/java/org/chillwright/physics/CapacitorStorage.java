package org.chillwright.physics;

import java.util.OptionalDouble;

/**
 * A capacitor or supercapacitor: stored energy E = ½·C·V² (e.g. D. Halliday, R. Resnick &amp; J. Walker,
 * Fundamentals of Physics, ch. 25, from memory), usable between {@code minimumV} and {@code maximumV}, with
 * a leakage modelled as a parallel resistance, a constant current, or both. Charging stops at
 * {@code maximumV}: what the converter delivers beyond that is turned away.
 *
 * @param capacitanceF         capacitance C, F, finite and &gt; 0
 * @param minimumV             lower bound of the usable window, V, ≥ 0: the device is cut off below it
 * @param maximumV             upper bound (full), V, &gt; minimumV
 * @param leakageResistanceOhm parallel leakage resistance, Ω, &gt; 0; +∞ for none
 * @param leakageCurrentA      constant leakage current drawn at any voltage above 0, A, ≥ 0
 */
public record CapacitorStorage(double capacitanceF, double minimumV, double maximumV, double leakageResistanceOhm,
                               double leakageCurrentA) implements EnergyStorage {

    public CapacitorStorage {
        Check.positive("capacitanceF", capacitanceF);
        Check.nonNegative("minimumV", minimumV);
        Check.above("maximumV", maximumV, minimumV, "minimumV");
        Check.positiveOrInfinite("leakageResistanceOhm", leakageResistanceOhm);
        Check.nonNegative("leakageCurrentA", leakageCurrentA);
    }

    /** Stored energy at a voltage, J: ½·C·V². */
    public double energyAtJ(double voltageV) {
        return 0.5 * capacitanceF * voltageV * voltageV;
    }

    @Override
    public double floorJ() {
        return energyAtJ(minimumV);
    }

    @Override
    public double fullJ() {
        return energyAtJ(maximumV);
    }

    @Override
    public double voltageAtV(double storedJ) {
        return Math.sqrt(2 * Math.max(0, storedJ) / capacitanceF);
    }

    /**
     * Time to charge a capacitor with a constant net power through a parallel leakage resistance, s (derived
     * here from E = ½CV²). The balance C·V·dV/dt = P − V²/R, with u = V², is the linear equation
     * (C/2)·du/dt = P − u/R, so u(t) = P·R + (u1 − P·R)·exp(−2t/(R·C)) and
     * <pre>t = (R·C/2)·ln((P·R − V1²)/(P·R − V2²)),</pre>
     * reached only when V2² &lt; P·R. Without leakage (R → ∞) it becomes t = C·(V2² − V1²)/(2P).
     * The logarithm is taken as ln(1 + (V2² − V1²)/(P·R − V2²)) so that a large R loses no digits.
     *
     * @param capacitanceF         C, F, &gt; 0
     * @param leakageResistanceOhm R, Ω, &gt; 0; +∞ for none
     * @param fromV                V1, V, ≥ 0
     * @param toV                  V2, V, ≥ fromV
     * @param powerW               net charging power P, W, ≥ 0
     * @return the time, or empty when V2 is never reached (V2² ≥ P·R, or no power)
     */
    public static OptionalDouble chargeTimeS(double capacitanceF, double leakageResistanceOhm, double fromV,
                                             double toV, double powerW) {
        Check.positive("capacitanceF", capacitanceF);
        Check.positiveOrInfinite("leakageResistanceOhm", leakageResistanceOhm);
        Check.nonNegative("fromV", fromV);
        Check.nonNegative("toV", toV);
        if (toV < fromV) {
            throw new InvalidQuantityException("toV", toV, "toV must be >= fromV (" + fromV + "), was " + toV);
        }
        Check.nonNegative("powerW", powerW);
        double riseV2 = toV * toV - fromV * fromV;
        if (riseV2 == 0) {
            return OptionalDouble.of(0);
        }
        if (powerW == 0) {
            return OptionalDouble.empty();
        }
        if (leakageResistanceOhm == Double.POSITIVE_INFINITY) {
            return OptionalDouble.of(capacitanceF * riseV2 / (2 * powerW));
        }
        double headroomV2 = powerW * leakageResistanceOhm - toV * toV;
        if (!(headroomV2 > 0)) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(0.5 * leakageResistanceOhm * capacitanceF * Math.log1p(riseV2 / headroomV2));
    }
}
