package org.chillwright.harvest;

import java.util.Arrays;
import java.util.stream.IntStream;
import org.chillwright.catalog.CatalogService;
import org.chillwright.catalog.CatalogSnapshot;
import org.chillwright.physics.Check;
import org.springframework.stereotype.Service;

/** Ranks the catalog as thermoelectric generators against harvest cases, and details one design. */
@Service
public class HarvestService {

    private final CatalogService catalog;
    private final HarvestEngine engine = new HarvestEngine();

    HarvestService(CatalogService catalog) {
        this.catalog = catalog;
    }

    public HarvestResult rank(HarvestSpec spec) {
        var snapshot = catalog.snapshot();
        int[] rows = selectedRows(snapshot, spec);
        var ranking = engine.rank(tableOf(snapshot, rows), spec.harvestCase());
        var rowsOut = ranking.candidates().stream().map(candidate -> {
            int i = snapshot.indexOf(candidate.design().moduleId());
            return new HarvestResult.Row(candidate.rank(), candidate.design(), snapshot.supplier(i),
                    snapshot.partNumber(i), snapshot.lifecycle(i).name(), snapshot.currency(i));
        }).toList();
        var refusals = ranking.infeasible().stream().map(r -> {
            int i = snapshot.indexOf(r.moduleId());
            return new HarvestResult.Refusal(r.moduleId(), snapshot.supplier(i), snapshot.partNumber(i), r.code(),
                    r.message());
        }).toList();
        return new HarvestResult(rowsOut, refusals, ranking.feasible(), ranking.evaluated(), ranking.elapsedNanos(),
                snapshot.revision());
    }

    /**
     * One design in full detail, with its curves.
     *
     * @throws org.chillwright.web.NotFoundException when the module is not in the catalog
     */
    public HarvestDetail detail(HarvestSpec spec, long moduleId, int seriesCount, int parallelCount) {
        Check.within("seriesCount", seriesCount, 1, HarvestCase.MAX_MODULES);
        Check.within("parallelCount", parallelCount, 1, HarvestCase.MAX_MODULES);
        var module = catalog.get(moduleId);
        var harvestCase = spec.harvestCase();
        int pieces = seriesCount * parallelCount * harvestCase.costQuantity();
        double unitPrice = module.definition().effectiveUnitPriceAt(pieces).map(java.math.BigDecimal::doubleValue)
                .orElse(Double.NaN);
        var design = engine.design(moduleId, module.parameters(), seriesCount, parallelCount,
                harvestCase.generatorCase(), module.maxHotSideK().orElse(Double.NaN), unitPrice);
        var curves = HarvestCurves.of(module.parameters().inArray(seriesCount, parallelCount),
                harvestCase.generatorCase(), design.atMaxPower(), design.atMaxEfficiency());
        return new HarvestDetail(module, design, engine.problem(design, harvestCase.minLoadVoltageV()), curves);
    }

    private static int[] selectedRows(CatalogSnapshot snapshot, HarvestSpec spec) {
        return IntStream.range(0, snapshot.size())
                .filter(i -> spec.supplier() == null || snapshot.supplier(i).equalsIgnoreCase(spec.supplier()))
                .filter(i -> spec.lifecycles().isEmpty() || spec.lifecycles().contains(snapshot.lifecycle(i)))
                .toArray();
    }

    /** The generator inputs of the snapshot rows at {@code rows}; the prices map back to snapshot rows. */
    static GeneratorTable tableOf(CatalogSnapshot snapshot, int[] rows) {
        return new GeneratorTable(Arrays.stream(rows).mapToLong(snapshot::id).toArray(),
                Arrays.stream(rows).mapToDouble(snapshot::seebeckVPerK).toArray(),
                Arrays.stream(rows).mapToDouble(snapshot::resistanceOhm).toArray(),
                Arrays.stream(rows).mapToDouble(snapshot::conductanceWPerK).toArray(),
                Arrays.stream(rows).mapToDouble(snapshot::maxHotSideK).toArray(),
                (index, quantity) -> snapshot.effectiveUnitPriceAt(rows[index], quantity));
    }
}
