package org.chillwright.physics;

/**
 * Limits an operating point must respect, each optional (NaN means "not given"). All refer to the
 * terminals of what is solved: for an array, the array's rated Imax (module Imax × parallel
 * strings, see {@link MaxRatings#inArray}) and the supply's output.
 *
 * @param ratedImaxA   rated Imax at the terminals, A, &gt; 0 or NaN
 * @param supplyMaxV   largest supply voltage, V, &gt; 0 or NaN
 * @param supplyMaxA   largest supply current, A, &gt; 0 or NaN
 * @param maxHotSideK  highest allowed hot-face temperature of the module (solder or assembly limit), K, &gt; 0 or NaN
 */
public record DriveLimits(double ratedImaxA, double supplyMaxV, double supplyMaxA, double maxHotSideK) {

    /** No limits at all. */
    public static final DriveLimits NONE = new DriveLimits(Double.NaN, Double.NaN, Double.NaN, Double.NaN);

    public DriveLimits {
        Check.positiveOrAbsent("ratedImaxA", ratedImaxA);
        Check.positiveOrAbsent("supplyMaxV", supplyMaxV);
        Check.positiveOrAbsent("supplyMaxA", supplyMaxA);
        Check.positiveOrAbsent("maxHotSideK", maxHotSideK);
    }

    /** Only a rated Imax, A. */
    public static DriveLimits ofRatedImaxA(double ratedImaxA) {
        return new DriveLimits(ratedImaxA, Double.NaN, Double.NaN, Double.NaN);
    }

    /**
     * The hottest hot face a point may have, K: the module's stated maximum where it has one, else
     * {@link SafetyLimits#HOT_FACE_WITHOUT_STATED_LIMIT_K} (250 °C). Beyond it a point is of no physical use.
     */
    public double hotFaceLimitK() {
        return Double.isNaN(maxHotSideK) ? SafetyLimits.HOT_FACE_WITHOUT_STATED_LIMIT_K : maxHotSideK;
    }

    /** Whether a rated Imax was given. */
    public boolean hasRatedImax() {
        return !Double.isNaN(ratedImaxA);
    }

    /**
     * The largest current allowed by the rated Imax and the supply, A (+∞ when neither is given).
     */
    public double currentLimitA() {
        double limitA = Double.POSITIVE_INFINITY;
        if (!Double.isNaN(ratedImaxA)) {
            limitA = Math.min(limitA, ratedImaxA);
        }
        if (!Double.isNaN(supplyMaxA)) {
            limitA = Math.min(limitA, supplyMaxA);
        }
        return limitA;
    }
}
