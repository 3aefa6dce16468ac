package org.chillwright.physics;

import java.util.List;

/**
 * What a Monte Carlo tolerance analysis found ({@link ToleranceAnalysis}).
 *
 * @param requestedSamples       samples asked for
 * @param samples                samples solved (fewer when cancelled)
 * @param cancelled              whether the run was cancelled before the end
 * @param probabilityHolds       fraction of samples that hold the set-point within the drive limits (feasible)
 * @param probabilityHotSideAboveLimit fraction of samples whose hot face exceeds the drive limits' maximum
 *                               (0 when no maximum was given)
 * @param marginK                5th, 50th and 95th percentile of the margin, K (see {@link ToleranceAnalysis})
 * @param currentA               percentiles of the current over the samples that hold, A (NaN when none)
 * @param hotSideK               percentiles of the hot face over the samples that hold, K (NaN when none)
 * @param marginMeanK            mean margin, K
 * @param marginStandardDeviationK standard deviation of the margin, K
 * @param sensitivity            inputs ranked by how strongly they move the margin, strongest first
 * @param marginHistogram        histogram of the margin
 */
public record ToleranceResult(int requestedSamples, int samples, boolean cancelled, double probabilityHolds,
                              double probabilityHotSideAboveLimit, Percentiles marginK, Percentiles currentA,
                              Percentiles hotSideK, double marginMeanK, double marginStandardDeviationK,
                              List<Sensitivity> sensitivity, Histogram marginHistogram) {

    public ToleranceResult {
        sensitivity = List.copyOf(sensitivity);
    }

    /**
     * Percentiles of a quantity.
     *
     * @param p5  5th percentile
     * @param p50 median
     * @param p95 95th percentile
     */
    public record Percentiles(double p5, double p50, double p95) {
    }

    /**
     * How strongly one input moves the margin: Spearman's rank correlation between the input's draws
     * and the margin (−1 to 1; the sign says the direction).
     *
     * @param input           the input
     * @param rankCorrelation Spearman's ρ
     */
    public record Sensitivity(ToleranceInput input, double rankCorrelation) {
    }

    /**
     * Equal-width histogram.
     *
     * @param lowestK    lower edge of the first bin, K
     * @param binWidthK  width of each bin, K
     * @param counts     samples per bin
     */
    public record Histogram(double lowestK, double binWidthK, long[] counts) {

        public Histogram {
            counts = counts.clone();
        }

        @Override
        public long[] counts() {
            return counts.clone();
        }
    }
}
