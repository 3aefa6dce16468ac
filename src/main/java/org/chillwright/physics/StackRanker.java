package org.chillwright.physics;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;
import java.util.stream.IntStream;

/**
 * The best two-stage stacks of a catalog for one case: every module in every series × parallel split up to
 * the stage size as cold stage, on every module and split with at least as many modules as hot stage (common
 * practice, no source: the hot stage also pumps the cold stage's electrical power), each on one shared
 * current ({@link TwoStageStack}), ranked by COP. Since every stack pumps the same load, that is the order of
 * lowest power, which is what the search compares.
 *
 * <p>A catalog squared is too many stacks to solve (a 1,000-module catalog with four modules a stage has
 * 41 million), so pairs are ruled out by lower bounds on their power that every feasible stack satisfies, each
 * from the ideal equations of the Ioffe 1957 / Goldsmid 2016 ideal equations; the heat-sink network derived here and the monotonicity of their lower-root closed form (case
 * S09). {@code StackRankerTest} checks against a brute-force pair search that no feasible stack is lost.
 * <ol>
 * <li><b>Highest interstage of a cold stage.</b> At an interstage Ti the cold stage pumps at most
 * S1·I·Tc − ½I²R1 − K1(Ti − Tc), largest at I = min(S1·Tc/R1, its current limit); so it holds the load only
 * below Ti,max = Tc + (that Peltier-minus-Joule maximum − load)/K1. Every feasible interstage lies in
 * [Tc, the highest Ti,max], which a grid of cells divides.</li>
 * <li><b>Lowest interstage of a hot stage.</b> The hot stage pumps more than the load (the cold stage's
 * rejected heat) into a hot face above Tamb + Rh·load (the sink carries at least the load): the ideal partner
 * that holds the interstage no colder than its own abilities allow. Where its lower-root current for that is
 * beyond its limit, or has no root, it cannot be the hot stage.</li>
 * <li><b>The hot stage must carry the cold stage's rejected heat, on one current.</b> On each cell the
 * cold stage's least power and the hot stage's least power for the load plus that power bound the stack's
 * power; both stages carry at least their own lower-root current, so the shared current does too, and it
 * must be within both stages' limits and the supply's voltage (see {@code Search#cellBoundW}).</li>
 * <li><b>Branch and bound.</b> A cold stage whose bound with the best hot stage of each cell is infinite cannot
 * reach the needed ΔT with any partner and is dropped. The rest are put in buckets of similar stages; a
 * bucket pair's bound, taken with the least entries of its members, is below every member pair's. Bucket
 * pairs are searched in order of their bound, a member pair only when its own bound is not above the worst of
 * the best stacks found so far, and the search ends at the first bucket pair whose bound is.</li>
 * </ol>
 * Pairs that pass are solved with the allocation-free kernel of {@link StackKernel}; the best are then solved
 * in full ({@link TwoStageStack#solve}) for their margin and warnings. The work is shared between the cores.
 */
public final class StackRanker {

    /** Relative slack on every bound, so that round-off in the closed forms never rules out a feasible stack. */
    static final double BOUND_SLACK_RELATIVE = 1e-9;
    /** Temperature slack of the highest-interstage bound, K, for the same reason. */
    static final double BOUND_SLACK_K = 1e-6;
    /** Grid cells over the interstage range; 16 keep the bounds within a few percent at a few ns a cell. */
    static final int CELLS = 16;
    /** Stage candidates per bucket: a bucket pair's bound is checked before its 16 × 16 member pairs. */
    static final int BUCKET = 16;

    /**
     * The best stacks of {@code catalog} for the search's case.
     *
     * @param catalog modules to stack (any order; a module may be used in both stages)
     * @param search  case, limits, stage size and how many stacks to return
     */
    public StackRanking rank(List<CandidateModule> catalog, StackSearch search) {
        long startNanos = System.nanoTime();
        if (catalog == null || search == null) {
            String field = catalog == null ? "catalog" : "search";
            throw new InvalidQuantityException(field, Double.NaN, field + " must be given, was null");
        }
        int[][] splits = ModuleArray.splits(search.maxModulesPerStage());
        Stages stages = new Stages(catalog, splits, search.limits().currentLimitA());
        long possible = possiblePairs(catalog.size(), splits);
        CoolingCase c = search.coolingCase();
        if (!(c.coldSideAtLoadK() > 0) || catalog.isEmpty()) {
            return new StackRanking(List.of(), possible, stages.size(), possible, 0, 0, System.nanoTime() - startNanos);
        }
        Search run = new Search(stages, c, search.limits(), search.limit(), search.maxModulesPerStage());
        Best best = run.run();
        List<StackSolved> solved = new ArrayList<>(best.size());
        for (long pair : best.sorted()) {
            int cold = (int) (pair >>> 32);
            int hot = (int) pair;
            StackPoint point = new TwoStageStack(stages.design(cold), stages.design(hot)).solve(c, search.limits());
            if (point instanceof StackSolved s) {
                solved.add(s); // a pair the first pass found feasible, unless it sits on a limit within round-off
            }
        }
        long evaluated = run.evaluated.get();
        return new StackRanking(solved, possible, run.coldDropped, possible - evaluated, evaluated, run.feasible.get(),
                System.nanoTime() - startNanos);
    }

    /** Pairs of (module, split) with the hot split's module count at least the cold one's. */
    static long possiblePairs(int modules, int[][] splits) {
        long pairs = 0;
        for (int[] cold : splits) {
            for (int[] hot : splits) {
                if (hot[0] * hot[1] >= cold[0] * cold[1]) {
                    pairs++;
                }
            }
        }
        return pairs * modules * modules;
    }

    /**
     * Lower-root current that pumps {@code loadW} between fixed junction temperatures, A: the closed form of
     * the heat-sink network derived here (case S09), 2(Q + K·ΔT)/(S·Tc + √(S²Tc² − 2R(Q + K·ΔT))); 0 when conduction carries the load;
     * NaN when no current does. It grows with the load and the hot side and falls as the cold side warms.
     */
    static double lowerRootA(double s, double r, double k, double coldK, double hotK, double loadW) {
        double needW = loadW + k * (hotK - coldK);
        double peltier = s * coldK;
        double discriminant = peltier * peltier - 2 * r * needW;
        if (discriminant < 0) {
            return Double.NaN;
        }
        return needW <= 0 ? 0.0 : 2 * needW / (peltier + Math.sqrt(discriminant));
    }

    /**
     * Bound 1: highest interstage at which the cold stage still pumps the load, K:
     * Tc + (S·Im·Tc − ½Im²R − load)/K with Im = min(S·Tc/R, current limit).
     */
    static double highestInterstageK(double s, double r, double k, double limitA, double tc, double loadW) {
        double im = Math.min(s * tc / r, limitA);
        return tc + (s * im * tc - 0.5 * im * im * r - loadW) / k;
    }

    /** Every stage candidate (module × split) as parallel arrays of its equivalent parameters. */
    static final class Stages {
        final List<CandidateModule> modules;
        final int[][] splits;
        final double[] s;
        final double[] r;
        final double[] k;
        /** Current limit of the stage alone: its rated Imax × parallel strings and the stack's limit, A. */
        final double[] limitA;
        final int[] count;

        Stages(List<CandidateModule> modules, int[][] splits, double stackLimitA) {
            this.modules = modules;
            this.splits = splits;
            int n = modules.size() * splits.length;
            s = new double[n];
            r = new double[n];
            k = new double[n];
            limitA = new double[n];
            count = new int[n];
            for (int m = 0; m < modules.size(); m++) {
                CandidateModule module = modules.get(m);
                if (module == null) {
                    throw new InvalidQuantityException("catalog", Double.NaN, "catalog entry " + m + " is null");
                }
                ModuleParameters p = module.parameters();
                for (int j = 0; j < splits.length; j++) {
                    int i = m * splits.length + j;
                    int series = splits[j][0];
                    int parallel = splits[j][1];
                    s[i] = p.seebeckVPerK() * series;
                    r[i] = p.resistanceOhm() * series / parallel;
                    k[i] = p.conductanceWPerK() * series * parallel;
                    double ratedA = Double.isNaN(module.ratedImaxA()) ? Double.POSITIVE_INFINITY
                            : module.ratedImaxA() * parallel;
                    limitA[i] = Math.min(ratedA, stackLimitA);
                    count[i] = series * parallel;
                }
            }
        }

        int size() {
            return s.length;
        }

        int split(int i) {
            return i % splits.length;
        }

        StageDesign design(int i) {
            int[] split = splits[split(i)];
            return new StageDesign(modules.get(i / splits.length), split[0], split[1]);
        }
    }

    /**
     * One search: the bound tables of every stage candidate, the buckets, and the state the workers share.
     *
     * <p>Tables on a grid t0 = Tc &lt; t1 &lt; … &lt; tG = the highest Ti,max of any cold stage (bound 1), which
     * holds every feasible interstage. For a cold stage c, P1[c][j] and I1[c][j] are its power and current at
     * the lower root for the load between Tc and tj (bound 3; +∞ past its Ti,max or its current limit). For a
     * hot stage h, P2[h][j], I2[h][j] and D2[h][j] are the power and current of its lower root for the load
     * from tj into Tamb + Rh·load (bound 2), and the slope dP2/dload there. See {@link #cellBoundW} for how a
     * cell [tj, tj+1] bounds a stack whose interstage lies in it.
     */
    private static final class Search {
        final Stages st;
        final double tc;
        final double tamb;
        final double rh;
        final double loadW;
        final double supplyV;
        final int limit;
        final int points = CELLS + 1;
        final double[] coldPowerW;
        final double[] coldCurrentA;
        final double[] hotPowerW;
        final double[] hotCurrentA;
        final double[] hotSlope;
        /** tj − Tc and max(0, Tamb + Rh·load − tj), K: the least ΔT of the cold and hot stage at grid point j. */
        final double[] coldRise;
        final double[] hotRise;
        /** Last cell in which a cold stage can work, and first cell in which a hot stage can (−1 / CELLS+1: none). */
        final int[] coldLastCell;
        final int[] hotFirstCell;
        final int[][] coldBuckets;
        final int[][] hotBuckets;
        final Envelope[] coldEnvelopes;
        final Envelope[] hotEnvelopes;
        /** Bucket pairs (cold bucket above, hot bucket below) in order of their bound, and the bounds. */
        final long[] bucketPairs;
        final double[] bucketBoundW;
        final long coldDropped;
        /** Power of the worst of the best stacks found by any worker, as raw long bits (only decreases). */
        final AtomicLong thresholdBits = new AtomicLong(Double.doubleToRawLongBits(Double.POSITIVE_INFINITY));
        final AtomicLong evaluated = new AtomicLong();
        final AtomicLong feasible = new AtomicLong();

        Search(Stages st, CoolingCase c, DriveLimits limits, int limit, int maxModules) {
            this.st = st;
            this.limit = limit;
            tc = c.coldSideAtLoadK();
            tamb = c.ambientK();
            rh = c.hotPathKPerW();
            loadW = c.heatLoadW();
            supplyV = Double.isNaN(limits.supplyMaxV()) ? Double.POSITIVE_INFINITY : limits.supplyMaxV();
            int n = st.size();
            // bound 1: the highest interstage of every cold stage, and the grid up to the highest of them
            double[] tiMax = new double[n];
            double top = tc;
            for (int i = 0; i < n; i++) {
                tiMax[i] = highestInterstageK(st.s[i], st.r[i], st.k[i], st.limitA[i], tc, loadW);
                top = Math.max(top, tiMax[i]);
            }
            double hotSideK = tamb + rh * loadW; // bound 2: the sink carries at least the load
            coldRise = new double[points];
            hotRise = new double[points];
            double[] grid = new double[points];
            for (int j = 0; j < points; j++) {
                grid[j] = tc + (top - tc) * j / CELLS;
                coldRise[j] = grid[j] - tc;
                hotRise[j] = Math.max(0.0, hotSideK - grid[j]);
            }
            coldPowerW = new double[n * points];
            coldCurrentA = new double[n * points];
            hotPowerW = new double[n * points];
            hotCurrentA = new double[n * points];
            hotSlope = new double[n * points];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < points; j++) {
                    coldTable(i, j, grid[j], tiMax[i]);
                    hotTable(i, j, grid[j], hotSideK);
                }
            }
            coldLastCell = new int[n];
            hotFirstCell = new int[n];
            for (int i = 0; i < n; i++) {
                int last = -1;
                for (int j = 0; j < points && coldPowerW[i * points + j] < Double.POSITIVE_INFINITY; j++) {
                    last = j; // P1 is finite up to its Ti,max and current limit, then infinite
                }
                coldLastCell[i] = last;
                int first = points;
                for (int j = points - 1; j >= 1 && hotPowerW[i * points + j] < Double.POSITIVE_INFINITY; j--) {
                    first = j - 1; // P2 is finite from its Ti,low on; cell j uses P2 at its far end j + 1
                }
                hotFirstCell[i] = first;
            }
            // bounds 1 to 3 with the best partner of each module count: drop what no partner could help
            Envelope[] hotAtLeast = new Envelope[maxModules + 2];
            Envelope[] coldAtMost = new Envelope[maxModules + 2];
            for (int m = 0; m < maxModules + 2; m++) {
                hotAtLeast[m] = new Envelope(points);
                coldAtMost[m] = new Envelope(points);
            }
            for (int i = 0; i < n; i++) {
                hotAtLeast[st.count[i]].add(this, i, true);
                coldAtMost[st.count[i]].add(this, i, false);
            }
            for (int m = maxModules - 1; m >= 1; m--) {
                hotAtLeast[m].include(hotAtLeast[m + 1]);
            }
            for (int m = 2; m <= maxModules; m++) {
                coldAtMost[m].include(coldAtMost[m - 1]);
            }
            boolean[] coldKept = new boolean[n];
            boolean[] hotKept = new boolean[n];
            long dropped = 0;
            for (int i = 0; i < n; i++) {
                Envelope one = Envelope.of(this, i);
                coldKept[i] = envelopeBoundW(one, hotAtLeast[st.count[i]]) < Double.POSITIVE_INFINITY;
                hotKept[i] = envelopeBoundW(coldAtMost[st.count[i]], one) < Double.POSITIVE_INFINITY;
                if (!coldKept[i]) {
                    dropped++;
                }
            }
            coldDropped = dropped;
            // bound 4: buckets of similar stages and the bound of every bucket pair, best first
            coldBuckets = buckets(coldKept);
            hotBuckets = buckets(hotKept);
            coldEnvelopes = envelopes(coldBuckets);
            hotEnvelopes = envelopes(hotBuckets);
            long[] pairs = new long[coldBuckets.length * hotBuckets.length];
            double[] bounds = new double[pairs.length];
            int kept = 0;
            for (int a = 0; a < coldBuckets.length; a++) {
                for (int b = 0; b < hotBuckets.length; b++) {
                    if (st.count[hotBuckets[b][0]] < st.count[coldBuckets[a][0]]) {
                        continue; // n ≥ m (a bucket holds one split)
                    }
                    double bound = envelopeBoundW(coldEnvelopes[a], hotEnvelopes[b]);
                    if (bound < Double.POSITIVE_INFINITY) {
                        pairs[kept] = ((long) a << 32) | b;
                        bounds[kept++] = bound;
                    }
                }
            }
            int[] order = orderOf(kept, bounds);
            bucketPairs = new long[kept];
            bucketBoundW = new double[kept];
            for (int j = 0; j < kept; j++) {
                bucketPairs[j] = pairs[order[j]];
                bucketBoundW[j] = floatAtOrBelow(bounds[order[j]]); // the sort key: never above the bound, never falls
            }
        }

        /** P1 and I1 of cold stage i at grid point tj (+∞ past its Ti,max or when its limit is passed). */
        private void coldTable(int i, int j, double t, double tiMax) {
            int at = i * points + j;
            double currentA = t > tiMax + BOUND_SLACK_K ? Double.NaN
                    : lowerRootA(st.s[i], st.r[i], st.k[i], tc, t, loadW);
            if (Double.isNaN(currentA) || currentA * (1 - BOUND_SLACK_RELATIVE) > st.limitA[i]) {
                coldPowerW[at] = Double.POSITIVE_INFINITY;
                coldCurrentA[at] = Double.POSITIVE_INFINITY;
                return;
            }
            coldPowerW[at] = currentA * (st.s[i] * (t - tc) + currentA * st.r[i]) * (1 - BOUND_SLACK_RELATIVE);
            coldCurrentA[at] = currentA * (1 - BOUND_SLACK_RELATIVE);
        }

        /** P2, I2 and dP2/dload of hot stage i pumping the load from grid point tj into {@code hotSideK}. */
        private void hotTable(int i, int j, double t, double hotSideK) {
            int at = i * points + j;
            double s = st.s[i];
            double r = st.r[i];
            double k = st.k[i];
            double currentA = lowerRootA(s, r, k, t, hotSideK, loadW);
            if (Double.isNaN(currentA) || currentA * (1 - BOUND_SLACK_RELATIVE) > st.limitA[i]) {
                hotPowerW[at] = Double.POSITIVE_INFINITY;
                hotCurrentA[at] = Double.POSITIVE_INFINITY;
                hotSlope[at] = Double.POSITIVE_INFINITY;
                return;
            }
            hotCurrentA[at] = currentA * (1 - BOUND_SLACK_RELATIVE);
            double dtK = hotSideK - t;
            if (!(dtK > 0)) {
                hotPowerW[at] = 0.0; // no power bound from a hot stage that need not pump uphill
                hotSlope[at] = 0.0;
                return;
            }
            double root = Math.sqrt(Math.max(0.0, s * s * t * t - 2 * r * (loadW + k * dtK)));
            hotPowerW[at] = currentA * (s * dtK + currentA * r) * (1 - BOUND_SLACK_RELATIVE);
            // dP/dload = (S·ΔT + 2I·R)·dI/dload, dI/dload = 1/√(S²Tc² − 2R(load + K·ΔT)); 0 at a double root is safe
            hotSlope[at] = root > 0 ? (s * dtK + 2 * currentA * r) / root * (1 - BOUND_SLACK_RELATIVE) : 0.0;
        }

        /**
         * Buckets of the kept candidates: per split, sorted by S and cut into slabs, each slab sorted by R and
         * cut into buckets of at most {@link #BUCKET}, so that a bucket's members have similar tables.
         */
        private int[][] buckets(boolean[] kept) {
            int splits = st.splits.length;
            List<int[]> buckets = new ArrayList<>();
            for (int split = 0; split < splits; split++) {
                int size = 0;
                int[] members = new int[st.size() / splits];
                for (int i = split; i < st.size(); i += splits) {
                    if (kept[i]) {
                        members[size++] = i;
                    }
                }
                if (size == 0) {
                    continue;
                }
                int[] bySeebeck = orderOf(Arrays.copyOf(members, size), st.s);
                int slabs = (int) Math.ceil(Math.sqrt((double) size / BUCKET));
                int slabSize = (size + slabs - 1) / slabs;
                for (int from = 0; from < size; from += slabSize) {
                    int[] byResistance = orderOf(Arrays.copyOfRange(bySeebeck, from, Math.min(size, from + slabSize)),
                            st.r);
                    for (int at = 0; at < byResistance.length; at += BUCKET) {
                        buckets.add(Arrays.copyOfRange(byResistance, at, Math.min(byResistance.length, at + BUCKET)));
                    }
                }
            }
            return buckets.toArray(int[][]::new);
        }

        private Envelope[] envelopes(int[][] buckets) {
            Envelope[] envelopes = new Envelope[buckets.length];
            for (int b = 0; b < buckets.length; b++) {
                envelopes[b] = new Envelope(points);
                for (int i : buckets[b]) {
                    envelopes[b].add(this, i, true);
                    envelopes[b].addCold(this, i);
                }
            }
            return envelopes;
        }

        /**
         * Least power of a stack whose interstage lies in cell j, [tj, tj+1], W; +∞ when either stage cannot
         * work there. The larger of two bounds:
         * <ul>
         * <li>each stage on its own best current: P1[c][j] + P2[h][j+1] + P1[c][j]·D2[h][j+1]. On the cell
         * P1 ≥ P1[c][j] (it grows with Ti), and the hot stage pumps at least load + P1[c][j] from no warmer than
         * tj+1, so P2 ≥ P2[h][j+1] + P1[c][j]·D2[h][j+1]: P2 grows as its cold side cools, and is convex in the
         * load (the lower-root current is the inverse of the concave S·Tc·I − ½RI², and the power is convex
         * and increasing in that current), so its tangent lies below it;</li>
         * <li>both on the one current, which is at least I* = max(I1[c][j], I2[h][j+1]): each stage carries at
         * least its lower-root current, which grows towards the cell's far end. The power
         * I·V = I·(S1·ΔT1 + S2·ΔT2 + I(R1 + R2)) grows with I and each ΔT, and ΔT1 ≥ tj − Tc,
         * ΔT2 ≥ Tamb + Rh·load − tj+1. When even that least voltage is above the supply's, the cell is out.</li>
         * </ul>
         * Written out so that an infinite table entry never meets a zero slope as ∞·0.
         */
        private double cellBoundW(int j, double coldW, double coldA, double coldS, double coldR, double hotW,
                                  double hotSlope, double hotA, double hotS, double hotR) {
            if (coldW == Double.POSITIVE_INFINITY || hotW == Double.POSITIVE_INFINITY) {
                return Double.POSITIVE_INFINITY;
            }
            double separateW = coldW + hotW + coldW * hotSlope;
            double sharedA = Math.max(coldA, hotA);
            double leastV = coldS * coldRise[j] + hotS * hotRise[j + 1] + sharedA * (coldR + hotR);
            if (leastV > supplyV * (1 + BOUND_SLACK_RELATIVE)) {
                return Double.POSITIVE_INFINITY;
            }
            return Math.max(separateW, sharedA * leastV);
        }

        /**
         * Least power of any stack with a cold stage from {@code cold} and a hot stage from {@code hot}, W: the
         * least cell bound over the grid with the envelopes' entries (each cell bound grows with every entry),
         * where the least current of either side must be within the other side's largest limit.
         */
        double envelopeBoundW(Envelope cold, Envelope hot) {
            double bound = Double.POSITIVE_INFINITY;
            for (int j = 0; j < CELLS; j++) {
                if (cold.currentColdA[j] <= hot.maxLimitA && hot.currentA[j + 1] <= cold.maxLimitA) {
                    bound = Math.min(bound, cellBoundW(j, cold.coldPowerW[j], cold.currentColdA[j], cold.seebeckVPerK,
                            cold.resistanceOhm, hot.powerW[j + 1], hot.slope[j + 1], hot.currentA[j + 1],
                            hot.seebeckVPerK, hot.resistanceOhm));
                }
            }
            return bound;
        }

        /**
         * Whether a stack of cold stage c on hot stage h may need no more than {@code thresholdW}: whether any
         * cell's bound is at or below it. Only the cells both stages can work in are tried (the cold stage's
         * run up to its last finite P1, the hot stage's from its first finite P2), and the cheaper separate
         * bound first.
         */
        boolean mayBeat(int c, int h, double thresholdW) {
            double coldLimitA = st.limitA[c];
            double hotLimitA = st.limitA[h];
            int cold = c * points;
            int hot = h * points + 1;
            int last = Math.min(coldLastCell[c], CELLS - 1);
            for (int j = hotFirstCell[h]; j <= last; j++) {
                double coldW = coldPowerW[cold + j];
                double hotW = hotPowerW[hot + j];
                if (coldW + hotW + coldW * hotSlope[hot + j] > thresholdW
                        || coldCurrentA[cold + j] > hotLimitA || hotCurrentA[hot + j] > coldLimitA) {
                    continue;
                }
                if (cellBoundW(j, coldW, coldCurrentA[cold + j], st.s[c], st.r[c], hotW, hotSlope[hot + j],
                        hotCurrentA[hot + j], st.s[h], st.r[h]) <= thresholdW) {
                    return true;
                }
            }
            return false;
        }

        double threshold() {
            return Double.longBitsToDouble(thresholdBits.get());
        }

        void lowerThreshold(double powerW) {
            long bits = Double.doubleToRawLongBits(powerW);
            thresholdBits.accumulateAndGet(bits, (a, b) -> Double.longBitsToDouble(b) < Double.longBitsToDouble(a)
                    ? b : a);
        }

        /**
         * Bucket pairs in order of their bound until the bound passes the worst of the best stacks, handed out
         * in that order to one worker per core, so that every core works on the most promising pairs first.
         */
        Best run() {
            AtomicInteger next = new AtomicInteger();
            int workers = Math.max(1, Runtime.getRuntime().availableProcessors());
            return IntStream.range(0, workers).parallel()
                    .mapToObj(worker -> {
                        Best best = new Best(limit);
                        for (int at = next.getAndIncrement(); at < bucketPairs.length; at = next.getAndIncrement()) {
                            if (bucketBoundW[at] > threshold()) {
                                break; // bucket pairs come in order of their bound
                            }
                            searchBuckets(at, at + 1, best);
                        }
                        return best;
                    })
                    .reduce(Best::merge).orElseGet(() -> new Best(limit));
        }

        private Best searchBuckets(int from, int to, Best best) {
            long solved = 0;
            long works = 0;
            for (int at = from; at < to; at++) {
                if (bucketBoundW[at] > threshold()) {
                    break; // bucket pairs come in order of their bound
                }
                int[] colds = coldBuckets[(int) (bucketPairs[at] >>> 32)];
                int[] hots = hotBuckets[(int) bucketPairs[at]];
                for (int c : colds) {
                    for (int h : hots) {
                        if (!mayBeat(c, h, threshold())) {
                            continue;
                        }
                        solved++;
                        double powerW = solve(c, h);
                        if (!Double.isNaN(powerW)) {
                            works++;
                            if (best.offer(powerW, c, h)) {
                                lowerThreshold(best.worstPowerW());
                            }
                        }
                    }
                }
            }
            evaluated.addAndGet(solved);
            feasible.addAndGet(works);
            return best;
        }

        /**
         * Power of the stack on one shared current, W; NaN unless it holds the set-point within every limit.
         * The same checks as {@link TwoStageStack#solve}.
         */
        double solve(int c, int h) {
            double s1 = st.s[c];
            double r1 = st.r[c];
            double k1 = st.k[c];
            double s2 = st.s[h];
            double r2 = st.r[h];
            double k2 = st.k[h];
            double i = StackKernel.currentForLoadA(s1, r1, k1, s2, r2, k2, tc, tamb, rh, loadW);
            if (!(i <= st.limitA[c] && i <= st.limitA[h])) {
                return Double.NaN; // NaN (no current), or above a rated Imax or the stack's current limit
            }
            double[] junctions = StackKernel.junctionsK(s1, r1, k1, s2, r2, k2, tc, tamb, rh, i, i);
            double ti = junctions[0];
            double th = junctions[1];
            if (!(ti > tc && ti < th)) {
                return Double.NaN;
            }
            double voltageV = s1 * (ti - tc) + i * r1 + s2 * (th - ti) + i * r2;
            return voltageV > supplyV ? Double.NaN : i * voltageV;
        }
    }

    /**
     * Indices 0..count−1 in ascending order of a float key at or below each (non-negative) double key, so that
     * "the key here exceeds x" implies it for every later index too. One primitive sort of packed longs.
     */
    private static int[] orderOf(int count, double[] key) {
        long[] packed = new long[count];
        for (int i = 0; i < count; i++) {
            packed[i] = ((long) Float.floatToIntBits(floatAtOrBelow(key[i])) << 32) | i;
        }
        Arrays.sort(packed);
        int[] order = new int[count];
        for (int i = 0; i < count; i++) {
            order[i] = (int) packed[i];
        }
        return order;
    }

    /** The indices in ascending order of their (non-negative) keys, as {@link #orderOf(int, double[])}. */
    private static int[] orderOf(int[] indices, double[] key) {
        double[] keys = new double[indices.length];
        for (int i = 0; i < indices.length; i++) {
            keys[i] = key[indices[i]];
        }
        int[] order = orderOf(indices.length, keys);
        int[] sorted = new int[indices.length];
        for (int i = 0; i < indices.length; i++) {
            sorted[i] = indices[order[i]];
        }
        return sorted;
    }

    /** The largest float at or below a non-negative double (positive floats order as their int bits). */
    static float floatAtOrBelow(double value) {
        float f = (float) value;
        return f > value ? Math.nextDown(f) : f;
    }

    /**
     * The least table entries of a group of stage candidates per grid point, their least S and R and their
     * largest current limit: a member's bound is at least the bound computed with these, since every cell
     * bound grows with each entry and a current check only passes more easily.
     */
    private static final class Envelope {
        final double[] powerW;
        final double[] slope;
        final double[] currentA;
        final double[] coldPowerW;
        final double[] currentColdA;
        double seebeckVPerK = Double.POSITIVE_INFINITY;
        double resistanceOhm = Double.POSITIVE_INFINITY;
        double maxLimitA;

        Envelope(int points) {
            powerW = infinite(points);
            slope = infinite(points);
            currentA = infinite(points);
            coldPowerW = infinite(points);
            currentColdA = infinite(points);
        }

        private static double[] infinite(int points) {
            double[] values = new double[points];
            Arrays.fill(values, Double.POSITIVE_INFINITY);
            return values;
        }

        /** A group of one, in both roles. */
        static Envelope of(Search search, int i) {
            Envelope one = new Envelope(search.points);
            one.add(search, i, true);
            one.addCold(search, i);
            return one;
        }

        /** Adds stage i's hot-role entries ({@code hot}) or cold-role entries. */
        void add(Search search, int i, boolean hot) {
            if (!hot) {
                addCold(search, i);
                return;
            }
            int points = powerW.length;
            for (int j = 0; j < points; j++) {
                powerW[j] = Math.min(powerW[j], search.hotPowerW[i * points + j]);
                slope[j] = Math.min(slope[j], search.hotSlope[i * points + j]);
                currentA[j] = Math.min(currentA[j], search.hotCurrentA[i * points + j]);
            }
            addScalars(search, i);
        }

        void addCold(Search search, int i) {
            int points = powerW.length;
            for (int j = 0; j < points; j++) {
                coldPowerW[j] = Math.min(coldPowerW[j], search.coldPowerW[i * points + j]);
                currentColdA[j] = Math.min(currentColdA[j], search.coldCurrentA[i * points + j]);
            }
            addScalars(search, i);
        }

        private void addScalars(Search search, int i) {
            seebeckVPerK = Math.min(seebeckVPerK, search.st.s[i]);
            resistanceOhm = Math.min(resistanceOhm, search.st.r[i]);
            maxLimitA = Math.max(maxLimitA, search.st.limitA[i]);
        }

        void include(Envelope other) {
            for (int j = 0; j < powerW.length; j++) {
                powerW[j] = Math.min(powerW[j], other.powerW[j]);
                slope[j] = Math.min(slope[j], other.slope[j]);
                currentA[j] = Math.min(currentA[j], other.currentA[j]);
                coldPowerW[j] = Math.min(coldPowerW[j], other.coldPowerW[j]);
                currentColdA[j] = Math.min(currentColdA[j], other.currentColdA[j]);
            }
            seebeckVPerK = Math.min(seebeckVPerK, other.seebeckVPerK);
            resistanceOhm = Math.min(resistanceOhm, other.resistanceOhm);
            maxLimitA = Math.max(maxLimitA, other.maxLimitA);
        }
    }

    /** The {@code limit} lowest-power stacks seen: a max-heap on power, worst on top. */
    static final class Best {
        private final int limit;
        private final double[] powerW;
        private final long[] pair;
        private int size;

        Best(int limit) {
            this.limit = limit;
            this.powerW = new double[limit];
            this.pair = new long[limit];
        }

        int size() {
            return size;
        }

        /** Power of the worst kept stack once the list is full, W; +∞ before. */
        double worstPowerW() {
            return size < limit ? Double.POSITIVE_INFINITY : powerW[0];
        }

        /** Keeps the stack if it is among the best; true when the list is full afterwards. */
        boolean offer(double power, int cold, int hot) {
            long packed = ((long) cold << 32) | (hot & 0xffffffffL);
            if (size < limit) {
                powerW[size] = power;
                pair[size] = packed;
                siftUp(size++);
                return size == limit;
            }
            if (!worse(powerW[0], pair[0], power, packed)) {
                return true;
            }
            powerW[0] = power;
            pair[0] = packed;
            siftDown(0);
            return true;
        }

        Best merge(Best other) {
            for (int j = 0; j < other.size; j++) {
                offer(other.powerW[j], (int) (other.pair[j] >>> 32), (int) other.pair[j]);
            }
            return this;
        }

        /** Kept pairs, best (lowest power) first. */
        long[] sorted() {
            Integer[] idx = new Integer[size];
            for (int j = 0; j < size; j++) {
                idx[j] = j;
            }
            Arrays.sort(idx, (a, b) -> worse(powerW[a], pair[a], powerW[b], pair[b]) ? 1
                    : worse(powerW[b], pair[b], powerW[a], pair[a]) ? -1 : 0);
            long[] out = new long[size];
            for (int j = 0; j < size; j++) {
                out[j] = pair[idx[j]];
            }
            return out;
        }

        /** Whether stack a is worse than stack b: more power, or equal power and a later pair (determinism). */
        private static boolean worse(double powerA, long pairA, double powerB, long pairB) {
            return powerA > powerB || powerA == powerB && pairA > pairB;
        }

        private void siftUp(int j) {
            while (j > 0) {
                int parent = (j - 1) / 2;
                if (!worse(powerW[j], pair[j], powerW[parent], pair[parent])) {
                    return;
                }
                swap(j, parent);
                j = parent;
            }
        }

        private void siftDown(int j) {
            while (true) {
                int left = 2 * j + 1;
                int worst = j;
                if (left < size && worse(powerW[left], pair[left], powerW[worst], pair[worst])) {
                    worst = left;
                }
                if (left + 1 < size && worse(powerW[left + 1], pair[left + 1], powerW[worst], pair[worst])) {
                    worst = left + 1;
                }
                if (worst == j) {
                    return;
                }
                swap(j, worst);
                j = worst;
            }
        }

        private void swap(int a, int b) {
            double p = powerW[a];
            powerW[a] = powerW[b];
            powerW[b] = p;
            long q = pair[a];
            pair[a] = pair[b];
            pair[b] = q;
        }
    }
}
