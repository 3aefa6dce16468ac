package org.chillwright.harvest.api;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import org.chillwright.catalog.ModuleResolver;
import org.chillwright.physics.GeneratorRisks;
import org.chillwright.physics.GeneratorSolver;
import org.chillwright.physics.Units;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;

@RestController
@RequestMapping("/api/v1/generator")
@Tag(name = "Generator", description = "Modules as thermoelectric generators (heat harvesting)")
class GeneratorApiController {

    private final ModuleResolver modules;
    private final GeneratorSolver solver = new GeneratorSolver();

    GeneratorApiController(ModuleResolver modules) {
        this.modules = modules;
    }

    @PostMapping("/operating-point")
    @Operation(operationId = "solveGeneratorPoint",
            summary = "Generator point on a load, or on the load that gives the most power",
            description = "Sources up to 1500 °C. warnings flag a hot junction above the module's stated maximum "
                    + "temperature (HOT_SIDE_ABOVE_LIMIT), a module that states none (HOT_SIDE_LIMIT_UNCHECKED; give "
                    + "module.maxOperatingC), and an open-circuit voltage above 60 V DC (SHOCK_HAZARD_VOLTAGE).")
    GeneratorResponse operatingPoint(@Valid @RequestBody GeneratorRequest request) {
        var generatorCase = GeneratorEdge.generatorCase(request.hotSourceC(), request.coldSinkC(),
                request.hotResistanceKPerW(), request.coldResistanceKPerW());
        var resolved = modules.resolve(request.module(), "module");
        var module = resolved.parameters();
        double maxHotSideK = resolved.maxHotSideK().orElse(Double.NaN);
        double openCircuitV = solver.openCircuitV(module, generatorCase);
        double openCircuitHotK = GeneratorSolver.openCircuitHotJunctionK(module, generatorCase);
        var maxPower = solver.maxPower(module, generatorCase);
        var maxEfficiency = solver.maxEfficiency(module, generatorCase);
        var point = request.loadOhm() == null ? maxPower : solver.atLoad(module, generatorCase, request.loadOhm());
        var warnings = GeneratorRisks.of(openCircuitV, openCircuitHotK, maxHotSideK).stream()
                .map(w -> new GeneratorResponse.WarningJson(w.code().name(), w.sentence())).toList();
        return new GeneratorResponse(openCircuitV, point.loadOhm(), point.currentA(),
                point.voltageV(), point.powerW(), point.efficiency(), Units.celsiusFromKelvin(point.hotJunctionK()),
                Units.celsiusFromKelvin(point.coldJunctionK()), point.heatInW(), maxPower.powerW(),
                maxPower.loadOhm(), maxEfficiency.efficiency(), maxEfficiency.loadOhm(),
                Units.celsiusFromKelvin(openCircuitHotK), GeneratorEdge.number(GeneratorEdge.celsius(maxHotSideK)),
                warnings);
    }
}
