package org.chillwright.selection.api;

import jakarta.annotation.Nullable;

/**
 * Lumped parameters of a module and its ideal ratings at a hot-side temperature.
 *
 * @param impliedQmaxW      Qmax implied by the stated Imax, Vmax, ΔTmax (ratings input), else the ideal Qmax
 *                          at the hot side of {@code ratingsAt}
 * @param ratingsConsistency stated Qmax / implied Qmax; null when no Qmax was stated
 */
public record DeriveResponse(
        double seebeckVPerK,
        double resistanceOhm,
        double conductanceWPerK,
        double figureOfMeritPerK,
        double figureOfMeritAt300K,
        double impliedQmaxW,
        @Nullable Double ratingsConsistency,
        Ratings ratingsAt) {

    /** Ideal maximum ratings at {@code hotSideC}. */
    public record Ratings(double imaxA, double vmaxV, double qmaxW, double dtmaxK, double hotSideC) {
    }
}
