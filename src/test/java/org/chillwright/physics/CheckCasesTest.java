package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Map.Entry;
import java.util.function.Function;
import java.util.stream.Stream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;

/**
 * Runs every external check case of {@code src/test/resources/check-cases.json} against the physics. Each case names
 * its own source and tolerance; a case without a dispatcher, or a dispatcher that does not produce
 * an expected value, fails.
 */
class CheckCasesTest {

    private static final Map<String, Function<JsonNode, Map<String, Double>>> DISPATCHERS = dispatchers();

    static Stream<Arguments> cases() throws IOException {
        try (InputStream in = CheckCasesTest.class.getResourceAsStream("/check-cases.json")) {
            JsonNode root = new ObjectMapper().readTree(in);
            List<Arguments> cases = new ArrayList<>();
            for (JsonNode c : root.get("cases")) {
                cases.add(Arguments.of(c.get("id").asString(), c));
            }
            return cases.stream();
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void matchesExternalCheckValue(String id, JsonNode checkCase) {
        String source = checkCase.get("source").asString();
        Function<JsonNode, Map<String, Double>> dispatcher = DISPATCHERS.get(id);
        assertThat(dispatcher).as("no dispatcher for check case %s (source: %s)", id, source).isNotNull();
        Map<String, Double> got = dispatcher.apply(checkCase.get("inputs"));
        JsonNode tolerance = checkCase.get("tolerance");
        double abs = tolerance.has("abs") ? tolerance.get("abs").asDouble() : 0.0;
        double rel = tolerance.has("rel") ? tolerance.get("rel").asDouble() : 0.0;
        for (Entry<String, JsonNode> expected : checkCase.get("expected").properties()) {
            String key = expected.getKey();
            double exp = expected.getValue().asDouble();
            assertThat(got).as("%s: no computed value for '%s' (source: %s)", id, key, source).containsKey(key);
            double value = got.get(key);
            double error = Math.abs(value - exp);
            assertThat(error <= abs || error <= rel * Math.abs(exp))
                    .as("%s.%s: got %.12g, expected %.12g (abs %.1e, rel %.1e); source: %s", id, key, value, exp, abs,
                            rel, source)
                    .isTrue();
        }
    }

    private static ModuleParameters module(JsonNode n) {
        return new ModuleParameters(n.get("S").asDouble(), n.get("R").asDouble(), n.get("K").asDouble());
    }

    private static LegConstruction construction(JsonNode n) {
        var legs = LegConstruction.ofEqualLegs(n.get("N").asInt(), n.get("A").asDouble(), n.get("L").asDouble(),
                n.get("alpha_p").asDouble(), n.get("alpha_n").asDouble(), n.get("rho_p").asDouble(),
                n.get("rho_n").asDouble(), n.get("k_p").asDouble(), n.get("k_n").asDouble());
        return n.has("rho_c") ? legs.withContactResistivity(n.get("rho_c").asDouble()) : legs;
    }

    private static double d(JsonNode n, String key) {
        assertThat(n.has(key)).as("input '%s' missing", key).isTrue();
        return n.get(key).asDouble();
    }

    private static Map<String, Function<JsonNode, Map<String, Double>>> dispatchers() {
        Map<String, Function<JsonNode, Map<String, Double>>> m = new LinkedHashMap<>();
        m.put("S01-material-route", in -> {
            ModuleParameters p = construction(in).toParameters();
            return Map.of("S", p.seebeckVPerK(), "R", p.resistanceOhm(), "K", p.conductanceWPerK(),
                    "Z", p.figureOfMeritPerK());
        });
        m.put("S02-ratings-from-params", in -> {
            MaxRatings r = module(in.get("module")).ratingsAt(d(in, "Th"));
            return Map.of("Tc_min", r.hotSideK() - r.dtmaxK(), "dTmax", r.dtmaxK(), "Imax", r.imaxA(),
                    "Vmax", r.vmaxV(), "Qmax", r.qmaxW());
        });
        m.put("S03-params-from-IVdT-roundtrip", in -> parametersFrom(in));
        m.put("S04-params-QIdT", in -> {
            Map<String, Double> out = new LinkedHashMap<>(parametersFrom(in));
            out.put("consistency", ratings(in).consistency().orElseThrow());
            return out;
        });
        m.put("S05-params-IVdT", in -> parametersFrom(in));
        m.put("S06-identities-at-Imax", in -> {
            ModuleParameters p = module(in.get("module"));
            double th = d(in, "Th");
            MaxRatings r = p.ratingsAt(th);
            double dt = d(in, "dT");
            return Map.of("Qc_at_dTmax", p.coldSideHeatW(r.imaxA(), th - r.dtmaxK(), th),
                    "Qc_at_dT0", p.coldSideHeatW(r.imaxA(), th, th),
                    "Qc_at_dT", p.coldSideHeatW(r.imaxA(), th - dt, th),
                    "Qc_linear", r.qmaxW() * (1 - dt / r.dtmaxK()),
                    "V_at_Imax_dTmax", p.voltageV(r.imaxA(), th - r.dtmaxK(), th));
        });
        m.put("S07-cop-optimum", in -> {
            ModuleParameters p = module(in.get("module"));
            double tc = d(in, "Tc");
            double th = d(in, "Th");
            double i = p.copOptimalCurrentA(tc, th);
            return Map.of("I_copmax", i, "COP_at_I", p.coldSideHeatW(i, tc, th) / p.powerW(i, tc, th),
                    "COPmax", p.maxCop(tc, th), "COP_carnot", ModuleParameters.carnotCop(tc, th),
                    "I_qcmax", p.maxCoolingCurrentA(tc), "Qc_max", p.maxColdSideHeatW(tc, th));
        });
        m.put("S08-carnot-bound", in -> Map.of(
                "COPmax", ModuleParameters.maxCop(d(in, "Z"), d(in, "Tc"), d(in, "Th")),
                "COP_carnot", ModuleParameters.carnotCop(d(in, "Tc"), d(in, "Th"))));
        m.put("S09-current-for-load-fixed-temps", in -> {
            ModuleParameters p = module(in.get("module"));
            double tc = d(in, "Tc");
            double th = d(in, "Th");
            double i = p.currentForLoadA(d(in, "Qc"), tc, th).orElseThrow();
            return Map.of("I", i, "V", p.voltageV(i, tc, th), "P", p.powerW(i, tc, th),
                    "COP", p.coldSideHeatW(i, tc, th) / p.powerW(i, tc, th));
        });
        m.put("S10-operating-point-heatsink", in -> {
            OperatingPoint point = new OperatingPointSolver().solve(module(in.get("module")), coolingCase(in),
                    DriveLimits.NONE);
            Map<String, Double> out = new LinkedHashMap<>();
            out.put("feasible", point.feasible() ? 1.0 : 0.0);
            if (point instanceof Solved s) {
                out.put("Tc", s.coldSideK());
                out.put("I", s.currentA());
                out.put("Th", s.hotSideK());
                out.put("V", s.voltageV());
                out.put("P", s.powerW());
                out.put("COP", s.cop());
                out.put("Qh", s.heatRejectedW());
                out.put("T_sink_base", d(in, "Tamb") + d(in, "Rsink") * s.heatRejectedW());
            }
            return out;
        });
        m.put("S10b-capacity-peak", in -> {
            CoolingCase c = coolingCase(in);
            CapacityPeak peak = OperatingPointSolver.capacityPeak(module(in.get("module")), c.coldSideAtLoadK(),
                    c.ambientK(), c.hotPathKPerW());
            return Map.of("I_at_Qc_peak", peak.currentA(), "Qc_peak", peak.heatW());
        });
        m.put("S11-infeasible-load", in -> {
            CoolingCase c = coolingCase(in);
            ModuleParameters p = module(in.get("module"));
            OperatingPoint point = new OperatingPointSolver().solve(p, c, DriveLimits.NONE);
            CapacityPeak peak = OperatingPointSolver.capacityPeak(p, c.coldSideAtLoadK(), c.ambientK(),
                    c.hotPathKPerW());
            return Map.of("feasible", point.feasible() ? 1.0 : 0.0, "Qc_peak", peak.heatW(),
                    "Tc", c.coldSideAtLoadK());
        });
        m.put("S12-fixed-current", in -> {
            // Rh is the total hot path; the object set-point is an output here and not used.
            var c = new CoolingCase(d(in, "Tamb"), d(in, "Tamb"), d(in, "Qload"), d(in, "Rh"), d(in, "Rc"), 0.0);
            OperatingPoint point = new OperatingPointSolver().atCurrent(ModuleArray.single(module(in.get("module"))),
                    c, DriveLimits.NONE, d(in, "I"));
            Map<String, Double> out = new LinkedHashMap<>();
            if (point instanceof Solved s) {
                out.put("Tc", s.coldSideK());
                out.put("Th", s.hotSideK());
                out.put("Tobj", s.setPointK());
                out.put("V", s.voltageV());
                out.put("P", s.powerW());
                out.put("COP", s.cop());
            }
            return out;
        });
        m.put("S13-generator-matched-and-max-eff", in -> {
            ModuleParameters p = module(in.get("module"));
            var c = GeneratorCase.atJunctions(d(in, "Th"), d(in, "Tc"));
            var solver = new GeneratorSolver();
            GeneratorPoint mp = solver.maxPower(p, c);
            GeneratorPoint me = solver.maxEfficiency(p, c);
            return Map.of("Voc", solver.openCircuitV(p, c), "I", mp.currentA(), "V", mp.voltageV(), "P", mp.powerW(),
                    "Pmax", mp.powerW(), "Qh", mp.heatInW(), "eta", mp.efficiency(), "RL", me.loadOhm(),
                    "eta_max", me.efficiency());
        });
        m.put("S14-array-2s3p", in -> {
            ModuleParameters eq = module(in.get("module")).inArray(in.get("n_series").asInt(),
                    in.get("n_parallel").asInt());
            MaxRatings r = eq.ratingsAt(d(in, "Th"));
            return Map.of("S", eq.seebeckVPerK(), "R", eq.resistanceOhm(), "K", eq.conductanceWPerK(),
                    "Z", eq.figureOfMeritPerK(), "Imax", r.imaxA(), "Vmax", r.vmaxV(), "Qmax", r.qmaxW(),
                    "dTmax", r.dtmaxK());
        });
        m.put("S15-two-stage-cascade", in -> {
            var cascade = new TwoStageCascade(construction(in.get("module1")).toParameters(),
                    module(in.get("module2")));
            CascadePoint point = cascade.atCurrents(d(in, "I1"), d(in, "I2"), d(in, "Tc"), d(in, "Th"));
            Map<String, Double> out = new LinkedHashMap<>();
            if (point instanceof CascadeSolved s) {
                out.put("Ti", s.interstageK());
                out.put("Qc", s.heatLoadW());
                out.put("P1", s.coldStagePowerW());
                out.put("P2", s.hotStagePowerW());
                out.put("P", s.powerW());
                out.put("COP", s.cop());
                out.put("cop_identity_lhs", 1 + 1 / s.cop());
                out.put("cop_identity_rhs", (1 + 1 / s.coldStageCop()) * (1 + 1 / s.hotStageCop()));
            }
            return out;
        });
        m.put("S16-cooldown-transient", in -> {
            var cooldown = new Cooldown(module(in.get("module")), d(in, "I"), d(in, "Th"), d(in, "C"),
                    d(in, "Qload"), d(in, "Tamb"), d(in, "Rleak"));
            return Map.of("T", cooldown.temperatureAtK(d(in, "T0"), d(in, "t")), "T_inf", cooldown.finalK(),
                    "tau", cooldown.timeConstantS());
        });
        m.put("S17-dew-point-magnus", in -> Map.of("Td_C",
                new DewPointMagnus().dewPointC(d(in, "T_C"), Units.fractionFromPercent(d(in, "RH_percent")))));
        m.put("S18-bi2te3-zt-300K", in -> Map.of("ZT",
                LegConstruction.materialZt(d(in, "alpha"), d(in, "rho"), d(in, "k"), d(in, "T"))));
        return m;
    }

    private static MaxRatings ratings(JsonNode in) {
        double qmax = in.has("Qmax") ? d(in, "Qmax") : Double.NaN;
        return new MaxRatings(d(in, "Imax"), d(in, "Vmax"), qmax, d(in, "dTmax"), d(in, "Th"));
    }

    private static Map<String, Double> parametersFrom(JsonNode in) {
        RatingsMethod method = switch (in.get("method").asString()) {
            case "IVdT" -> RatingsMethod.IMAX_VMAX_DTMAX;
            case "QIdT" -> RatingsMethod.QMAX_IMAX_DTMAX;
            default -> throw new AssertionError("unknown method " + in.get("method"));
        };
        ModuleParameters p = ModuleParameters.fromRatings(ratings(in), method);
        return Map.of("S", p.seebeckVPerK(), "R", p.resistanceOhm(), "K", p.conductanceWPerK(),
                "Z", p.figureOfMeritPerK());
    }

    private static CoolingCase coolingCase(JsonNode in) {
        return new CoolingCase(d(in, "Tobj"), d(in, "Tamb"), d(in, "Qload"), d(in, "Rsink"), d(in, "Rint_c"),
                d(in, "Rint_h"));
    }
}
