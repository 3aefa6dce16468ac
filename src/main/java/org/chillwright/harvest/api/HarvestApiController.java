package org.chillwright.harvest.api;

import static org.chillwright.harvest.api.GeneratorEdge.celsius;
import static org.chillwright.harvest.api.GeneratorEdge.number;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import java.util.EnumSet;
import org.chillwright.catalog.Lifecycle;
import org.chillwright.harvest.HarvestCase;
import org.chillwright.harvest.HarvestObjective;
import org.chillwright.harvest.HarvestService;
import org.chillwright.harvest.HarvestSpec;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;

@RestController
@RequestMapping("/api/v1/harvest")
@Tag(name = "Harvest", description = "The catalog ranked as thermoelectric generators for one heat source")
class HarvestApiController {

    static final int DEFAULT_MAX_MODULES = 4;
    static final int DEFAULT_LIMIT = 50;

    private final HarvestService harvest;

    HarvestApiController(HarvestService harvest) {
        this.harvest = harvest;
    }

    @PostMapping("/rankings")
    @Operation(operationId = "rankGenerators",
            summary = "Rank the catalog as generators between a hot source and a cold sink",
            description = "Every module in every series x parallel split up to maxModules, each on the load that "
                    + "gives it the most power. Objectives POWER (default), EFFICIENCY, COST_PER_WATT. A design "
                    + "whose hot face would pass the module's maximum operating temperature with the load "
                    + "disconnected is infeasible; minLoadVoltageV drops designs below a converter's start-up voltage.")
    HarvestRankingResponse rank(@Valid @RequestBody HarvestRankingRequest request) {
        var result = harvest.rank(spec(request));
        var candidates = result.candidates().stream().map(row -> {
            var d = row.design();
            var p = d.atMaxPower();
            return new HarvestRankingResponse.Candidate(row.rank(), d.moduleId(), row.partNumber(), row.supplier(),
                    row.lifecycle(), d.seriesCount(), d.parallelCount(), d.openCircuitV(), p.loadOhm(), p.currentA(),
                    p.voltageV(), p.powerW(), p.efficiency(), celsius(p.hotJunctionK()), celsius(p.coldJunctionK()),
                    p.heatInW(), d.atMaxEfficiency().efficiency(), d.atMaxEfficiency().loadOhm(),
                    celsius(d.openCircuitHotJunctionK()), number(celsius(d.maxHotSideK())), number(d.unitPrice()),
                    number(d.arrayCost()), number(d.costPerW()), row.currency(), d.warnings().stream()
                            .map(w -> new GeneratorResponse.WarningJson(w.code().name(), w.sentence())).toList());
        }).toList();
        var refused = result.infeasible().stream().map(r -> new HarvestRankingResponse.Refused(r.moduleId(),
                r.partNumber(), r.supplier(), new HarvestRankingResponse.Reason(r.code(), r.message()))).toList();
        return new HarvestRankingResponse(candidates, refused, result.feasible(), result.evaluated(),
                result.elapsedMs(), result.catalogRevision());
    }

    private static HarvestSpec spec(HarvestRankingRequest request) {
        var generatorCase = GeneratorEdge.generatorCase(request.hotSourceC(), request.coldSinkC(),
                request.hotResistanceKPerW(), request.coldResistanceKPerW());
        var harvestCase = new HarvestCase(generatorCase,
                request.maxModules() == null ? DEFAULT_MAX_MODULES : request.maxModules(),
                request.objective() == null ? HarvestObjective.POWER : request.objective(),
                request.minLoadVoltageV() == null ? 0 : request.minLoadVoltageV(),
                request.costQuantity() == null ? 1 : request.costQuantity(),
                request.limit() == null ? DEFAULT_LIMIT : request.limit());
        var lifecycles = request.lifecycles() == null || request.lifecycles().isEmpty()
                ? EnumSet.complementOf(EnumSet.of(Lifecycle.OBSOLETE)) : request.lifecycles();
        return new HarvestSpec(harvestCase, request.supplier(), lifecycles);
    }
}
