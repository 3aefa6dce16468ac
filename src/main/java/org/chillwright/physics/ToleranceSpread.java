package org.chillwright.physics;

/**
 * One-standard-deviation spreads of the inputs of a design, each a fraction of its nominal value
 * (0.05 = 5 %), normal and independent. Part-to-part spreads apply to every module of an array on
 * its own; the others to the design as a whole. Zero turns an input off.
 *
 * @param seebeckFraction        spread of each module's S, ≥ 0 and &lt; 0.2
 * @param resistanceFraction     spread of each module's R, ≥ 0 and &lt; 0.2
 * @param conductanceFraction    spread of each module's K, ≥ 0 and &lt; 0.2
 * @param sinkResistanceFraction spread of the heat-sink resistance, ≥ 0 and &lt; 0.2
 * @param interfaceFraction      spread of each interface resistance (cold and hot drawn apart), ≥ 0 and &lt; 0.2
 * @param supplyFraction         spread of the supply's voltage and current limits (one draw for both), ≥ 0 and &lt; 0.2
 */
public record ToleranceSpread(double seebeckFraction, double resistanceFraction, double conductanceFraction,
                              double sinkResistanceFraction, double interfaceFraction, double supplyFraction) {

    /** Below 0.2 (20 %), so that a draw below zero (5σ) is rarer than one in three million; such draws are redrawn. */
    static final double LARGEST_FRACTION = 0.2;

    /** Part-to-part spread of S, R and K of 5 % each and nothing else (the default of the tolerance analysis). */
    public static final ToleranceSpread PARTS_FIVE_PERCENT = new ToleranceSpread(0.05, 0.05, 0.05, 0, 0, 0);

    /** No spread at all: the Monte Carlo run then repeats the single solve. */
    public static final ToleranceSpread NONE = new ToleranceSpread(0, 0, 0, 0, 0, 0);

    public ToleranceSpread {
        check("seebeckFraction", seebeckFraction);
        check("resistanceFraction", resistanceFraction);
        check("conductanceFraction", conductanceFraction);
        check("sinkResistanceFraction", sinkResistanceFraction);
        check("interfaceFraction", interfaceFraction);
        check("supplyFraction", supplyFraction);
    }

    private static void check(String field, double fraction) {
        Check.nonNegative(field, fraction);
        Check.below(field, fraction, LARGEST_FRACTION, "0.2 (20 %)");
    }

    /** Whether any part-to-part spread is set. */
    boolean partsVary() {
        return seebeckFraction > 0 || resistanceFraction > 0 || conductanceFraction > 0;
    }
}
