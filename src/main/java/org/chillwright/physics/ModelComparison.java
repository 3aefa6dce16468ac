package org.chillwright.physics;

/**
 * The lumped and the detailed operating point of one design at the same case, side by side, with
 * their differences: what {@code POST /api/v1/operating-point/detailed} and the candidate page show.
 * Each difference is (detailed − lumped)/|lumped| as a fraction (0.05 = 5 %), NaN where either
 * model has no point or the lumped value is zero.
 *
 * @param lumped       the lumped solve ({@link OperatingPointSolver})
 * @param detailed     the detailed solve ({@link DetailedSolver})
 * @param differences  relative differences per quantity
 * @param materialName the material set the detailed model used
 */
public record ModelComparison(OperatingPoint lumped, DetailedResult detailed, Differences differences,
                              String materialName) {

    /** Above this relative difference in any compared quantity the two models disagree enough to flag (5 %, issue 13; common practice, no source). */
    public static final double FLAG_FRACTION = 0.05;

    /**
     * Relative differences (fractions) of the compared quantities.
     *
     * @param currentFraction       current
     * @param copFraction           COP
     * @param powerFraction         electrical power
     * @param hotSideFraction       hot face temperature (in kelvin)
     * @param coldSideFraction      cold face temperature (in kelvin)
     * @param maxHeatLoadFraction   most heat removable at the set-point
     * @param heatRejectedFraction  heat rejected
     */
    public record Differences(double currentFraction, double copFraction, double powerFraction,
                              double hotSideFraction, double coldSideFraction, double maxHeatLoadFraction,
                              double heatRejectedFraction) {

        /** The largest absolute difference, NaN when none is defined. */
        public double largestFraction() {
            double[] all = {currentFraction, copFraction, powerFraction, hotSideFraction, coldSideFraction,
                    maxHeatLoadFraction, heatRejectedFraction};
            double largest = Double.NaN;
            for (double v : all) {
                if (!Double.isNaN(v) && !(Math.abs(v) <= largest)) {
                    largest = Math.abs(v);
                }
            }
            return largest;
        }
    }

    /** Whether any difference exceeds {@link #FLAG_FRACTION}, or only one model has a point. */
    public boolean flagged() {
        if (lumped.feasible() != detailed.feasible()) {
            return true;
        }
        double largest = differences.largestFraction();
        return !Double.isNaN(largest) && largest > FLAG_FRACTION;
    }

    /**
     * Solves a design both ways and compares.
     *
     * @param lumpedArray   the design as the lumped model sees it (for a module entered by ratings, its
     *                      parameters from the ratings)
     * @param detailedArray the same design in the detailed model (a fitted or constructed module)
     */
    public static ModelComparison of(ModuleArray lumpedArray, DetailedArray detailedArray, CoolingCase coolingCase,
                                     DriveLimits limits, DetailedSolver solver) {
        OperatingPoint lumped = new OperatingPointSolver().solve(lumpedArray, coolingCase, limits);
        DetailedResult detailed = solver.solve(detailedArray, coolingCase, limits);
        Differences d;
        if (lumped instanceof Solved l && detailed instanceof DetailedPoint p) {
            d = new Differences(relative(p.currentA(), l.currentA()), relative(p.cop(), l.cop()),
                    relative(p.powerW(), l.powerW()), relative(p.hotSideK(), l.hotSideK()),
                    relative(p.coldSideK(), l.coldSideK()), relative(p.maxHeatLoadW(), l.maxHeatLoadW()),
                    relative(p.heatRejectedW(), l.heatRejectedW()));
        } else {
            d = new Differences(Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
        }
        return new ModelComparison(lumped, detailed, d, detailedArray.module().material().name());
    }

    private static double relative(double detailed, double lumped) {
        if (!Double.isFinite(detailed) || !Double.isFinite(lumped) || lumped == 0) {
            return Double.NaN;
        }
        return (detailed - lumped) / Math.abs(lumped);
    }
}
