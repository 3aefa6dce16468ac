package org.chillwright.selection.api;

import static org.chillwright.selection.api.Json.orNaN;
import static org.chillwright.selection.api.Json.orZero;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import org.chillwright.catalog.ModuleResolver;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotNull;
import org.chillwright.physics.CascadeSolved;
import org.chillwright.physics.Cooldown;
import org.chillwright.physics.CoolingCase;
import org.chillwright.physics.DewPoint;
import org.chillwright.physics.DewPointMagnus;
import org.chillwright.physics.Infeasible;
import org.chillwright.physics.MaxRatings;
import org.chillwright.physics.ModuleParameters;
import org.chillwright.physics.TwoStageCascade;
import org.chillwright.physics.ModuleArray;
import org.chillwright.physics.OperatingPointSolver;
import org.chillwright.physics.Units;
import org.chillwright.web.InvalidRequestException;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;

/** The computation endpoints of the HTTP contract: each solves one thing and stores nothing. */
@RestController
@RequestMapping("/api/v1")
@Tag(name = "Computations", description = "Module parameters and operating points; SI units, temperatures in °C")
class ComputationApiController {

    private final ModuleResolver modules;
    /** Hot side at which a module without ratings is restated when none is asked for, °C (common practice). */
    private static final double DEFAULT_RATING_HOT_SIDE_C = 25;
    /** ZT is quoted at 300 K by convention (common practice, no source). */
    private static final double ZT_REFERENCE_K = 300;
    private static final int COOLDOWN_CURVE_POINTS = 60;
    /** The cool-down curve runs to five time constants (within 1 % of the final value) or the asked time. */
    private static final double COOLDOWN_CURVE_TIME_CONSTANTS = 5;

    private final OperatingPointSolver solver = new OperatingPointSolver();
    private final DewPoint dewPoint = new DewPointMagnus();

    ComputationApiController(ModuleResolver modules) {
        this.modules = modules;
    }

    @PostMapping("/operating-point")
    @Operation(operationId = "solveOperatingPoint", summary = "Solve one module or array against one cooling case",
            description = "Without currentA or voltageV: the current that removes heatLoadW at setPointC (lower root). "
                    + "With one of them: the object temperature reached at that drive.")
    OperatingPointResponse operatingPoint(@Valid @RequestBody OperatingPointRequest request) {
        if (request.currentA() != null && request.voltageV() != null) {
            throw new InvalidRequestException("voltageV", "give currentA or voltageV, not both");
        }
        boolean fixedDrive = request.currentA() != null || request.voltageV() != null;
        if (!fixedDrive && request.setPointC() == null) {
            throw new InvalidRequestException("setPointC", "is required unless currentA or voltageV is given");
        }
        int series = request.seriesCount() == null ? 1 : request.seriesCount();
        int parallel = request.parallelCount() == null ? 1 : request.parallelCount();
        var module = modules.resolve(request.module(), "module");
        var array = new ModuleArray(module.parameters(), series, parallel);
        double setPointK = Units.kelvinFromCelsius(fixedDrive && request.setPointC() == null
                ? request.ambientC() : request.setPointC());
        var coolingCase = new CoolingCase(setPointK, Units.kelvinFromCelsius(request.ambientC()),
                request.heatLoadW(), request.sinkResistanceKPerW(), orZero(request.coldInterfaceKPerW()),
                orZero(request.hotInterfaceKPerW()), request.relativeHumidityPct() == null ? Double.NaN
                        : Units.fractionFromPercent(request.relativeHumidityPct()));
        var limits = module.limits(series, parallel, orNaN(request.supplyMaxV()), orNaN(request.supplyMaxA()));
        var point = request.currentA() != null ? solver.atCurrent(array, coolingCase, limits, request.currentA())
                : request.voltageV() != null ? solver.atVoltage(array, coolingCase, limits, request.voltageV())
                : solver.solve(array, coolingCase, limits);
        return OperatingPointJson.of(point, series, parallel);
    }

    @PostMapping("/derive")
    @Operation(operationId = "deriveModule",
            summary = "Lumped parameters S, R, K and Z of a module, and its ideal ratings at a hot side",
            description = "atHotSideC defaults to the rating temperature, or 25 °C for a module without ratings.")
    DeriveResponse derive(@Valid @RequestBody DeriveRequest request) {
        var module = modules.resolve(request.module(), "module");
        var parameters = module.parameters();
        double atHotSideK = request.atHotSideC() != null ? Units.kelvinFromCelsius(request.atHotSideC())
                : module.ratings().map(MaxRatings::hotSideK).orElse(Units.kelvinFromCelsius(DEFAULT_RATING_HOT_SIDE_C));
        var at = parameters.ratingsAt(atHotSideK);
        double impliedQmaxW = module.ratings().map(MaxRatings::impliedQmaxW).orElse(at.qmaxW());
        Double consistency = module.ratings().flatMap(r -> {
            var c = r.consistency();
            return c.isPresent() ? java.util.Optional.of(c.getAsDouble()) : java.util.Optional.<Double>empty();
        }).orElse(null);
        double z = parameters.figureOfMeritPerK();
        return new DeriveResponse(parameters.seebeckVPerK(), parameters.resistanceOhm(), parameters.conductanceWPerK(),
                z, z * ZT_REFERENCE_K, impliedQmaxW, consistency,
                new DeriveResponse.Ratings(at.imaxA(), at.vmaxV(), at.qmaxW(), at.dtmaxK(),
                        Units.celsiusFromKelvin(at.hotSideK())));
    }

    @PostMapping("/cascade/operating-point")
    @Operation(operationId = "solveCascade", summary = "Two-stage cascade between fixed cold and hot faces",
            description = "Give coldStageCurrentA and hotStageCurrentA, or heatLoadW to solve one shared current.")
    CascadeResponse cascade(@Valid @RequestBody CascadeRequest request) {
        boolean currents = request.coldStageCurrentA() != null || request.hotStageCurrentA() != null;
        if (currents && request.heatLoadW() != null) {
            throw new InvalidRequestException("heatLoadW", "give either both stage currents or heatLoadW, not both");
        }
        if (currents && (request.coldStageCurrentA() == null || request.hotStageCurrentA() == null)) {
            throw new InvalidRequestException(request.coldStageCurrentA() == null ? "coldStageCurrentA"
                    : "hotStageCurrentA", "is required when the other stage current is given");
        }
        if (!currents && request.heatLoadW() == null) {
            throw new InvalidRequestException("heatLoadW", "is required unless both stage currents are given");
        }
        var cascade = new TwoStageCascade(stage(request.coldStage(), "coldStage"), stage(request.hotStage(), "hotStage"));
        double coldK = Units.kelvinFromCelsius(request.coldSideC());
        double hotK = Units.kelvinFromCelsius(request.hotSideC());
        var point = currents
                ? cascade.atCurrents(request.coldStageCurrentA(), request.hotStageCurrentA(), coldK, hotK)
                : cascade.sharedCurrentForLoad(request.heatLoadW(), coldK, hotK);
        if (point instanceof CascadeSolved s) {
            Double shared = s.coldStageCurrentA() == s.hotStageCurrentA() ? s.coldStageCurrentA() : null;
            return new CascadeResponse(true, null, Units.celsiusFromKelvin(s.interstageK()), s.heatLoadW(), shared,
                    java.util.List.of(s.coldStageCurrentA(), s.hotStageCurrentA()), s.powerW(), Json.number(s.cop()),
                    Json.number(s.coldStageCop()), Json.number(s.hotStageCop()), s.heatRejectedW());
        }
        var infeasible = (Infeasible) point;
        return new CascadeResponse(false, new OperatingPointResponse.ReasonJson(infeasible.reason().name(),
                infeasible.detail()), null, null, null, java.util.List.of(), null, null, null, null, null);
    }

    @PostMapping("/cooldown")
    @Operation(operationId = "coolDown", summary = "Cool-down of a lumped object at constant current and hot side",
            description = "Closed-form exponential (lumped capacitance); timeToTargetS when targetC is given.")
    CooldownResponse cooldown(@Valid @RequestBody CooldownRequest request) {
        var module = modules.resolve(request.module(), "module");
        var cooldown = new Cooldown(module.parameters(), request.currentA(), Units.kelvinFromCelsius(request.hotSideC()),
                request.heatCapacityJPerK(), request.heatLoadW(), Units.kelvinFromCelsius(request.ambientC()),
                request.leakResistanceKPerW());
        double startK = Units.kelvinFromCelsius(request.startC());
        Double toTarget = null;
        if (request.targetC() != null) {
            var t = cooldown.timeToTargetS(startK, Units.kelvinFromCelsius(request.targetC()));
            toTarget = t.isPresent() ? t.getAsDouble() : null;
        }
        double horizonS = Math.max(request.timeS(), COOLDOWN_CURVE_TIME_CONSTANTS * cooldown.timeConstantS());
        var curve = java.util.stream.IntStream.rangeClosed(0, COOLDOWN_CURVE_POINTS)
                .mapToObj(n -> {
                    double t = horizonS * n / COOLDOWN_CURVE_POINTS;
                    return new CooldownResponse.Sample(t, Units.celsiusFromKelvin(cooldown.temperatureAtK(startK, t)));
                }).toList();
        return new CooldownResponse(Units.celsiusFromKelvin(cooldown.temperatureAtK(startK, request.timeS())),
                Units.celsiusFromKelvin(cooldown.finalK()), cooldown.timeConstantS(), toTarget, curve);
    }

    @GetMapping("/dew-point")
    @Operation(operationId = "dewPoint",
            summary = "Dew point of air, and its frost point when the dew point is below 0 °C",
            description = "Magnus form over water and over ice (Alduchov and Eskridge 1996); relative humidity with "
                    + "respect to water. Fitted for air from -40 to 50 °C; from -100 to 200 °C the values are "
                    + "extrapolated and the answer says so (above 50 °C the extrapolated dew point errs high).")
    DewPointResponse dewPoint(
            @RequestParam @NotNull @DecimalMin("-100") @DecimalMax("200") Double airC,
            @RequestParam @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax("100")
            Double relativeHumidityPct) {
        double relativeHumidity = Units.fractionFromPercent(relativeHumidityPct);
        double dewPointC = dewPoint.dewPointC(airC, relativeHumidity);
        Double frostPointC = dewPointC < 0 ? dewPoint.frostPointC(airC, relativeHumidity) : null;
        boolean extrapolated = !dewPoint.withinFit(airC);
        String note = extrapolated ? "the air temperature is outside the -40 to 50 °C range of the Magnus fit: "
                + "extrapolated values; allow a wider margin" : null;
        return new DewPointResponse(dewPointC, frostPointC, extrapolated, note);
    }

    private ModuleParameters stage(CascadeRequest.Stage stage, String field) {
        var module = modules.resolve(stage.module(), field + ".module");
        return module.parameters().inArray(stage.seriesCount() == null ? 1 : stage.seriesCount(),
                stage.parallelCount() == null ? 1 : stage.parallelCount());
    }
}
