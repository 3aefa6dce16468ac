package org.chillwright.harvest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

import java.io.IOException;
import java.io.InputStream;
import java.util.Map;
import java.util.function.ToDoubleFunction;
import java.util.stream.Stream;
import org.chillwright.physics.GeneratorCase;
import org.chillwright.physics.ModuleParameters;
import org.chillwright.physics.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;

/**
 * Harvest ranking on a small invented table whose answers can be checked by hand or against the
 * check cases. A is the check cases' synthetic TM-A (S 0.04 V/K, R 2.4 Ω, K 0.25 W/K); B has the same
 * legs at half the area (R doubled, K halved: leg-area scaling, same Z); E has fewer, thinner legs
 * of a better material (S 0.04 V/K, R 4.8 Ω, K 0.1 W/K: Z 3.33e-3/K against A's 2.67e-3/K).
 */
class HarvestEngineTest {

    private static final long A = 1, B = 2, E = 3;
    private static final String S13 = "S13-generator-matched-and-max-eff";
    private static final ModuleParameters TM_A = new ModuleParameters(0.04, 2.4, 0.25);

    private final HarvestEngine engine = new HarvestEngine();

    /** check case S13: junctions held at 100 °C and 30 °C (zero heat-exchanger resistance). */
    private static GeneratorCase s13() {
        return GeneratorCase.atJunctions(373.15, 303.15);
    }

    /** A warm-pipe case: 150 °C source, 30 °C sink, 0.5 K/W on each side (invented). */
    private static GeneratorCase pipe() {
        return new GeneratorCase(Units.kelvinFromCelsius(150), Units.kelvinFromCelsius(30), 0.5, 0.5);
    }

    private static GeneratorTable table(double[] maxHotSideK, GeneratorTable.UnitPrices prices) {
        return new GeneratorTable(new long[] {A, B, E}, new double[] {0.04, 0.04, 0.04},
                new double[] {2.4, 4.8, 4.8}, new double[] {0.25, 0.125, 0.1}, maxHotSideK, prices);
    }

    private static GeneratorTable unlimited() {
        return table(new double[] {Double.NaN, Double.NaN, Double.NaN}, GeneratorTable.UnitPrices.NONE);
    }

    private static HarvestCase harvestCase(GeneratorCase c, int maxModules, HarvestObjective objective,
                                           double minLoadVoltageV) {
        return new HarvestCase(c, maxModules, objective, minLoadVoltageV, 1, 50);
    }

    private HarvestDesign single(GeneratorCase c) {
        var only = new GeneratorTable(new long[] {A}, new double[] {0.04}, new double[] {2.4}, new double[] {0.25},
                new double[] {Double.NaN}, GeneratorTable.UnitPrices.NONE);
        return engine.rank(only, harvestCase(c, 1, HarvestObjective.POWER, 0)).candidates().get(0).design();
    }

    static Stream<Arguments> s13Values() throws IOException {
        try (InputStream in = HarvestEngineTest.class.getResourceAsStream("/check-cases.json")) {
            JsonNode root = new ObjectMapper().readTree(in);
            for (JsonNode c : root.get("cases")) {
                if (c.get("id").asString().equals(S13)) {
                    Map<String, ToDoubleFunction<HarvestDesign>> computed = Map.of(
                            "Voc", HarvestDesign::openCircuitV,
                            "I", d -> d.atMaxPower().currentA(),
                            "V", d -> d.atMaxPower().voltageV(),
                            "P", d -> d.atMaxPower().powerW(),
                            "Pmax", d -> d.atMaxPower().powerW(),
                            "Qh", d -> d.atMaxPower().heatInW(),
                            "eta", d -> d.atMaxPower().efficiency(),
                            "RL", d -> d.atMaxEfficiency().loadOhm(),
                            "eta_max", d -> d.atMaxEfficiency().efficiency());
                    double rel = c.get("tolerance").get("rel").asDouble();
                    String source = c.get("source").asString();
                    return c.get("expected").properties().stream().map(e -> Arguments.of(e.getKey(),
                            e.getValue().asDouble(), rel, source, computed.get(e.getKey())));
                }
            }
        }
        throw new IllegalStateException(S13 + " is missing from check-cases.json");
    }

    @ParameterizedTest(name = "S13 {0}")
    @MethodSource("s13Values")
    void bestPowerDesignOfTmAMatchesCheckCaseS13(String key, double expected, double rel, String source,
                                                  ToDoubleFunction<HarvestDesign> value) {
        // check case S13, source quoted in the failure message
        assertThat(value).as("no engine value for S13 %s", key).isNotNull();
        assertThat(value.applyAsDouble(single(s13()))).as("S13 %s; source: %s", key, source)
                .isCloseTo(expected, within(rel * Math.abs(expected)));
    }

    @Test
    void rankingOfHotExchangerCoupledArraysRanksOnlyPhysicalPoints() {
        // 427 °C source, 27 °C sink, 2 K/W on each side, up to 8 modules. Before the bracket fix the 8-module
        // designs of TM-A came back with about 178 W at a hot face near −8e12 K and topped this ranking.
        // Every ranked point must be one the hardware can be in, and its power what a brute-force scan of the
        // raw node equations (GeneratorBruteForce, not the solver) gives for that design.
        var c = new GeneratorCase(700, 300, 2, 2);
        var ranking = engine.rank(unlimited(), harvestCase(c, 8, HarvestObjective.POWER, 0));
        assertThat(ranking.candidates()).isNotEmpty();
        for (var candidate : ranking.candidates()) {
            var d = candidate.design();
            var p = d.atMaxPower();
            assertThat(p.coldJunctionK()).isGreaterThanOrEqualTo(300 - 1e-6).isLessThan(p.hotJunctionK());
            assertThat(p.hotJunctionK()).isLessThanOrEqualTo(700 + 1e-6);
            assertThat(p.voltageV()).isCloseTo(p.currentA() * p.loadOhm(), within(1e-9));
            assertThat(p.heatInW() - p.heatOutW()).isCloseTo(p.powerW(), within(1e-9));
        }
        var top = ranking.candidates().get(0).design();
        long[] ids = {A, B, E};
        double[] resistanceOhm = {2.4, 4.8, 4.8};
        double[] conductanceWPerK = {0.25, 0.125, 0.1};
        int row = java.util.Arrays.stream(new int[] {0, 1, 2}).filter(i -> ids[i] == top.moduleId()).findFirst()
                .orElseThrow();
        var array = new ModuleParameters(0.04, resistanceOhm[row], conductanceWPerK[row])
                .inArray(top.seriesCount(), top.parallelCount());
        assertThat(top.atMaxPower().powerW()).isCloseTo(
                org.chillwright.physics.GeneratorBruteForce.scanMaxPowerW(array, c), withinPercentage(1e-4));
    }

    @Test
    void withIdealHeatExchangersTheBestPowerLoadIsTheInternalResistance() {
        // matched load RL = R (Ioffe 1957; Rowe, CRC Handbook 1995, from memory; check case S13). The optimum is
        // flat, so the load is known to about 1e-4 of R where the power is known to 1e-9.
        assertThat(single(s13()).atMaxPower().loadOhm()).isCloseTo(2.4, withinPercentage(0.01));
    }

    @Test
    void withIdealHeatExchangersMaximumPowerIsVocSquaredOverFourR() {
        // P_max = Voc²/(4R) = 2.8²/9.6 W (Ioffe 1957; Rowe, CRC Handbook 1995, from memory; check case S13)
        assertThat(single(s13()).atMaxPower().powerW()).isCloseTo(2.8 * 2.8 / (4 * 2.4), withinPercentage(1e-6));
    }

    @Test
    void withFiniteHeatExchangersTheBestPowerLoadIsAboveTheInternalResistance() {
        // with heat-exchanger resistances the matched load is no longer R; the Peltier heat
        // a current draws lowers the junction ΔT, so a larger load (less current) pays (Yazawa & Shakouri,
        // J. Appl. Phys. 111 (2012) 024509, not re-read: direction only)
        var design = single(pipe());
        assertThat(design.atMaxPower().loadOhm()).isGreaterThan(2.4 * 1.01);
    }

    @Test
    void bestPowerLoadBeatsTheMatchedLoadWithFiniteHeatExchangers() {
        // the numerical optimum is at least as good as RL = R (definition of a maximum)
        var design = single(pipe());
        var matched = new org.chillwright.physics.GeneratorSolver().atLoad(TM_A, pipe(), 2.4);
        assertThat(design.atMaxPower().powerW()).isGreaterThan(matched.powerW());
    }

    @Test
    void sixModulesWithTheirShareOfTheHeatExchangersGiveSixTimesThePower() {
        // N identical modules, each with its own copy of the heat exchangers (the assembly's resistances
        // divided by N), run at the single module's temperatures: P_total = N·P_1 (circuit algebra of identical modules, case S14)
        var one = single(pipe());
        var six = engine.design(A, TM_A, 2, 3, new GeneratorCase(pipe().hotSourceK(), pipe().coldSinkK(), 0.5 / 6,
                0.5 / 6), Double.NaN, Double.NaN);
        assertThat(six.atMaxPower().powerW()).isCloseTo(6 * one.atMaxPower().powerW(), withinPercentage(1e-6));
    }

    @Test
    void sixModulesWithTheirShareOfTheHeatExchangersRunAtTheSingleModulesJunctionTemperatures() {
        // identical modules on common plates share Th and Tc (case S14)
        var one = single(pipe());
        var six = engine.design(A, TM_A, 2, 3, new GeneratorCase(pipe().hotSourceK(), pipe().coldSinkK(), 0.5 / 6,
                0.5 / 6), Double.NaN, Double.NaN);
        assertThat(six.atMaxPower().hotJunctionK()).isCloseTo(one.atMaxPower().hotJunctionK(), within(1e-6));
        assertThat(six.atMaxPower().coldJunctionK()).isCloseTo(one.atMaxPower().coldJunctionK(), within(1e-6));
    }

    @Test
    void everySplitKeepsTheSingleModulesMaximumEfficiency() {
        // arrays keep Z (circuit algebra of identical modules, case S14), and between fixed junctions η_max depends on Z only
        // (Ioffe 1957; Rowe, CRC Handbook 1995, from memory): every split has S13's η_max 0.03244608572
        for (int[] split : org.chillwright.physics.ModuleArray.splits(8)) {
            var design = engine.design(A, TM_A, split[0], split[1], s13(), Double.NaN, Double.NaN);
            assertThat(design.atMaxEfficiency().efficiency()).as("%dx%d", split[0], split[1])
                    .isCloseTo(0.03244608572, withinPercentage(1e-4));
        }
    }

    @Test
    void seriesModulesRaiseTheVoltageAtTheSamePower() {
        // 4 in series against 4 in parallel on common plates: S ×4 and R ×16 relative, so the same power at
        // 4 times the voltage and a quarter of the current (circuit algebra of identical modules)
        var series = engine.design(A, TM_A, 4, 1, pipe(), Double.NaN, Double.NaN).atMaxPower();
        var parallel = engine.design(A, TM_A, 1, 4, pipe(), Double.NaN, Double.NaN).atMaxPower();
        assertThat(series.powerW()).isCloseTo(parallel.powerW(), withinPercentage(1e-6));
        assertThat(series.voltageV()).isCloseTo(4 * parallel.voltageV(), withinPercentage(1e-4));
    }

    @Test
    void everySplitUpToTheModuleCountIsEvaluated() {
        // 1; 1x2, 2x1; 1x3, 3x1; 1x4, 2x2, 4x1 → 8 splits for up to 4 modules (divisor count, hand arithmetic)
        var ranking = engine.rank(unlimited(), harvestCase(s13(), 4, HarvestObjective.POWER, 0));
        assertThat(ranking.evaluated()).isEqualTo(3 * 8);
    }

    @Test
    void powerObjectivePutsTheLowerResistanceModuleFirst() {
        // between fixed junctions P_max = S²ΔT²/(4R): A (2.4 Ω) gives twice B's and E's power (Ioffe 1957; Rowe, CRC Handbook 1995, from memory)
        var ranking = engine.rank(unlimited(), harvestCase(s13(), 1, HarvestObjective.POWER, 0));
        assertThat(ranking.candidates()).extracting(c -> c.design().moduleId()).startsWith(A);
    }

    @Test
    void efficiencyObjectivePutsTheHigherFigureOfMeritFirst() {
        // at the matched load η = η_C/(2 − η_C/2 + 4/(Z·Th)) rises with Z (Ioffe 1957; Rowe, CRC Handbook 1995,
        // from memory): E (Z 3.33e-3/K) beats A and B (2.67e-3/K) though it gives half A's power
        var ranking = engine.rank(unlimited(), harvestCase(s13(), 1, HarvestObjective.EFFICIENCY, 0));
        assertThat(ranking.candidates()).extracting(c -> c.design().moduleId()).startsWith(E);
    }

    @Test
    void costObjectivePutsTheLowestCostPerWattFirst() {
        // A 18.00 for 0.817 W = 22.0 per W; B 7.50 for 0.408 W = 18.4 per W (cost / power, hand arithmetic)
        var prices = table(new double[] {Double.NaN, Double.NaN, Double.NaN},
                (index, quantity) -> new double[] {18.0, 7.5, Double.NaN}[index]);
        var ranking = engine.rank(prices, harvestCase(s13(), 1, HarvestObjective.COST_PER_WATT, 0));
        assertThat(ranking.candidates()).extracting(c -> c.design().moduleId()).containsExactly(B, A, E);
    }

    @Test
    void designsBelowTheConverterStartUpVoltageAreLeftOut() {
        // one TM-A gives 1.4 V at its best-power load (check case S13), two in series 2.8 V
        var ranking = engine.rank(unlimited(), harvestCase(s13(), 2, HarvestObjective.POWER, 2.0));
        assertThat(ranking.candidates()).isNotEmpty()
                .allSatisfy(c -> assertThat(c.design().atMaxPower().voltageV()).isGreaterThanOrEqualTo(2.0));
    }

    @Test
    void moduleShortOfTheStartUpVoltageIsRefusedWithTheVoltageItReaches() {
        // check case S13: V = 1.4 V at the matched load
        var ranking = engine.rank(unlimited(), harvestCase(s13(), 1, HarvestObjective.POWER, 2.0));
        assertThat(ranking.infeasible()).filteredOn(r -> r.moduleId() == A).singleElement().satisfies(r -> {
            assertThat(r.code()).isEqualTo(HarvestRanking.BELOW_MIN_VOLTAGE);
            assertThat(r.message()).contains("1.400 V").contains("2.000 V");
        });
    }

    @Test
    void openCircuitIsTheHottestStateOfTheHotFace() {
        // current draws Peltier heat S·I·Th out of the hot face (Ioffe 1957; Rowe, CRC Handbook 1995, from memory), so the hot face is hottest
        // with the load disconnected: that is the temperature the limit is checked against
        var design = single(pipe());
        assertThat(design.openCircuitHotJunctionK()).isGreaterThan(design.atMaxPower().hotJunctionK());
    }

    @Test
    void moduleWhoseHotFaceWouldPassItsLimitIsRefusedWithBothTemperatures() {
        // 150 °C source, 0.5 K/W each side, one TM-A at I = 0: ΔT = 120/(1 + 1·0.25) = 96 K,
        // Th = 150 − 0.5·0.25·96 = 138.0 °C (the node balances at I = 0, hand arithmetic) against an 80 °C limit
        var limited = table(new double[] {Units.kelvinFromCelsius(80), Double.NaN, Double.NaN},
                GeneratorTable.UnitPrices.NONE);
        var ranking = engine.rank(limited, harvestCase(pipe(), 1, HarvestObjective.POWER, 0));
        assertThat(ranking.infeasible()).singleElement().satisfies(r -> {
            assertThat(r.moduleId()).isEqualTo(A);
            assertThat(r.code()).isEqualTo(HarvestRanking.HOT_SIDE_ABOVE_LIMIT);
            assertThat(r.message()).contains("138.0 °C").contains("80.0 °C");
        });
    }

    @Test
    void refusalForTheHotSideNamesTheCoolestArrayTried() {
        // eight TM-A at I = 0: K = 2 W/K, ΔT = 120/(1 + 1·2) = 40 K, Th = 150 − 0.5·2·40 = 110.0 °C
        // (the node balances at I = 0, hand arithmetic): more modules run cooler but still pass 80 °C
        var limited = table(new double[] {Units.kelvinFromCelsius(80), Double.NaN, Double.NaN},
                GeneratorTable.UnitPrices.NONE);
        var ranking = engine.rank(limited, harvestCase(pipe(), 8, HarvestObjective.POWER, 0));
        assertThat(ranking.infeasible()).singleElement()
                .satisfies(r -> assertThat(r.message()).startsWith("even 1 in series × 8 in parallel")
                        .contains("110.0 °C"));
    }

    @Test
    void moduleWithoutAStatedLimitIsNotRefusedForHeat() {
        // NaN = the supplier states no limit: nothing to check against (the page still cautions)
        var ranking = engine.rank(unlimited(), harvestCase(pipe(), 1, HarvestObjective.POWER, 0));
        assertThat(ranking.infeasible()).isEmpty();
    }
}
