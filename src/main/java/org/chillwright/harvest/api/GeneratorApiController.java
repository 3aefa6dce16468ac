package org.chillwright.harvest.api;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import org.chillwright.catalog.ModuleResolver;
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
    @Operation(summary = "Generator point on a load, or on the load that gives the most power")
    GeneratorResponse operatingPoint(@Valid @RequestBody GeneratorRequest request) {
        var generatorCase = GeneratorEdge.generatorCase(request.hotSourceC(), request.coldSinkC(),
                request.hotResistanceKPerW(), request.coldResistanceKPerW());
        var module = modules.resolve(request.module(), "module").parameters();
        var maxPower = solver.maxPower(module, generatorCase);
        var maxEfficiency = solver.maxEfficiency(module, generatorCase);
        var point = request.loadOhm() == null ? maxPower : solver.atLoad(module, generatorCase, request.loadOhm());
        return new GeneratorResponse(solver.openCircuitV(module, generatorCase), point.loadOhm(), point.currentA(),
                point.voltageV(), point.powerW(), point.efficiency(), Units.celsiusFromKelvin(point.hotJunctionK()),
                Units.celsiusFromKelvin(point.coldJunctionK()), point.heatInW(), maxPower.powerW(),
                maxPower.loadOhm(), maxEfficiency.efficiency(), maxEfficiency.loadOhm());
    }
}
