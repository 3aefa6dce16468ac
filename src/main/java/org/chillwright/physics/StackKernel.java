package org.chillwright.physics;

/**
 * Allocation-free equations of a two-stage stack on one shared current between a cold face and a heat
 * sink, for ranking many stacks (see {@link TwoStageStack} for the model and its sources). Arguments are
 * the equivalent parameters of each stage (S1, R1, K1 cold; S2, R2, K2 hot), the cold face Tc, the
 * ambient Tamb and the hot path Rh = hot interface + heat sink. They are not checked.
 *
 * <p>At a fixed current I the stack is linear in (Ti, Th) (the two-stage balance derived here, "Fixed currents" with the hot-side
 * balance of the heat-sink network derived here; derived there):
 * <pre>
 *   (S2·I + K2 − S1·I + K1)·Ti − K2·Th        = ½I²(R1 + R2) + K1·Tc        (Qh1 = Qc2)
 *   −Rh·K2·Ti + (1 + Rh·K2 − Rh·S2·I)·Th      = Tamb + ½Rh·R2·I²            (Th = Tamb + Rh·Qh2)
 * </pre>
 * solved by Cramer's rule. Its determinant is positive at I = 0, (K1 + K2)(1 + Rh·K2) − Rh·K2² =
 * K1(1 + Rh·K2) + K2, and stays so up to its first positive root, the runaway current: beyond it there is
 * no steady state. Below it both diagonal terms are positive (at 1 + Rh·K2 − Rh·S2·I = 0 the determinant
 * would be −Rh·K2² &lt; 0), so Ti and Th are positive there.
 */
final class StackKernel {

    /**
     * Currents are solved to 1 nA: the iterations converge quadratically (Newton) or superlinearly (the
     * peak search), so the error left is far below any drive resolution (as {@link OperatingPointSolver}).
     */
    static final double CURRENT_ACCURACY_A = 1e-9;
    /** Iteration cap of the safeguarded searches; well-posed stacks take 3 to 10 steps. */
    static final int MAX_ITERATIONS = 200;
    /** Fraction of the runaway current used as the end of the search: at the runaway current Th is infinite. */
    static final double RUNAWAY_GUARD = 1 - 1e-9;
    /**
     * Without a runaway current the search ends at this multiple of the larger current of largest cooling of
     * the two stages (S·T/R, Ioffe 1957's maximum-performance relations). Past twice that current a stage's Peltier heat is below its Joule
     * heat, so nothing sensible lies beyond four times it.
     */
    static final double CURRENT_CAP_FACTOR = 4;

    private StackKernel() {
    }

    /** Smallest positive root of the fixed-current determinant, A; +∞ when it has none. */
    static double runawayA(double s1, double k1, double s2, double k2, double rh) {
        double u = s2 - s1;
        double e0 = 1 + rh * k2;
        double e1 = -rh * s2;
        double a = (k1 + k2) * e0 - rh * k2 * k2;   // > 0
        double b = u * e0 + (k1 + k2) * e1;
        double c = u * e1;
        if (c == 0) {
            return b < 0 ? -a / b : Double.POSITIVE_INFINITY;
        }
        double discriminant = b * b - 4 * a * c;
        if (discriminant < 0) {
            return Double.POSITIVE_INFINITY; // c > 0 and no real root: positive everywhere
        }
        double q = -0.5 * (b + Math.copySign(Math.sqrt(discriminant), b));
        double root1 = q / c;
        double root2 = q != 0 ? a / q : Double.NaN;
        double smallest = Double.POSITIVE_INFINITY;
        if (root1 > 0) {
            smallest = root1;
        }
        if (root2 > 0 && root2 < smallest) {
            smallest = root2;
        }
        return smallest;
    }

    /** End of the current search, A: just below the runaway current, and never past the cap. */
    static double searchEndA(double s1, double r1, double k1, double s2, double r2, double k2, double tc,
                             double tamb, double rh) {
        double capA = CURRENT_CAP_FACTOR * Math.max(s1 * tc / r1, s2 * tamb / r2);
        return Math.min(capA, runawayA(s1, k1, s2, k2, rh) * RUNAWAY_GUARD);
    }

    /**
     * {Ti, Th} at fixed stage currents I1 (cold) and I2 (hot), K: the 2x2 system above with the cold stage on
     * I1 and the hot stage on I2 (the two-stage balance derived here; case S15 with Rh = 0). NaN when the determinant is ≤ 0.
     */
    static double[] junctionsK(double s1, double r1, double k1, double s2, double r2, double k2, double tc,
                               double tamb, double rh, double i1, double i2) {
        double a11 = s2 * i2 + k2 - s1 * i1 + k1;
        double a22 = 1 + rh * k2 - rh * s2 * i2;
        double det = a11 * a22 - rh * k2 * k2;
        if (!(det > 0)) {
            return new double[] {Double.NaN, Double.NaN};
        }
        double b1 = 0.5 * i1 * i1 * r1 + 0.5 * i2 * i2 * r2 + k1 * tc;
        double b2 = tamb + 0.5 * rh * r2 * i2 * i2;
        return new double[] {(b1 * a22 + k2 * b2) / det, (a11 * b2 + rh * k2 * b1) / det};
    }

    /** Heat pumped by the cold stage Qc1 = S1·I·Tc − ½I²R1 − K1(Ti − Tc) at a shared current, W. */
    static double coolingW(double s1, double r1, double k1, double s2, double r2, double k2, double tc,
                           double tamb, double rh, double i) {
        double a11 = (s2 - s1) * i + k1 + k2;
        double a22 = 1 + rh * k2 - rh * s2 * i;
        double det = a11 * a22 - rh * k2 * k2;
        double half = 0.5 * i * i;
        double b1 = half * (r1 + r2) + k1 * tc;
        double b2 = tamb + rh * r2 * half;
        double ti = (b1 * a22 + k2 * b2) / det;
        return s1 * i * tc - r1 * half - k1 * (ti - tc);
    }

    /**
     * Qc1 − load and its first two derivatives at a shared current: {f, f', f''}. With A·x = b for
     * x = (Ti, Th): A·x' = b' − A'·x and A·x'' = b'' − 2A'·x' (A'' = 0), where A' = diag(S2 − S1, −Rh·S2),
     * b' = (I(R1 + R2), Rh·R2·I) and b'' = (R1 + R2, Rh·R2); then f' = S1·Tc − R1·I − K1·Ti' and
     * f'' = −R1 − K1·Ti''. One division serves all three.
     */
    private static void surplus(double s1, double r1, double k1, double s2, double r2, double k2, double tc,
                                double tamb, double rh, double loadW, double i, double[] out) {
        double u = s2 - s1;
        double a11 = u * i + k1 + k2;
        double a22 = 1 + rh * k2 - rh * s2 * i;
        double rhK2 = rh * k2;
        double perDet = 1 / (a11 * a22 - rhK2 * k2);
        double half = 0.5 * i * i;
        double b1 = half * (r1 + r2) + k1 * tc;
        double b2 = tamb + rh * r2 * half;
        double ti = (b1 * a22 + k2 * b2) * perDet;
        double th = (a11 * b2 + rhK2 * b1) * perDet;
        double c1 = i * (r1 + r2) - u * ti;        // (b' − A'x)_1
        double c2 = rh * (r2 * i + s2 * th);       // (b' − A'x)_2
        double tiSlope = (c1 * a22 + k2 * c2) * perDet;
        double thSlope = (a11 * c2 + rhK2 * c1) * perDet;
        double e1 = r1 + r2 - 2 * u * tiSlope;     // (b'' − 2A'x')_1
        double e2 = rh * (r2 + 2 * s2 * thSlope);  // (b'' − 2A'x')_2
        double tiCurvature = (e1 * a22 + k2 * e2) * perDet;
        out[0] = s1 * i * tc - r1 * half - k1 * (ti - tc) - loadW;
        out[1] = s1 * tc - r1 * i - k1 * tiSlope;
        out[2] = -r1 - k1 * tiCurvature;
    }

    /**
     * Lower root of Qc1(I) = load on one shared current, A; 0 when conduction alone carries the load; NaN
     * when no current in [0, search end) does.
     *
     * <p>Qc1(I) rises to one peak and falls (the two-stage balance derived here, "Same current in both stages"; the tests sweep
     * random stacks against a dense scan). Each step solves the second-order Taylor polynomial of Qc1 for the
     * load (Chebyshev's method: third order, so two or three steps from I = 0 usually suffice), or, where the
     * polynomial does not reach the load or the point is past the peak, steps to the polynomial's top (Newton
     * on the slope). A bracket keeps every step safe: a point below the load on the rising side becomes the
     * low end; one at or above the load, or past the peak, the high end; a step that leaves the bracket is
     * replaced by bisection. Converging on the peak below the load means the load is out of reach.
     */
    static double currentForLoadA(double s1, double r1, double k1, double s2, double r2, double k2, double tc,
                                  double tamb, double rh, double loadW) {
        return search(s1, r1, k1, s2, r2, k2, tc, tamb, rh, loadW, null);
    }

    /**
     * The peak of Qc1(I) on [0, search end): {current, Qc1 there}. The same iteration as
     * {@link #currentForLoadA} with an unreachable load, so that it converges on the peak.
     */
    static double[] peak(double s1, double r1, double k1, double s2, double r2, double k2, double tc, double tamb,
                         double rh) {
        double[] peak = new double[2];
        search(s1, r1, k1, s2, r2, k2, tc, tamb, rh, Double.POSITIVE_INFINITY, peak);
        return peak;
    }

    private static double search(double s1, double r1, double k1, double s2, double r2, double k2, double tc,
                                 double tamb, double rh, double loadW, double[] peakOut) {
        double[] fx = new double[3];
        double i = 0;
        surplus(s1, r1, k1, s2, r2, k2, tc, tamb, rh, loadW, i, fx);
        if (fx[0] >= 0) {
            return 0.0; // passive: conduction alone carries the load
        }
        double lo = 0;
        double hi = searchEndA(s1, r1, k1, s2, r2, k2, tc, tamb, rh);
        boolean above = false; // whether the high end reaches the load
        for (int n = 0; n < MAX_ITERATIONS; n++) {
            double f = fx[0];
            double slope = fx[1];
            double curvature = fx[2];
            double step;
            boolean towardPeak;
            if (f >= 0) {
                hi = i;
                above = true;
            } else if (slope > 0) {
                lo = i;
            } else {
                hi = i;
                above = false;
            }
            double discriminant = slope * slope - 2 * f * curvature;
            if ((f >= 0 || slope > 0) && discriminant >= 0 && slope + Math.sqrt(discriminant) > 0) {
                step = -2 * f / (slope + Math.sqrt(discriminant)); // root of the Taylor polynomial nearest I
                towardPeak = false;
            } else {
                step = -slope / curvature;                          // top of the Taylor polynomial
                towardPeak = true;
            }
            double next = i + step;
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
                towardPeak = !above;
            }
            if (Math.abs(next - i) <= CURRENT_ACCURACY_A || hi - lo <= CURRENT_ACCURACY_A) {
                if (towardPeak && !above) {
                    if (peakOut != null) {
                        peakOut[0] = next;
                        peakOut[1] = coolingW(s1, r1, k1, s2, r2, k2, tc, tamb, rh, next);
                    }
                    return Double.NaN; // the peak is below the load
                }
                return next;
            }
            i = next;
            surplus(s1, r1, k1, s2, r2, k2, tc, tamb, rh, loadW, i, fx);
        }
        if (peakOut != null) {
            peakOut[0] = i;
            peakOut[1] = coolingW(s1, r1, k1, s2, r2, k2, tc, tamb, rh, i);
        }
        return Double.NaN;
    }
}
