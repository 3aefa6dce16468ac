package org.chillwright.physics;

import java.util.OptionalDouble;

/**
 * Maximum ratings of a module at a stated hot-side temperature, as in a catalogue (the ideal-model
 * definitions): ΔTmax is the largest ΔT at Qc = 0, Imax the current giving it, Vmax the
 * voltage there and Qmax the cooling at Imax and ΔT = 0.
 *
 * @param imaxA    Imax, A, finite and &gt; 0
 * @param vmaxV    Vmax, V, finite and &gt; 0
 * @param qmaxW    Qmax, W, finite and &gt; 0, or NaN when not stated (see {@link #hasQmax()})
 * @param dtmaxK   ΔTmax, K, finite, &gt; 0 and &lt; hotSideK
 * @param hotSideK hot-side temperature of the rating, K, finite and &gt; 0
 */
public record MaxRatings(double imaxA, double vmaxV, double qmaxW, double dtmaxK, double hotSideK) {

    public MaxRatings {
        Check.positive("imaxA", imaxA);
        Check.positive("vmaxV", vmaxV);
        Check.positiveOrAbsent("qmaxW", qmaxW);
        Check.positive("hotSideK", hotSideK);
        Check.positive("dtmaxK", dtmaxK);
        Check.below("dtmaxK", dtmaxK, hotSideK, "hotSideK");
    }

    /** Ratings without a stated Qmax. */
    public static MaxRatings withoutQmax(double imaxA, double vmaxV, double dtmaxK, double hotSideK) {
        return new MaxRatings(imaxA, vmaxV, Double.NaN, dtmaxK, hotSideK);
    }

    /** Whether Qmax was stated; if not, {@link #qmaxW()} is NaN. */
    public boolean hasQmax() {
        return !Double.isNaN(qmaxW);
    }

    /** Stated Qmax, W, or empty. */
    public OptionalDouble statedQmaxW() {
        return hasQmax() ? OptionalDouble.of(qmaxW) : OptionalDouble.empty();
    }

    /**
     * Qmax implied by the other three ratings in the ideal model, W:
     * Qmax = Imax·Vmax(Th + ΔTmax)/(2Th) (consistency of the four ideal ratings, derived here from the ideal
     * equations: Vmax = S·Th and Qmax = S·Imax(Th + ΔTmax)/2).
     */
    public double impliedQmaxW() {
        return imaxA * vmaxV * (hotSideK + dtmaxK) / (2 * hotSideK);
    }

    /**
     * Stated Qmax / implied Qmax (1.0 for ideal-model-consistent ratings; catalogue entries are
     * often a few percent off; case S04 gives 0.91). Empty without a stated Qmax.
     */
    public OptionalDouble consistency() {
        return hasQmax() ? OptionalDouble.of(qmaxW / impliedQmaxW()) : OptionalDouble.empty();
    }

    /**
     * Ratings of {@code seriesCount × parallelCount} identical modules on common plates:
     * Imax·np, Vmax·ns, Qmax·ns·np, ΔTmax unchanged (circuit algebra of identical modules, derived here).
     */
    public MaxRatings inArray(int seriesCount, int parallelCount) {
        Check.atLeastOne("seriesCount", seriesCount);
        Check.atLeastOne("parallelCount", parallelCount);
        return new MaxRatings(imaxA * parallelCount, vmaxV * seriesCount,
                qmaxW * seriesCount * parallelCount, dtmaxK, hotSideK);
    }
}
