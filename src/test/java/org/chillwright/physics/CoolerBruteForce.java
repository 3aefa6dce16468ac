package org.chillwright.physics;

/**
 * Independent checks of cooler results, for tests: brute-force scans of the raw heat balances, sharing
 * nothing with {@link OperatingPointSolver} or {@link TwoStageCascade} but the {@link ModuleParameters} record.
 *
 * <p>The balances are the ideal module equations with half the Joule heat to each face (A.F. Ioffe,
 * Semiconductor Thermoelements and Thermoelectric Cooling, 1957, from memory) and the thermal network of the
 * case: Qc = S·I·Tc − ½I²R − K(Th − Tc) leaves the cold face, Qh = S·I·Th + ½I²R − K(Th − Tc) enters the hot
 * path, Th = Tamb + Rh·Qh, and the object sits Rint,c·Q above the cold face. At a fixed current every balance
 * is affine in the unknown temperatures, so one Newton step with a finite-difference Jacobian solves it exactly
 * up to round-off; a point whose hot path cannot carry its heat (the hot balance's slope ≤ 0, runaway) is
 * dropped. Maxima and minima over the current come from a fine scan refined twice around its best point.
 */
public final class CoolerBruteForce {

    private static final int SCAN_POINTS = 1500;
    private static final int REFINE_POINTS = 100;
    private static final int BISECTIONS = 60;

    private CoolerBruteForce() {
    }

    /** Hot-face temperature at current I with the cold face at Tc, K; NaN past runaway. */
    static double hotFaceK(ModuleParameters m, double ambientK, double hotPathKPerW, double i, double coldK) {
        double th0 = ambientK;
        double g0 = hotResidualK(m, ambientK, hotPathKPerW, i, coldK, th0);
        double slope = hotResidualK(m, ambientK, hotPathKPerW, i, coldK, th0 + 1) - g0; // affine: exact slope
        return slope > 0 ? th0 - g0 / slope : Double.NaN;
    }

    private static double hotResidualK(ModuleParameters m, double ambientK, double rh, double i, double tc, double th) {
        double heatW = m.seebeckVPerK() * i * th + 0.5 * i * i * m.resistanceOhm() - m.conductanceWPerK() * (th - tc);
        return th - ambientK - rh * heatW;
    }

    /** Heat pumped from a cold face at Tc at current I into the case's hot path, W; −∞ past runaway. */
    static double coldHeatW(ModuleParameters m, CoolingCase c, double i, double coldK) {
        double th = hotFaceK(m, c.ambientK(), c.hotPathKPerW(), i, coldK);
        if (Double.isNaN(th)) {
            return Double.NEGATIVE_INFINITY;
        }
        return m.seebeckVPerK() * i * coldK - 0.5 * i * i * m.resistanceOhm() - m.conductanceWPerK() * (th - coldK);
    }

    /** {current, heat}: the most heat pumped from a cold face at Tc over currents 0 to 2·S·Tc/R. */
    static double[] peakAtColdFace(ModuleParameters m, CoolingCase c, double coldK) {
        double topA = 2 * m.seebeckVPerK() * coldK / m.resistanceOhm();
        return scanMax(i -> coldHeatW(m, c, i, coldK), 0, topA);
    }

    /**
     * {heat, current}: the most heat removable with the object held at the case's set-point: the root Q of
     * peak(Tobj − Rint,c·Q) = Q, by bisection (the left side falls as Q grows, the right rises).
     */
    public static double[] capacityAtObject(ModuleParameters m, CoolingCase c) {
        double rc = c.coldInterfaceKPerW();
        java.util.function.DoubleUnaryOperator surplus = q -> peakAtColdFace(m, c, c.setPointK() - rc * q)[1] - q;
        double low = Math.min(0, peakAtColdFace(m, c, c.setPointK())[1]);
        double high = low + 1;
        while (surplus.applyAsDouble(high) > 0) {
            high = low + 2 * (high - low);
        }
        for (int n = 0; n < BISECTIONS; n++) {
            double mid = 0.5 * (low + high);
            if (surplus.applyAsDouble(mid) > 0) {
                low = mid;
            } else {
                high = mid;
            }
        }
        double q = 0.5 * (low + high);
        return new double[] {q, peakAtColdFace(m, c, c.setPointK() - rc * q)[0]};
    }

    /**
     * Object temperature at a fixed current with the case's load, K; NaN when the point is not physical
     * (runaway, or a cold face at or below 0 K). Solves the two raw balances in (Tc, Th).
     */
    public static double partAtCurrentK(ModuleParameters m, CoolingCase c, double i) {
        double tc = c.setPointK();
        double th = c.ambientK();
        double[] r = balances(m, c, i, tc, th);
        double[] rTc = balances(m, c, i, tc + 1, th);
        double[] rTh = balances(m, c, i, tc, th + 1);
        double j11 = rTc[0] - r[0];
        double j21 = rTc[1] - r[1];
        double j12 = rTh[0] - r[0];
        double j22 = rTh[1] - r[1];
        double det = j11 * j22 - j12 * j21;
        double coldK = tc - (r[0] * j22 - j12 * r[1]) / det;
        double hotK = th - (j11 * r[1] - j21 * r[0]) / det;
        double hotSlope = hotResidualK(m, c.ambientK(), c.hotPathKPerW(), i, coldK, hotK + 1)
                - hotResidualK(m, c.ambientK(), c.hotPathKPerW(), i, coldK, hotK);
        return coldK > 0 && hotSlope > 0 ? coldK + c.coldInterfaceKPerW() * c.heatLoadW() : Double.NaN;
    }

    /** {cold-face balance, hot-face balance} residuals, W and K: zero at the steady point. */
    private static double[] balances(ModuleParameters m, CoolingCase c, double i, double tc, double th) {
        double coldW = m.seebeckVPerK() * i * tc - 0.5 * i * i * m.resistanceOhm() - m.conductanceWPerK() * (th - tc);
        return new double[] {coldW - c.heatLoadW(), hotResidualK(m, c.ambientK(), c.hotPathKPerW(), i, tc, th)};
    }

    /** The lowest object temperature at the case's load over currents 0 to {@code limitA}, K. */
    public static double lowestSetPointK(ModuleParameters m, CoolingCase c, double limitA) {
        double top = Double.isFinite(limitA) ? limitA : 2 * m.seebeckVPerK() * c.setPointK() / m.resistanceOhm();
        double[] best = scanMax(i -> {
            double setPointK = partAtCurrentK(m, c, i);
            return Double.isNaN(setPointK) ? Double.NEGATIVE_INFINITY : -setPointK;
        }, 0, top);
        return -best[1];
    }

    /**
     * {current, COP}: the lowest shared current at which the cold stage of a cascade pumps {@code heatLoadW}
     * between fixed cold and hot sides, by scanning up from zero and bisecting the first crossing. The
     * interstage balance Qh1 = Qc2 is affine in Ti and solved by one finite-difference Newton step.
     */
    public static double[] cascadeSharedCurrent(ModuleParameters cold, ModuleParameters hot, double heatLoadW,
                                                double coldK, double hotK) {
        java.util.function.DoubleUnaryOperator surplus = i -> {
            double ti = interstageK(cold, hot, i, coldK, hotK);
            if (!(ti > coldK && ti < hotK)) {
                return Double.NEGATIVE_INFINITY;
            }
            return cold.seebeckVPerK() * i * coldK - 0.5 * i * i * cold.resistanceOhm()
                    - cold.conductanceWPerK() * (ti - coldK) - heatLoadW;
        };
        double topA = 4 * Math.max(cold.seebeckVPerK() * coldK / cold.resistanceOhm(),
                hot.seebeckVPerK() * hotK / hot.resistanceOhm());
        double stepA = topA / 20_000;
        double low = 0;
        double high = Double.NaN;
        for (double i = stepA; i <= topA; i += stepA) {
            if (surplus.applyAsDouble(i) >= 0) {
                high = i;
                break;
            }
            low = i;
        }
        if (Double.isNaN(high)) {
            return new double[] {Double.NaN, Double.NaN};
        }
        for (int n = 0; n < BISECTIONS; n++) {
            double mid = 0.5 * (low + high);
            if (surplus.applyAsDouble(mid) >= 0) {
                high = mid;
            } else {
                low = mid;
            }
        }
        double i = 0.5 * (low + high);
        double ti = interstageK(cold, hot, i, coldK, hotK);
        double powerW = i * (cold.seebeckVPerK() * (ti - coldK) + i * cold.resistanceOhm())
                + i * (hot.seebeckVPerK() * (hotK - ti) + i * hot.resistanceOhm());
        return new double[] {i, heatLoadW / powerW};
    }

    private static double interstageK(ModuleParameters cold, ModuleParameters hot, double i, double coldK,
                                      double hotK) {
        java.util.function.DoubleUnaryOperator mismatch = ti -> {
            double releasedW = cold.seebeckVPerK() * i * ti + 0.5 * i * i * cold.resistanceOhm()
                    - cold.conductanceWPerK() * (ti - coldK);
            double pumpedW = hot.seebeckVPerK() * i * ti - 0.5 * i * i * hot.resistanceOhm()
                    - hot.conductanceWPerK() * (hotK - ti);
            return releasedW - pumpedW;
        };
        double t0 = 0.5 * (coldK + hotK);
        double g0 = mismatch.applyAsDouble(t0);
        double slope = mismatch.applyAsDouble(t0 + 1) - g0;
        return slope < 0 ? t0 - g0 / slope : Double.NaN; // a stable interstage: more Ti, more heat taken away
    }

    /** {argument, value} of the largest value of f on [low, high]: a scan refined twice around its best point. */
    private static double[] scanMax(java.util.function.DoubleUnaryOperator f, double low, double high) {
        double bestX = low;
        double bestY = Double.NEGATIVE_INFINITY;
        int points = SCAN_POINTS;
        double lo = low;
        double hi = high;
        for (int round = 0; round < 3; round++) {
            double step = (hi - lo) / points;
            for (int n = 0; n <= points; n++) {
                double x = lo + n * step;
                double y = f.applyAsDouble(x);
                if (y > bestY) {
                    bestY = y;
                    bestX = x;
                }
            }
            lo = Math.max(low, bestX - step);
            hi = Math.min(high, bestX + step);
            points = REFINE_POINTS;
        }
        return new double[] {bestX, bestY};
    }
}
