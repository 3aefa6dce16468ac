package org.chillwright.physics;

import java.util.List;

/**
 * The corners of one design: the nominal point, hot ambient × high load × worst parts, hot ambient ×
 * high load with nominal parts, and cold ambient × low load (with the heating check of
 * {@link HeatingCheck} when the idle module would pull the object below its set-point). "Worst parts"
 * moves every spread input of {@link ToleranceSpread} by {@code sigmas} standard deviations in the
 * direction that costs margin: S down, R and K up, sink and interfaces up, supply down. Which corners
 * matter is common practice (no source).
 */
public final class WorstCaseCorners {

    private final OperatingPointSolver solver = new OperatingPointSolver();
    private final HeatingCheck heating = new HeatingCheck();

    /**
     * How far the corners reach.
     *
     * @param highLoadW    heat load at the hot corners, W, ≥ 0
     * @param lowLoadW     heat load at the cold corner, W, ≥ 0
     * @param coldAmbientK coldest ambient, K, &gt; 0
     * @param sigmas       standard deviations of the spreads for the worst parts, ≥ 0 (3 is usual practice, no source)
     */
    public record Spec(double highLoadW, double lowLoadW, double coldAmbientK, double sigmas) {
        public Spec {
            Check.nonNegative("highLoadW", highLoadW);
            Check.nonNegative("lowLoadW", lowLoadW);
            Check.positive("coldAmbientK", coldAmbientK);
            Check.nonNegative("sigmas", sigmas);
        }
    }

    /** Which corner. */
    public enum Kind { NOMINAL, HOT_HIGH_LOAD_WORST_PARTS, HOT_HIGH_LOAD, COLD_LOW_LOAD }

    /**
     * One corner's inputs and result.
     *
     * @param kind           which corner
     * @param ambientK       ambient, K
     * @param heatLoadW      heat load, W
     * @param partsFactor    the factor applied to R and K (and 2 − it to S), 1 for nominal parts
     * @param cooling        the cooling solve at this corner
     * @param heating        the heating check at the cold corner when the idle module drains the object; null otherwise
     */
    public record Corner(Kind kind, double ambientK, double heatLoadW, double partsFactor, OperatingPoint cooling,
                         HeatingCheck.Result heating) {
    }

    /** The corners of a design, in the order of {@link Kind}. */
    public List<Corner> table(ModuleArray array, CoolingCase c, DriveLimits limits, ToleranceSpread spread, Spec spec) {
        double k = spec.sigmas();
        double s = 1 - k * spread.seebeckFraction();
        double r = 1 + k * spread.resistanceFraction();
        double kk = 1 + k * spread.conductanceFraction();
        if (!(s > 0)) {
            throw new InvalidQuantityException("sigmas", k, "sigmas × seebeckFraction must stay below 1, was "
                    + k * spread.seebeckFraction());
        }
        ModuleParameters m = array.module();
        ModuleArray worst = new ModuleArray(new ModuleParameters(m.seebeckVPerK() * s, m.resistanceOhm() * r,
                m.conductanceWPerK() * kk), array.seriesCount(), array.parallelCount());
        double sink = 1 + k * spread.sinkResistanceFraction();
        double iface = 1 + k * spread.interfaceFraction();
        double supply = Math.max(0.01, 1 - k * spread.supplyFraction());
        CoolingCase hotHigh = c.withHeatLoadW(spec.highLoadW());
        CoolingCase hotHighWorst = new CoolingCase(c.setPointK(), c.ambientK(), spec.highLoadW(),
                c.sinkResistanceKPerW() * sink, c.coldInterfaceKPerW() * iface, c.hotInterfaceKPerW() * iface,
                c.relativeHumidity());
        DriveLimits worstLimits = new DriveLimits(limits.ratedImaxA(), limits.supplyMaxV() * supply,
                limits.supplyMaxA() * supply, limits.maxHotSideK());
        CoolingCase coldLow = new CoolingCase(c.setPointK(), spec.coldAmbientK(), spec.lowLoadW(),
                c.sinkResistanceKPerW(), c.coldInterfaceKPerW(), c.hotInterfaceKPerW(), c.relativeHumidity());
        OperatingPoint cold = solver.solve(array, coldLow, limits);
        HeatingCheck.Result heat = null;
        if (spec.coldAmbientK() < c.setPointK() && cold instanceof Solved p && p.currentA() == 0) {
            heat = heating.check(array.equivalent(), c.setPointK(), spec.coldAmbientK(), -spec.lowLoadW(),
                    c.coldInterfaceKPerW(), c.hotPathKPerW(), limits.currentLimitA());
        }
        return List.of(
                new Corner(Kind.NOMINAL, c.ambientK(), c.heatLoadW(), 1, solver.solve(array, c, limits), null),
                new Corner(Kind.HOT_HIGH_LOAD_WORST_PARTS, c.ambientK(), spec.highLoadW(), r,
                        solver.solve(worst, hotHighWorst, worstLimits), null),
                new Corner(Kind.HOT_HIGH_LOAD, c.ambientK(), spec.highLoadW(), 1, solver.solve(array, hotHigh, limits),
                        null),
                new Corner(Kind.COLD_LOW_LOAD, spec.coldAmbientK(), spec.lowLoadW(), 1, cold, heat));
    }
}
