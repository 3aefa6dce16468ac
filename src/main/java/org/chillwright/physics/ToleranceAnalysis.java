package org.chillwright.physics;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.BooleanSupplier;
import java.util.stream.IntStream;

import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.apache.commons.math3.stat.correlation.SpearmansCorrelation;
import org.apache.commons.math3.stat.descriptive.moment.Mean;
import org.apache.commons.math3.stat.descriptive.moment.StandardDeviation;
import org.apache.commons.math3.stat.descriptive.rank.Percentile;

/**
 * Monte Carlo tolerance analysis of one design (module or array, cooling case, drive limits): draws
 * the part-to-part spread of S, R and K of each module, the heat-sink and interface resistances, the
 * ambient (uniform between a typical value and the hottest, when a typical value is given) and the
 * supply limits, solves each draw with the lumped {@link OperatingPointSolver}, and reports the
 * probability of holding the set-point, percentiles, a sensitivity ranking and a histogram of the
 * margin. Statistics from Commons Math ({@link Percentile}, {@link StandardDeviation},
 * {@link SpearmansCorrelation}); random numbers from {@link Well19937c}.
 *
 * <p><b>Margin</b> is {@link Solved#marginK()} where the draw holds the set-point: how much colder than
 * the set-point the object could be held at the same load with the current within the limits. Where it
 * does not, the same quantity is negative: the set-point minus the lowest object temperature reachable
 * at the load with the current within the rated Imax and supply current (a Brent search over the
 * fixed-current solve of the fixed-current balance of OperatingPointSolver). Like {@code Solved.marginK}, it ignores the supply voltage.
 *
 * <p><b>Arrays.</b> Each module is drawn on its own. A series string adds S, R and K; parallel strings
 * combine as their Thevenin equivalent (R = 1/Σ(1/Rk), S = R·Σ(Sk/Rk), K = ΣKk): exact for the terminal
 * voltage, first order for the Peltier and Joule heat of mismatched strings.
 *
 * <p><b>Reproducible.</b> The samples are cut into chunks of {@link #CHUNK} and chunk c draws from its own
 * Well19937c seeded with (seed, c), so the result for a seed does not depend on how many threads ran
 * the chunks. Progress is reported and cancellation checked between chunks. Thread-safe.
 */
public final class ToleranceAnalysis {

    /** Samples per chunk: progress and cancellation granularity, and the unit of the deterministic split. */
    public static final int CHUNK = 4096;
    /** Most samples run in one analysis. */
    public static final int MAX_SAMPLES = 10_000_000;
    /** The sensitivity ranking uses the first this many samples (its rank correlations settle long before). */
    static final int SENSITIVITY_SAMPLES = 200_000;
    /** Bins of the margin histogram. */
    public static final int HISTOGRAM_BINS = 40;
    private static final double SEARCH_ACCURACY = 1e-9;
    private static final int SEARCH_EVALUATIONS = 200;
    private static final int INPUTS = ToleranceInput.values().length;

    private final OperatingPointSolver solver = new OperatingPointSolver();

    /** Listener of the progress of a long run; called from the worker threads after each chunk. */
    @FunctionalInterface
    public interface Progress {
        /** @param done samples solved so far; @param total samples asked for */
        void samplesDone(long done, long total);
    }

    /**
     * A design and how its inputs vary.
     *
     * @param array            modules and wiring (nominal)
     * @param coolingCase      nominal case; its ambient is the hottest
     * @param limits           drive limits (nominal supply)
     * @param spread           1σ spreads
     * @param typicalAmbientK  typical ambient, K, ≤ the case's ambient; NaN when the ambient does not vary
     * @param samples          samples to draw, 1 to {@link #MAX_SAMPLES}
     * @param seed             seed of the random draws
     */
    public record Request(ModuleArray array, CoolingCase coolingCase, DriveLimits limits, ToleranceSpread spread,
                          double typicalAmbientK, int samples, long seed) {

        public Request {
            if (array == null || coolingCase == null || limits == null || spread == null) {
                throw new InvalidQuantityException(array == null ? "module" : coolingCase == null ? "coolingCase"
                        : limits == null ? "limits" : "spread", Double.NaN, "every part of the design must be given");
            }
            if (!Double.isNaN(typicalAmbientK)) {
                Check.positive("typicalAmbientK", typicalAmbientK);
                if (typicalAmbientK > coolingCase.ambientK()) {
                    throw new InvalidQuantityException("typicalAmbientK", typicalAmbientK,
                            "typicalAmbientK must be <= the hottest ambient (" + coolingCase.ambientK() + " K), was "
                                    + typicalAmbientK);
                }
            }
            Check.atLeastOne("samples", samples);
            if (samples > MAX_SAMPLES) {
                throw new InvalidQuantityException("samples", samples,
                        "samples must be <= " + MAX_SAMPLES + ", was " + samples);
            }
        }
    }

    /** Runs the analysis on the calling thread, without progress or cancellation. */
    public ToleranceResult run(Request request) {
        return run(request, (done, total) -> { }, () -> false, false);
    }

    /**
     * Runs the analysis.
     *
     * @param progress  told after each chunk
     * @param cancelled asked before each chunk; once true the run stops and reports the chunks done
     * @param parallel  whether to spread the chunks over the common fork-join pool (same result)
     */
    public ToleranceResult run(Request request, Progress progress, BooleanSupplier cancelled, boolean parallel) {
        int n = request.samples();
        int chunks = (n + CHUNK - 1) / CHUNK;
        double[] margin = new double[n];
        double[] current = new double[n];
        double[] hot = new double[n];
        boolean[] holds = new boolean[n];
        boolean[] done = new boolean[chunks];
        int kept = Math.min(n, SENSITIVITY_SAMPLES);
        double[][] inputs = new double[INPUTS][kept];
        AtomicLong solved = new AtomicLong();
        IntStream chunkIndices = IntStream.range(0, chunks);
        (parallel ? chunkIndices.parallel() : chunkIndices).forEach(c -> {
            if (cancelled.getAsBoolean()) {
                return;
            }
            int from = c * CHUNK;
            int to = Math.min(n, from + CHUNK);
            runChunk(request, c, from, to, margin, current, hot, holds, inputs);
            done[c] = true;
            progress.samplesDone(solved.addAndGet(to - from), n);
        });
        return summarise(request, margin, current, hot, holds, inputs, done);
    }

    private void runChunk(Request r, int chunk, int from, int to, double[] margin, double[] current, double[] hot,
                          boolean[] holds, double[][] inputs) {
        long seed = r.seed();
        RandomGenerator random = new Well19937c(new int[] {(int) seed, (int) (seed >>> 32), chunk});
        ToleranceSpread s = r.spread();
        ModuleArray nominal = r.array();
        CoolingCase c = r.coolingCase();
        DriveLimits limits = r.limits();
        int modules = nominal.moduleCount();
        double[] factors = new double[3 * modules];
        double[] draw = new double[INPUTS];
        for (int i = from; i < to; i++) {
            for (int m = 0; m < modules; m++) {
                factors[3 * m] = factor(random, s.seebeckFraction());
                factors[3 * m + 1] = factor(random, s.resistanceFraction());
                factors[3 * m + 2] = factor(random, s.conductanceFraction());
            }
            double sink = factor(random, s.sinkResistanceFraction());
            double cold = factor(random, s.interfaceFraction());
            double hotFactor = factor(random, s.interfaceFraction());
            double ambientK = Double.isNaN(r.typicalAmbientK()) ? c.ambientK()
                    : r.typicalAmbientK() + random.nextDouble() * (c.ambientK() - r.typicalAmbientK());
            double supply = factor(random, s.supplyFraction());
            ModuleArray array = s.partsVary() ? drawnArray(nominal, factors) : nominal;
            CoolingCase drawnCase = new CoolingCase(c.setPointK(), ambientK, c.heatLoadW(),
                    c.sinkResistanceKPerW() * sink, c.coldInterfaceKPerW() * cold, c.hotInterfaceKPerW() * hotFactor,
                    c.relativeHumidity());
            DriveLimits drawnLimits = supply == 1 ? limits : new DriveLimits(limits.ratedImaxA(),
                    limits.supplyMaxV() * supply, limits.supplyMaxA() * supply, limits.maxHotSideK());
            OperatingPoint point = solver.solve(array, drawnCase, drawnLimits);
            if (point instanceof Solved p) {
                holds[i] = true;
                margin[i] = p.marginK();
                current[i] = p.currentA();
                hot[i] = p.hotSideK();
            } else {
                margin[i] = infeasibleMarginK(array, drawnCase, drawnLimits);
                current[i] = Double.NaN;
                hot[i] = Double.NaN;
            }
            if (i < inputs[0].length) {
                draw[ToleranceInput.SEEBECK.ordinal()] = mean(factors, 0, modules);
                draw[ToleranceInput.RESISTANCE.ordinal()] = mean(factors, 1, modules);
                draw[ToleranceInput.CONDUCTANCE.ordinal()] = mean(factors, 2, modules);
                draw[ToleranceInput.SINK_RESISTANCE.ordinal()] = sink;
                draw[ToleranceInput.COLD_INTERFACE.ordinal()] = cold;
                draw[ToleranceInput.HOT_INTERFACE.ordinal()] = hotFactor;
                draw[ToleranceInput.AMBIENT.ordinal()] = ambientK;
                draw[ToleranceInput.SUPPLY.ordinal()] = supply;
                for (int k = 0; k < INPUTS; k++) {
                    inputs[k][i] = draw[k];
                }
            }
        }
    }

    /** 1 + σ·z for a standard normal z, redrawn in the (below 5σ) case that it is not positive; 1 when σ = 0. */
    private static double factor(RandomGenerator random, double fraction) {
        if (fraction == 0) {
            return 1;
        }
        double f;
        do {
            f = 1 + fraction * random.nextGaussian();
        } while (!(f > 0));
        return f;
    }

    private static double mean(double[] factors, int offset, int modules) {
        double sum = 0;
        for (int m = 0; m < modules; m++) {
            sum += factors[3 * m + offset];
        }
        return sum / modules;
    }

    /** The equivalent of an array of drawn modules (see the class comment), as a single module. */
    static ModuleArray drawnArray(ModuleArray nominal, double[] factors) {
        ModuleParameters m = nominal.module();
        int series = nominal.seriesCount();
        double conductance = 0;
        double sumConductanceOfStrings = 0;  // Σ 1/Rk
        double sumSeebeckOverR = 0;          // Σ Sk/Rk
        for (int string = 0; string < nominal.parallelCount(); string++) {
            double s = 0;
            double r = 0;
            for (int position = 0; position < series; position++) {
                int index = 3 * (string * series + position);
                s += m.seebeckVPerK() * factors[index];
                r += m.resistanceOhm() * factors[index + 1];
                conductance += m.conductanceWPerK() * factors[index + 2];
            }
            sumConductanceOfStrings += 1 / r;
            sumSeebeckOverR += s / r;
        }
        double resistance = 1 / sumConductanceOfStrings;
        return ModuleArray.single(new ModuleParameters(resistance * sumSeebeckOverR, resistance, conductance));
    }

    /**
     * Negative margin of a draw that cannot hold the set-point: set-point minus the lowest object
     * temperature at the load over currents within the rated Imax and the supply current, K.
     */
    double infeasibleMarginK(ModuleArray array, CoolingCase c, DriveLimits limits) {
        ModuleParameters e = array.equivalent();
        double rh = c.hotPathKPerW();
        double s = e.seebeckVPerK();
        double runawayA = rh > 0 ? (1 + Math.sqrt(1 + 4 * rh * e.conductanceWPerK())) / (2 * rh * s)
                : Double.POSITIVE_INFINITY;
        double highA = Math.min(limits.currentLimitA(), Math.min(0.999 * runawayA, 2 * s * c.ambientK()
                / e.resistanceOhm()));
        UnivariateObjectiveFunction setPointK = new UnivariateObjectiveFunction(i ->
                solver.atCurrent(array, c, DriveLimits.NONE, i) instanceof Solved p ? p.setPointK() : 1e9);
        try {
            double lowest = new BrentOptimizer(SEARCH_ACCURACY, 1e-12) // per-call state
                    .optimize(new MaxEval(SEARCH_EVALUATIONS), setPointK, GoalType.MINIMIZE,
                            new SearchInterval(0, highA, 0.5 * highA))
                    .getValue();
            return lowest < 1e9 ? c.setPointK() - lowest : Double.NaN;
        } catch (MathIllegalStateException e2) {
            return Double.NaN;
        }
    }

    private static ToleranceResult summarise(Request r, double[] margin, double[] current, double[] hot,
                                             boolean[] holds, double[][] inputs, boolean[] chunkDone) {
        int n = r.samples();
        int count = 0;
        int holding = 0;
        int overHot = 0;
        double[] margins = new double[n];
        int marginCount = 0;
        double[] currents = new double[n];
        double[] hots = new double[n];
        int feasible = 0;
        double maxHotK = r.limits().maxHotSideK();
        for (int i = 0; i < n; i++) {
            if (!chunkDone[i / CHUNK]) {
                continue;
            }
            count++;
            if (!Double.isNaN(margin[i])) {
                margins[marginCount++] = margin[i];
            }
            if (holds[i]) {
                holding++;
                currents[feasible] = current[i];
                hots[feasible] = hot[i];
                feasible++;
                if (hot[i] > maxHotK) {
                    overHot++;
                }
            }
        }
        boolean cancelled = count < n;
        margins = Arrays.copyOf(margins, marginCount);
        currents = Arrays.copyOf(currents, feasible);
        hots = Arrays.copyOf(hots, feasible);
        return new ToleranceResult(n, count, cancelled, count == 0 ? Double.NaN : (double) holding / count,
                count == 0 ? Double.NaN : (double) overHot / count, percentiles(margins), percentiles(currents),
                percentiles(hots), marginCount == 0 ? Double.NaN : new Mean().evaluate(margins),
                marginCount < 2 ? Double.NaN : new StandardDeviation().evaluate(margins),
                sensitivity(r, margin, inputs, chunkDone), histogram(margins));
    }

    private static ToleranceResult.Percentiles percentiles(double[] values) {
        if (values.length == 0) {
            return new ToleranceResult.Percentiles(Double.NaN, Double.NaN, Double.NaN);
        }
        Percentile percentile = new Percentile();
        percentile.setData(values);
        return new ToleranceResult.Percentiles(percentile.evaluate(5), percentile.evaluate(50),
                percentile.evaluate(95));
    }

    private static List<ToleranceResult.Sensitivity> sensitivity(Request r, double[] margin, double[][] inputs,
                                                                  boolean[] chunkDone) {
        ToleranceSpread s = r.spread();
        boolean[] varies = new boolean[INPUTS];
        varies[ToleranceInput.SEEBECK.ordinal()] = s.seebeckFraction() > 0;
        varies[ToleranceInput.RESISTANCE.ordinal()] = s.resistanceFraction() > 0;
        varies[ToleranceInput.CONDUCTANCE.ordinal()] = s.conductanceFraction() > 0;
        varies[ToleranceInput.SINK_RESISTANCE.ordinal()] = s.sinkResistanceFraction() > 0
                && r.coolingCase().sinkResistanceKPerW() > 0;
        varies[ToleranceInput.COLD_INTERFACE.ordinal()] = s.interfaceFraction() > 0
                && r.coolingCase().coldInterfaceKPerW() > 0;
        varies[ToleranceInput.HOT_INTERFACE.ordinal()] = s.interfaceFraction() > 0
                && r.coolingCase().hotInterfaceKPerW() > 0;
        varies[ToleranceInput.AMBIENT.ordinal()] = !Double.isNaN(r.typicalAmbientK())
                && r.typicalAmbientK() < r.coolingCase().ambientK();
        varies[ToleranceInput.SUPPLY.ordinal()] = s.supplyFraction() > 0;
        int kept = inputs[0].length;
        int[] use = IntStream.range(0, kept).filter(i -> chunkDone[i / CHUNK] && !Double.isNaN(margin[i])).toArray();
        List<ToleranceResult.Sensitivity> ranking = new ArrayList<>();
        if (use.length < 3) {
            return ranking;
        }
        double[] y = new double[use.length];
        for (int j = 0; j < use.length; j++) {
            y[j] = margin[use[j]];
        }
        boolean marginVaries = Arrays.stream(y).anyMatch(v -> v != y[0]);
        for (ToleranceInput input : ToleranceInput.values()) {
            if (!varies[input.ordinal()] || !marginVaries) {
                continue;
            }
            double[] x = new double[use.length];
            for (int j = 0; j < use.length; j++) {
                x[j] = inputs[input.ordinal()][use[j]];
            }
            ranking.add(new ToleranceResult.Sensitivity(input, new SpearmansCorrelation().correlation(x, y)));
        }
        ranking.sort(Comparator.comparingDouble((ToleranceResult.Sensitivity v) -> -Math.abs(v.rankCorrelation())));
        return ranking;
    }

    private static ToleranceResult.Histogram histogram(double[] margins) {
        long[] counts = new long[HISTOGRAM_BINS];
        if (margins.length == 0) {
            return new ToleranceResult.Histogram(Double.NaN, Double.NaN, counts);
        }
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double m : margins) {
            lo = Math.min(lo, m);
            hi = Math.max(hi, m);
        }
        double width = hi > lo ? (hi - lo) / HISTOGRAM_BINS : 1e-6;
        double start = hi > lo ? lo : lo - 0.5 * width * HISTOGRAM_BINS;
        for (double m : margins) {
            int bin = (int) ((m - start) / width);
            counts[Math.max(0, Math.min(HISTOGRAM_BINS - 1, bin))]++;
        }
        return new ToleranceResult.Histogram(start, width, counts);
    }
}
