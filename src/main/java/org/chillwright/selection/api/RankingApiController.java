package org.chillwright.selection.api;

import static org.chillwright.selection.api.Json.number;
import static org.chillwright.selection.api.Json.orNaN;
import static org.chillwright.selection.api.Json.orZero;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import java.util.EnumSet;
import org.chillwright.catalog.Lifecycle;
import org.chillwright.physics.CoolingCase;
import org.chillwright.physics.Units;
import org.chillwright.selection.CaseSpec;
import org.chillwright.selection.Objective;
import org.chillwright.selection.RankingCsv;
import org.chillwright.selection.RankingCase;
import org.chillwright.selection.SelectionService;
import org.chillwright.web.InvalidRequestException;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;

@RestController
@RequestMapping("/api/v1/rankings")
@Tag(name = "Rankings", description = "Every catalog module in every array split, solved and ranked against a case")
class RankingApiController {

    static final int DEFAULT_MAX_MODULES = 4;
    static final int DEFAULT_LIMIT = 50;
    private static final String TEXT_CSV = "text/csv";

    private final SelectionService selection;

    RankingApiController(SelectionService selection) {
        this.selection = selection;
    }

    @PostMapping(produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(operationId = "rankCoolers", summary = "Rank the catalog against a cooling case",
            description = "Objectives COP (default), POWER, MARGIN, COST. Obsolete modules are left out unless "
                    + "lifecycles asks for them. elapsedMs is the server time spent ranking. With Accept: text/csv "
                    + "the same ranking comes as one CSV table (the designs in rank order, then the modules that "
                    + "cannot do the job with their reason), for a spreadsheet or a shell script.")
    RankingResponse rank(@Valid @RequestBody RankingRequest request) {
        var result = selection.rank(spec(request));
        var candidates = result.candidates().stream().map(row -> {
            var design = row.design();
            return new RankingResponse.Candidate(design.rank(), design.moduleId(), row.partNumber(), row.supplier(),
                    row.lifecycle(), number(design.unitPrice()), number(design.arrayCost()), row.currency(),
                    design.paretoFront(), number(design.requiredSinkKPerW()), heating(row.heating()),
                    OperatingPointJson.of(design.point(), design.seriesCount(), design.parallelCount()));
        }).toList();
        var refused = result.infeasible().stream().map(r -> new RankingResponse.Refused(r.moduleId(), r.partNumber(),
                r.supplier(), new OperatingPointResponse.ReasonJson(r.code(), r.message()), r.seriesCount(),
                r.parallelCount(), number(r.maxHeatLoadW()), number(r.currentAtMaxHeatLoadA()))).toList();
        return new RankingResponse(candidates, refused, result.feasible(), result.evaluated(), result.elapsedMs(),
                result.catalogRevision());
    }

    /** The same ranking as a CSV table, for spreadsheets and shell scripts. */
    @PostMapping(produces = TEXT_CSV)
    @Operation(operationId = "rankCoolers", summary = "Rank the catalog against a cooling case")
    ResponseEntity<String> rankAsCsv(@Valid @RequestBody RankingRequest request) {
        return ResponseEntity.ok().contentType(MediaType.parseMediaType(TEXT_CSV + ";charset=UTF-8"))
                .body(RankingCsv.of(selection.rank(spec(request))));
    }

    private static RankingResponse.Heating heating(org.chillwright.physics.HeatingCheck.Result h) {
        return h == null ? null : new RankingResponse.Heating(h.needsHeating(), h.reachable(), h.withinLimits(),
                number(h.currentA()), number(h.voltageV()), number(h.powerW()), number(h.copHeating()),
                h.heatNeededW());
    }

    static CaseSpec spec(RankingRequest request) {
        if (request.sinkResistanceKPerW() == null && request.sinkRiseK() == null) {
            throw new InvalidRequestException("sinkResistanceKPerW",
                    "is required unless sinkRiseK asks for the heat sink to be sized");
        }
        if (request.sinkResistanceKPerW() != null && request.sinkRiseK() != null) {
            throw new InvalidRequestException("sinkRiseK", "give sinkResistanceKPerW or sinkRiseK, not both");
        }
        var coolingCase = new CoolingCase(Units.kelvinFromCelsius(request.setPointC()),
                Units.kelvinFromCelsius(request.ambientC()), request.heatLoadW(), orZero(request.sinkResistanceKPerW()),
                orZero(request.coldInterfaceKPerW()), orZero(request.hotInterfaceKPerW()),
                request.relativeHumidityPct() == null ? Double.NaN
                        : Units.fractionFromPercent(request.relativeHumidityPct()));
        var rankingCase = new RankingCase(coolingCase, orNaN(request.sinkRiseK()), orNaN(request.supplyMaxV()),
                orNaN(request.supplyMaxA()), request.maxModules() == null ? DEFAULT_MAX_MODULES : request.maxModules(),
                request.objective() == null ? Objective.COP : request.objective(), orZero(request.minMarginK()),
                request.maxFractionOfImax() == null ? 1 : request.maxFractionOfImax(),
                request.costQuantity() == null ? 1 : request.costQuantity(),
                request.limit() == null ? DEFAULT_LIMIT : request.limit());
        var lifecycles = request.lifecycles() == null || request.lifecycles().isEmpty()
                ? EnumSet.complementOf(EnumSet.of(Lifecycle.OBSOLETE)) : request.lifecycles();
        CaseSpec.ColdestDay coldest = null;
        if (request.coldestAmbientC() != null) {
            if (request.coldestAmbientC() >= request.setPointC()) {
                throw new InvalidRequestException("coldestAmbientC", "must be below setPointC (" + request.setPointC()
                        + " °C) for a heating check, was " + request.coldestAmbientC() + " °C");
            }
            double loadW = request.heatLoadAtColdestW() == null ? request.heatLoadW() : request.heatLoadAtColdestW();
            coldest = new CaseSpec.ColdestDay(Units.kelvinFromCelsius(request.coldestAmbientC()), -loadW);
        } else if (request.heatLoadAtColdestW() != null) {
            throw new InvalidRequestException("coldestAmbientC", "is required when heatLoadAtColdestW is given");
        }
        return new CaseSpec(rankingCase, request.supplier(), lifecycles, request.listId(), coldest);
    }
}
