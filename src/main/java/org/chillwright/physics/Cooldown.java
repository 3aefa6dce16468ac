package org.chillwright.physics;

import java.util.OptionalDouble;

/**
 * Cool-down of a lumped object on the cold face at constant current and fixed hot side
 * (lumped-capacitance method, F.P. Incropera &amp; D.P. DeWitt, Fundamentals of Heat and
 * Mass Transfer, ch. 5, valid for Biot number &lt; 0.1, from memory; case S16). The module's own heat
 * capacity is neglected. C·dT/dt = Qload + (Tamb − T)/Rleak − Qc(T) is linear in T, so
 * T(t) = T∞ + (T0 − T∞)·exp(−t/τ) with G = S·I + K + 1/Rleak, T∞ = (Qload + Tamb/Rleak + ½I²R + K·Th)/G, τ = C/G.
 *
 * @param module              module parameters
 * @param currentA            constant current, A, ≥ 0
 * @param hotSideK            hot-face temperature, K, &gt; 0
 * @param heatCapacityJPerK   heat capacity of the object, J/K, &gt; 0
 * @param heatLoadW           constant heat load on the object, W, ≥ 0
 * @param ambientK            ambient temperature for the leak, K, &gt; 0
 * @param leakResistanceKPerW leak from ambient to the object, K/W, &gt; 0 (+∞ for no leak)
 */
public record Cooldown(ModuleParameters module, double currentA, double hotSideK, double heatCapacityJPerK,
                       double heatLoadW, double ambientK, double leakResistanceKPerW) {

    public Cooldown {
        if (module == null) {
            throw new InvalidQuantityException("module", Double.NaN, "module must be given, was null");
        }
        Check.nonNegative("currentA", currentA);
        Check.positive("hotSideK", hotSideK);
        Check.positive("heatCapacityJPerK", heatCapacityJPerK);
        Check.nonNegative("heatLoadW", heatLoadW);
        Check.positive("ambientK", ambientK);
        Check.positiveOrInfinite("leakResistanceKPerW", leakResistanceKPerW);
    }

    /** G = S·I + K + 1/Rleak, W/K: how strongly the object is pulled to its final temperature. */
    private double pullWPerK() {
        return module.seebeckVPerK() * currentA + module.conductanceWPerK() + 1 / leakResistanceKPerW;
    }

    /** Final (steady) temperature T∞, K. */
    public double finalK() {
        double i = currentA;
        return (heatLoadW + ambientK / leakResistanceKPerW + 0.5 * i * i * module.resistanceOhm()
                + module.conductanceWPerK() * hotSideK) / pullWPerK();
    }

    /** Time constant τ = C/G, s. */
    public double timeConstantS() {
        return heatCapacityJPerK / pullWPerK();
    }

    /**
     * Object temperature after a time, K.
     *
     * @param startK starting temperature T0, K, &gt; 0
     * @param timeS  time since the current was switched on, s, ≥ 0
     */
    public double temperatureAtK(double startK, double timeS) {
        Check.positive("startK", startK);
        Check.nonNegative("timeS", timeS);
        double finalK = finalK();
        return finalK + (startK - finalK) * Math.exp(-timeS / timeConstantS());
    }

    /**
     * First time at which the object is at or below a target, s: 0 if it starts there, empty if the
     * final temperature is not below the target (never reached), else −τ·ln((Ttarget − T∞)/(T0 − T∞)).
     *
     * @param startK  starting temperature, K, &gt; 0
     * @param targetK target temperature, K, &gt; 0
     */
    public OptionalDouble timeToTargetS(double startK, double targetK) {
        Check.positive("startK", startK);
        Check.positive("targetK", targetK);
        if (startK <= targetK) {
            return OptionalDouble.of(0.0);
        }
        double finalK = finalK();
        if (finalK >= targetK) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(-timeConstantS() * Math.log((targetK - finalK) / (startK - finalK)));
    }
}
