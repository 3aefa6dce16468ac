package org.chillwright.selection;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.function.IntPredicate;
import org.chillwright.approval.ApprovedListService;
import org.chillwright.catalog.CatalogService;
import org.chillwright.catalog.CatalogSnapshot;
import org.chillwright.catalog.ModuleSpec;
import org.chillwright.physics.Check;
import org.chillwright.physics.CoolingCase;
import org.chillwright.physics.DriveLimits;
import org.chillwright.physics.HeatingCheck;
import org.chillwright.physics.ModuleParameters;
import org.chillwright.physics.ModuleArray;
import org.chillwright.physics.OperatingPointSolver;
import org.chillwright.physics.Solved;
import org.springframework.stereotype.Service;

/**
 * Ranks the catalog against cooling cases. The solver inputs of the whole catalog are kept as one
 * {@link CandidateTable} per catalog revision, so a request copies arrays instead of reading entities.
 */
@Service
public class SelectionService {

    private final CatalogService catalog;
    private final ApprovedListService lists;
    /** Heat-sink resistances are quoted to two decimals on datasheets; 1e-4 K/W is well below that. */
    private static final double SINK_RESISTANCE_ACCURACY_K_PER_W = 1e-4;

    /** How deep to look for a second source: far enough to pass every design of the first supplier. */
    private static final int SECOND_SOURCE_SEARCH_DEPTH = 500;

    private final RankingEngine engine = new RankingEngine();
    private final OperatingPointSolver solver = new OperatingPointSolver();
    private final HeatingCheck heatingCheck = new HeatingCheck();
    private volatile Prepared prepared;

    SelectionService(CatalogService catalog, ApprovedListService lists) {
        this.catalog = catalog;
        this.lists = lists;
    }

    /** The snapshot and its table, rebuilt only when the catalog revision moves on. */
    private record Prepared(CatalogSnapshot snapshot, CandidateTable table) {
    }

    public RankingResult rank(CaseSpec spec) {
        var current = prepared();
        var snapshot = current.snapshot();
        int[] rows = selectedRows(snapshot, spec);
        var table = subset(current.table(), rows, snapshot);
        var ranking = engine.rank(table, spec.rankingCase());
        var rowsOut = new ArrayList<RankingResult.Row>(ranking.candidates().size());
        for (var candidate : ranking.candidates()) {
            int i = snapshot.indexOf(candidate.moduleId());
            rowsOut.add(new RankingResult.Row(candidate, snapshot.supplier(i), snapshot.partNumber(i),
                    snapshot.lifecycle(i).name(), snapshot.currency(i), heating(spec, snapshot.parameters(i)
                            .inArray(candidate.seriesCount(), candidate.parallelCount()),
                            snapshot.imaxA(i) * candidate.parallelCount())));
        }
        var refusals = ranking.infeasible().stream().map(r -> {
            int i = snapshot.indexOf(r.moduleId());
            return new RankingResult.Refusal(r.moduleId(), snapshot.supplier(i), snapshot.partNumber(i), r.code(),
                    r.message(), r.seriesCount(), r.parallelCount(), r.maxHeatLoadW(), r.currentAtMaxHeatLoadA());
        }).toList();
        return new RankingResult(rowsOut, refusals, ranking.feasible(), ranking.evaluated(), ranking.elapsedNanos(),
                snapshot.revision());
    }

    /**
     * One design in full detail.
     *
     * @throws org.chillwright.web.NotFoundException when the module is not in the catalog
     */
    public CandidateDetail detail(CaseSpec spec, long moduleId, int seriesCount, int parallelCount) {
        Check.within("seriesCount", seriesCount, 1, RankingCase.MAX_MODULES);
        Check.within("parallelCount", parallelCount, 1, RankingCase.MAX_MODULES);
        var module = catalog.get(moduleId);
        var rankingCase = spec.rankingCase();
        var c = rankingCase.solverCase();
        var array = new ModuleArray(module.parameters(), seriesCount, parallelCount);
        var limits = limits(module, parallelCount, rankingCase);
        var point = solver.solve(array, c, limits);
        double hotSideK = point instanceof Solved solved ? solved.hotSideK() : c.ambientK();
        double ratedImaxA = module.ratedImaxA() * parallelCount;
        double gridTopA = Double.isFinite(ratedImaxA) ? ratedImaxA
                : array.equivalent().maxCoolingCurrentA(c.coldSideAtLoadK());
        var curves = CaseCurves.of(array.equivalent(), c, hotSideK, gridTopA);
        double sinkHint = point instanceof Solved solved && !rankingCase.sizesTheSink()
                ? sinkForMargin(array, c, limits, solved.marginK() + CandidateDetail.MORE_MARGIN_K) : Double.NaN;
        return new CandidateDetail(module, seriesCount, parallelCount, point, curves, sinkHint,
                heating(spec, array.equivalent(), module.ratedImaxA() * parallelCount));
    }

    /**
     * Purchasing's view of a short list: price at the build quantity, lead time, lifecycle, and the best
     * feasible design of another supplier (a second source) from a ranking of the same case.
     */
    public Comparison purchasingView(CaseSpec spec, java.util.List<CandidateDetail> details) {
        var rankingCase = spec.rankingCase();
        var wide = new CaseSpec(new RankingCase(rankingCase.coolingCase(), rankingCase.sinkRiseK(),
                rankingCase.supplyMaxV(), rankingCase.supplyMaxA(), rankingCase.maxModules(), Objective.COP,
                rankingCase.minMarginK(), rankingCase.maxFractionOfImax(), rankingCase.costQuantity(),
                SECOND_SOURCE_SEARCH_DEPTH), null, spec.lifecycles(), spec.listId());
        var ranking = rank(wide);
        int quantity = rankingCase.costQuantity();
        var rows = details.stream().map(d -> {
            var m = d.module();
            var definition = m.definition();
            int pieces = d.moduleCount() * quantity;
            var unitPrice = m.definition().effectiveUnitPriceAt(pieces).orElse(null);
            var arrayCost = unitPrice == null ? null : unitPrice.multiply(java.math.BigDecimal.valueOf(d.moduleCount()));
            var second = ranking.candidates().stream()
                    .filter(r -> !r.supplier().equalsIgnoreCase(m.supplier()))
                    .findFirst()
                    .map(r -> new Comparison.SecondSource(r.design().moduleId(), r.supplier(), r.partNumber(),
                            r.design().seriesCount(), r.design().parallelCount(), r.design().point().cop()))
                    .orElse(null);
            return new Comparison.Row(m.id(), m.supplier(), m.partNumber(), m.lifecycle().label(), unitPrice, arrayCost,
                    definition.currency(), definition.leadTimeDays(), definition.minOrderQuantity(), second);
        }).toList();
        return new Comparison(quantity, rows);
    }

    private static DriveLimits limits(ModuleSpec module, int parallelCount, RankingCase rankingCase) {
        return new DriveLimits(module.ratedImaxA() * parallelCount, rankingCase.supplyMaxV(), rankingCase.supplyMaxA(),
                module.maxHotSideK().orElse(Double.NaN));
    }

    /**
     * The largest heat-sink resistance at which the design has at least {@code targetMarginK}: margin falls
     * as the sink gets worse, so bisect on the resistance between an ideal sink and the case's.
     */
    private double sinkForMargin(ModuleArray array, CoolingCase c, DriveLimits limits, double targetMarginK) {
        if (marginK(array, withSink(c, 0), limits) < targetMarginK) {
            return Double.NaN;
        }
        double good = 0;
        double bad = c.sinkResistanceKPerW();
        while (bad - good > SINK_RESISTANCE_ACCURACY_K_PER_W) {
            double mid = 0.5 * (good + bad);
            if (marginK(array, withSink(c, mid), limits) >= targetMarginK) {
                good = mid;
            } else {
                bad = mid;
            }
        }
        return good;
    }

    private double marginK(ModuleArray array, CoolingCase c, DriveLimits limits) {
        return solver.solve(array, c, limits) instanceof Solved solved ? solved.marginK() : Double.NEGATIVE_INFINITY;
    }

    private static CoolingCase withSink(CoolingCase c, double sinkResistanceKPerW) {
        return new CoolingCase(c.setPointK(), c.ambientK(), c.heatLoadW(), sinkResistanceKPerW, c.coldInterfaceKPerW(),
                c.hotInterfaceKPerW(), c.relativeHumidity());
    }

    /** The heating check of one design on the coldest day, or null when the case has none. */
    private HeatingCheck.Result heating(CaseSpec spec, ModuleParameters equivalent, double ratedImaxA) {
        if (spec.coldest() == null) {
            return null;
        }
        var c = spec.rankingCase().coolingCase();
        double limitA = Math.min(Double.isFinite(ratedImaxA) ? ratedImaxA : Double.POSITIVE_INFINITY,
                Double.isFinite(spec.rankingCase().supplyMaxA()) ? spec.rankingCase().supplyMaxA()
                        : Double.POSITIVE_INFINITY);
        return heatingCheck.check(equivalent, c.setPointK(), spec.coldest().ambientK(), spec.coldest().heatNeededW(),
                c.coldInterfaceKPerW(), c.hotPathKPerW(), limitA);
    }

    private Prepared prepared() {
        var snapshot = catalog.snapshot();
        var current = prepared;
        if (current != null && current.snapshot().revision() == snapshot.revision()) {
            return current;
        }
        current = new Prepared(snapshot, tableOf(snapshot));
        prepared = current;
        return current;
    }

    static CandidateTable tableOf(CatalogSnapshot snapshot) {
        int n = snapshot.size();
        long[] ids = new long[n];
        double[] s = new double[n];
        double[] r = new double[n];
        double[] k = new double[n];
        double[] imax = new double[n];
        double[] dtmax = new double[n];
        double[] maxHot = new double[n];
        for (int i = 0; i < n; i++) {
            ids[i] = snapshot.id(i);
            s[i] = snapshot.seebeckVPerK(i);
            r[i] = snapshot.resistanceOhm(i);
            k[i] = snapshot.conductanceWPerK(i);
            imax[i] = snapshot.imaxA(i);
            dtmax[i] = snapshot.dtmaxK(i);
            maxHot[i] = snapshot.maxHotSideK(i);
        }
        return new CandidateTable(ids, s, r, k, imax, dtmax, maxHot, snapshot::effectiveUnitPriceAt);
    }

    private int[] selectedRows(CatalogSnapshot snapshot, CaseSpec spec) {
        IntPredicate keep = i -> true;
        if (spec.supplier() != null) {
            keep = keep.and(i -> snapshot.supplier(i).equalsIgnoreCase(spec.supplier()));
        }
        if (!spec.lifecycles().isEmpty()) {
            keep = keep.and(i -> spec.lifecycles().contains(snapshot.lifecycle(i)));
        }
        if (spec.listId() != null) {
            // only the list's APPROVED entries take part (an unknown list is a 404)
            var approved = new java.util.HashSet<>(lists.approvedModuleIds(spec.listId()));
            keep = keep.and(i -> approved.contains(snapshot.id(i)));
        }
        final IntPredicate filter = keep;
        return java.util.stream.IntStream.range(0, snapshot.size()).filter(filter).toArray();
    }

    /** The rows of {@code full} at {@code rows}; the price book maps back to snapshot rows. */
    private static CandidateTable subset(CandidateTable full, int[] rows, CatalogSnapshot snapshot) {
        if (rows.length == full.size()) {
            return full;
        }
        return new CandidateTable(pick(full.moduleIds(), rows), pick(full.seebeckVPerK(), rows),
                pick(full.resistanceOhm(), rows), pick(full.conductanceWPerK(), rows), pick(full.ratedImaxA(), rows),
                pick(full.ratedDtmaxK(), rows), pick(full.maxHotSideK(), rows),
                (index, quantity) -> snapshot.effectiveUnitPriceAt(rows[index], quantity));
    }

    private static double[] pick(double[] column, int[] rows) {
        return Arrays.stream(rows).mapToDouble(i -> column[i]).toArray();
    }

    private static long[] pick(long[] column, int[] rows) {
        return Arrays.stream(rows).mapToLong(i -> column[i]).toArray();
    }
}
