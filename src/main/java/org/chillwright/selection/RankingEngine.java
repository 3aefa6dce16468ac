package org.chillwright.selection;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.IntStream;
import org.chillwright.physics.CoolingCase;
import org.chillwright.physics.DriveLimits;
import org.chillwright.physics.Infeasible;
import org.chillwright.physics.ModuleArray;
import org.chillwright.physics.ModuleParameters;
import org.chillwright.physics.OperatingPoint;
import org.chillwright.physics.OperatingPointSolver;
import org.chillwright.physics.SafetyLimits;
import org.chillwright.physics.Solved;

/**
 * Solves every module in every series × parallel split against one case and ranks the designs.
 *
 * <p>Rank first, detail later: a first pass runs the allocation-free lower-root solve
 * ({@link OperatingPointSolver#currentForLoadA}) for every design and checks the rated Imax, the
 * supply and the hot-face limit on its terminal values; only the designs that are shown (and, for the margin objective, every
 * feasible one) get the full solve with capacity peak, margin in K and warnings. The two passes use the
 * same equations, so a design feasible in the first is feasible in the second.
 */
public final class RankingEngine {

    private static final String ABOVE_IMAX_FRACTION = "ABOVE_IMAX_FRACTION";
    private static final String BELOW_MIN_MARGIN = "BELOW_MIN_MARGIN";
    private static final String AT_A_LIMIT = "AT_A_LIMIT";

    private final OperatingPointSolver solver = new OperatingPointSolver();

    /** Every (series, parallel) split with series × parallel ≤ maxModules, fewest modules first. */
    static int[][] configurations(int maxModules) {
        return ModuleArray.splits(maxModules);
    }

    public Ranking rank(CandidateTable table, RankingCase rankingCase) {
        long start = System.nanoTime();
        CoolingCase c = rankingCase.solverCase();
        int[][] configs = configurations(rankingCase.maxModules());
        int n = table.size();
        int designs = n * configs.length;
        double coldK = c.coldSideAtLoadK();
        double hotPathKPerW = c.hotPathKPerW();
        double ambientK = c.ambientK();
        double loadW = c.heatLoadW();
        double supplyV = rankingCase.supplyMaxV();
        double supplyA = rankingCase.supplyMaxA();

        // the hot face a design may reach: the module's stated maximum, or 250 °C when it states none
        double[] hotFaceLimitK = new double[n];
        for (int i = 0; i < n; i++) {
            double statedK = table.maxHotSideK()[i];
            hotFaceLimitK[i] = Double.isNaN(statedK) ? SafetyLimits.HOT_FACE_WITHOUT_STATED_LIMIT_K : statedK;
        }

        // pass 1: terminal current, power and fraction of Imax of every design; NaN current = infeasible
        double[] currentA = new double[designs];
        double[] powerW = new double[designs];
        double[] fraction = new double[designs];
        IntStream.range(0, n).parallel().forEach(i -> {
            for (int k = 0; k < configs.length; k++) {
                int series = configs[k][0];
                int parallel = configs[k][1];
                int d = i * configs.length + k;
                double s = table.seebeckVPerK()[i] * series;
                double r = table.resistanceOhm()[i] * series / parallel;
                double g = table.conductanceWPerK()[i] * series * parallel;
                double current = OperatingPointSolver.currentForLoadA(s, r, g, coldK, ambientK, hotPathKPerW, loadW);
                double imaxA = table.ratedImaxA()[i] * parallel;
                double hotK = OperatingPointSolver.hotSideK(s, r, g, coldK, ambientK, hotPathKPerW, current);
                double voltage = s * (hotK - coldK) + current * r;
                boolean withinLimits = !(current > imaxA) && !(current > supplyA) && !(voltage > supplyV)
                        && !(hotK > hotFaceLimitK[i]);
                currentA[d] = withinLimits ? current : Double.NaN;
                powerW[d] = current * voltage;
                fraction[d] = current / imaxA;
            }
        });

        // feasible designs within the Imax-fraction filter, keyed for sorting
        double maxFraction = rankingCase.maxFractionOfImax();
        int[] feasible = new int[designs];
        int feasibleCount = 0;
        boolean[] anyFeasible = new boolean[n];
        boolean[] onlyAboveFraction = new boolean[n];
        for (int d = 0; d < designs; d++) {
            if (Double.isNaN(currentA[d])) {
                continue;
            }
            int i = d / configs.length;
            if (fraction[d] > maxFraction) {
                onlyAboveFraction[i] = true;
                continue;
            }
            anyFeasible[i] = true;
            feasible[feasibleCount++] = d;
        }
        feasible = Arrays.copyOf(feasible, feasibleCount);

        double[] arrayCost = new double[designs];
        double[] unitPrice = new double[designs];
        Arrays.fill(arrayCost, Double.NaN);
        Arrays.fill(unitPrice, Double.NaN);
        for (int d : feasible) {
            int modules = configs[d % configs.length][0] * configs[d % configs.length][1];
            double price = table.prices().unitPrice(d / configs.length, modules * rankingCase.costQuantity());
            unitPrice[d] = price;
            arrayCost[d] = price * modules;
        }

        Solved[] detailed = new Solved[designs];
        double[] key = new double[designs];
        if (rankingCase.objective() == Objective.MARGIN) {
            for (int d : feasible) {
                detailed[d] = fullSolve(table, configs, d, rankingCase, c);
                key[d] = detailed[d] == null ? Double.POSITIVE_INFINITY : -detailed[d].marginK();
            }
        } else {
            for (int d : feasible) {
                key[d] = switch (rankingCase.objective()) {
                    case COP -> -copOf(loadW, powerW[d]);
                    case POWER -> powerW[d];
                    case COST -> Double.isNaN(arrayCost[d]) ? Double.POSITIVE_INFINITY : arrayCost[d];
                    case MARGIN -> throw new IllegalStateException("handled above");
                };
            }
        }
        // only the first `limit` designs need ordering: select them, sort those, and sort the rest only if
        // the margin filter drops enough of them that the walk runs past the sorted prefix
        long[] order = packed(feasible, key);
        int sorted = sortSmallest(order, key, Math.min(order.length, rankingCase.limit()));

        var picked = new ArrayList<int[]>(); // {design, row} of the shown designs, best first
        var shown = new boolean[n];
        var belowMargin = new boolean[n];
        var points = new ArrayList<Solved>();
        for (int j = 0; j < order.length && picked.size() < rankingCase.limit(); j++) {
            if (j == sorted) {
                sorted = sortSmallest(order, key, order.length);
            }
            int d = (int) order[j];
            Solved point = detailed[d] != null ? detailed[d] : fullSolve(table, configs, d, rankingCase, c);
            if (point == null) {
                continue;
            }
            int i = d / configs.length;
            if (point.marginK() < rankingCase.minMarginK()) {
                belowMargin[i] = true;
                continue;
            }
            shown[i] = true;
            picked.add(new int[] {d, i});
            points.add(point);
        }
        boolean[] pareto = paretoFrontOf(picked, feasible, arrayCost, loadW, powerW);
        var candidates = new ArrayList<Ranking.Candidate>(picked.size());
        for (int j = 0; j < picked.size(); j++) {
            int d = picked.get(j)[0];
            int i = picked.get(j)[1];
            Solved point = points.get(j);
            double requiredSink = rankingCase.sizesTheSink() ? rankingCase.sinkRiseK() / point.heatRejectedW()
                    : Double.NaN;
            candidates.add(new Ranking.Candidate(j + 1, table.moduleIds()[i], configs[d % configs.length][0],
                    configs[d % configs.length][1], point, unitPrice[d], arrayCost[d], pareto[j], requiredSink));
        }

        var rejections = new ArrayList<Ranking.Rejection>();
        int[] largest = configs[configs.length - 1];
        for (int i = 0; i < n; i++) {
            if (anyFeasible[i]) {
                if (!shown[i] && belowMargin[i]) {
                    rejections.add(rejection(table.moduleIds()[i], BELOW_MIN_MARGIN,
                            "every design shown with this module leaves less than the required "
                                    + rankingCase.minMarginK() + " K of margin", largest,
                            solve(table, i, largest, rankingCase, c)));
                }
                continue;
            }
            if (onlyAboveFraction[i]) {
                rejections.add(rejection(table.moduleIds()[i], ABOVE_IMAX_FRACTION, String.format(
                        "every design that works needs more than %.0f %% of the rated Imax", 100 * maxFraction),
                        largest, solve(table, i, largest, rankingCase, c)));
                continue;
            }
            rejections.add(reasonFor(table, configs, i, rankingCase, c));
        }
        return new Ranking(candidates, rejections, feasibleCount, designs, System.nanoTime() - start);
    }

    private static double copOf(double loadW, double powerW) {
        return powerW > 0 ? loadW / powerW : Double.POSITIVE_INFINITY;
    }

    /**
     * The full solve of a design the first pass found feasible, or null if the full solve disagrees. Both
     * use the same equations, so they can only disagree on a knife edge (a current within the solver's
     * tolerance of a limit); such a design is no recommendation, so it is dropped rather than shown.
     */
    private Solved fullSolve(CandidateTable table, int[][] configs, int d, RankingCase rankingCase, CoolingCase c) {
        int i = d / configs.length;
        OperatingPoint point = solve(table, i, configs[d % configs.length], rankingCase, c);
        return point instanceof Solved solved ? solved : null;
    }

    private OperatingPoint solve(CandidateTable table, int i, int[] config, RankingCase rankingCase, CoolingCase c) {
        var module = new ModuleParameters(table.seebeckVPerK()[i], table.resistanceOhm()[i],
                table.conductanceWPerK()[i]);
        var limits = new DriveLimits(table.ratedImaxA()[i] * config[1], rankingCase.supplyMaxV(),
                rankingCase.supplyMaxA(), table.maxHotSideK()[i]);
        return solver.solve(new ModuleArray(module, config[0], config[1]), c, limits);
    }

    /** The reason of the largest design tried: if even that cannot do it, the smaller ones cannot either. */
    private Ranking.Rejection reasonFor(CandidateTable table, int[][] configs, int i, RankingCase rankingCase,
                                        CoolingCase c) {
        int[] largest = configs[configs.length - 1];
        OperatingPoint point = solve(table, i, largest, rankingCase, c);
        if (point instanceof Infeasible infeasible) {
            String prefix = configs.length == 1 ? "" : "even " + largest[0] + " in series × " + largest[1]
                    + " in parallel: ";
            return rejection(table.moduleIds()[i], infeasible.reason().name(), prefix + infeasible.detail(), largest,
                    infeasible);
        }
        // the largest design works but needs more than a smaller one's limits allow (e.g. supply volts)
        for (int[] config : configs) {
            if (solve(table, i, config, rankingCase, c) instanceof Infeasible infeasible) {
                return rejection(table.moduleIds()[i], infeasible.reason().name(), infeasible.detail(), config,
                        infeasible);
            }
        }
        // every design sits within the solver's tolerance of a limit: the two passes disagree only there
        return rejection(table.moduleIds()[i], AT_A_LIMIT,
                "every design of this module runs right at its current or supply limit", largest, point);
    }

    /** A rejection carrying the capacity at the set-point of the design it names (solved or not). */
    private static Ranking.Rejection rejection(long moduleId, String code, String message, int[] config,
                                               OperatingPoint point) {
        double maxHeatLoadW = Double.NaN;
        double currentAtMaxHeatLoadA = Double.NaN;
        if (point instanceof Solved solved) {
            maxHeatLoadW = solved.maxHeatLoadW();
            currentAtMaxHeatLoadA = solved.currentAtMaxHeatLoadA();
        } else if (point instanceof Infeasible infeasible) {
            maxHeatLoadW = infeasible.maxHeatLoadW();
            currentAtMaxHeatLoadA = infeasible.currentAtMaxHeatLoadA();
        }
        return new Ranking.Rejection(moduleId, code, message, config[0], config[1], maxHeatLoadW,
                currentAtMaxHeatLoadA);
    }

    /**
     * Feasible designs packed for sorting: a sortable form of the key (as a float, ample to order designs)
     * above the design index, so that one primitive sort orders them without boxing.
     */
    private static long[] packed(int[] designs, double[] key) {
        long[] packed = new long[designs.length];
        for (int j = 0; j < designs.length; j++) {
            int d = designs[j];
            packed[j] = ((long) sortableBits((float) key[d]) << 32) | (d & 0xffffffffL);
        }
        return packed;
    }

    /**
     * Puts the {@code count} smallest packed designs first, in exact key order, and returns
     * {@code count}. Quickselect partitions in linear time, so only the prefix pays for a sort.
     */
    static int sortSmallest(long[] packed, double[] key, int count) {
        if (count < packed.length) {
            select(packed, count);
        }
        Arrays.sort(packed, 0, count);
        // designs whose keys round to the same float: order them by the exact key (runs are short)
        for (int start = 0; start < count; ) {
            int end = start + 1;
            while (end < count && (packed[end] >>> 32) == (packed[start] >>> 32)) {
                end++;
            }
            for (int j = start + 1; j < end; j++) {
                long moving = packed[j];
                int m = j - 1;
                while (m >= start && key[(int) packed[m]] > key[(int) moving]) {
                    packed[m + 1] = packed[m];
                    m--;
                }
                packed[m + 1] = moving;
            }
            start = end;
        }
        return count;
    }

    /** Rearranges {@code a} so that its {@code k} smallest values come first (Hoare's quickselect). */
    private static void select(long[] a, int k) {
        int left = 0;
        int right = a.length - 1;
        while (left < right) {
            long pivot = median(a[left], a[(left + right) >>> 1], a[right]);
            int i = left;
            int j = right;
            while (i <= j) {
                while (a[i] < pivot) {
                    i++;
                }
                while (a[j] > pivot) {
                    j--;
                }
                if (i <= j) {
                    long t = a[i];
                    a[i] = a[j];
                    a[j] = t;
                    i++;
                    j--;
                }
            }
            if (k - 1 <= j) {
                right = j;
            } else if (k - 1 >= i) {
                left = i;
            } else {
                return;
            }
        }
    }

    private static long median(long a, long b, long c) {
        return Math.max(Math.min(a, b), Math.min(Math.max(a, b), c));
    }

    /**
     * Which shown designs are on the COP–cost Pareto front of all feasible designs: none cheaper has at
     * least its COP, and none as cheap has more. One pass over the feasible designs against the shown
     * costs (sorted, so a binary search places each design) gives, for every shown design, the best COP
     * strictly cheaper and at equal cost.
     */
    private static boolean[] paretoFrontOf(List<int[]> shown, int[] feasible, double[] arrayCost, double loadW,
                                           double[] powerW) {
        int k = shown.size();
        boolean[] front = new boolean[k];
        double[] costs = shown.stream().mapToDouble(s -> arrayCost[s[0]]).filter(Double::isFinite).sorted().toArray();
        if (costs.length == 0) {
            return front;
        }
        double[] bestCheaperFrom = new double[costs.length + 1]; // by designs cheaper than costs[b..]
        double[] bestAtCost = new double[costs.length];
        Arrays.fill(bestCheaperFrom, Double.NEGATIVE_INFINITY);
        Arrays.fill(bestAtCost, Double.NEGATIVE_INFINITY);
        for (int d : feasible) {
            double cost = arrayCost[d];
            if (!Double.isFinite(cost)) {
                continue;
            }
            double cop = copOf(loadW, powerW[d]);
            int above = upperBound(costs, cost);           // shown costs > cost start here
            bestCheaperFrom[above] = Math.max(bestCheaperFrom[above], cop);
            int at = above - 1;
            if (at >= 0 && costs[at] == cost) {
                bestAtCost[at] = Math.max(bestAtCost[at], cop);
            }
        }
        for (int b = 1; b <= costs.length; b++) {          // cheaper than costs[b] includes cheaper than costs[b-1]
            bestCheaperFrom[b] = Math.max(bestCheaperFrom[b], bestCheaperFrom[b - 1]);
        }
        for (int j = 0; j < k; j++) {
            int d = shown.get(j)[0];
            double cost = arrayCost[d];
            if (!Double.isFinite(cost)) {
                continue;
            }
            int last = upperBound(costs, cost) - 1;           // designs at this cost were counted here
            int first = last;
            while (first > 0 && costs[first - 1] == cost) {
                first--;
            }
            double cop = copOf(loadW, powerW[d]);
            front[j] = bestCheaperFrom[first] < cop && bestAtCost[last] <= cop;
        }
        return front;
    }

    /** Index of the first value above {@code x} in ascending {@code values}. */
    private static int upperBound(double[] values, double x) {
        int low = 0;
        int high = values.length;
        while (low < high) {
            int mid = (low + high) >>> 1;
            if (values[mid] <= x) {
                low = mid + 1;
            } else {
                high = mid;
            }
        }
        return low;
    }

    /** Float bits flipped so that signed integer order is numeric order (negatives reversed). */
    private static int sortableBits(float value) {
        int bits = Float.floatToIntBits(value);
        return bits < 0 ? bits ^ 0x7fffffff : bits;
    }
}
