package org.chillwright.selection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

import java.util.List;
import org.chillwright.physics.CoolerBruteForce;
import org.chillwright.physics.CoolingCase;
import org.chillwright.physics.ModuleParameters;
import org.chillwright.physics.Units;
import org.junit.jupiter.api.Test;

/**
 * Ranking on a small catalog where the answer can be checked by hand or against the check cases.
 * Module A is the check cases' synthetic TM-A (S 0.04 V/K, R 2.4 Ω, K 0.25 W/K); B has the same legs at
 * half the area (R doubled, K halved: leg-area scaling, half the capacity); C is a tenth of A.
 */
class RankingEngineTest {

    private static final long A = 1, B = 2, C = 3;
    private final RankingEngine engine = new RankingEngine();

    /** check case S10: 10 W from an object at 5 °C, 25 °C ambient, sink 0.3 K/W, interfaces 0.05 / 0.1 K/W. */
    private static CoolingCase s10(double loadW) {
        return new CoolingCase(Units.kelvinFromCelsius(5), Units.kelvinFromCelsius(25), loadW, 0.3, 0.1, 0.05);
    }

    private static CandidateTable table(CandidateTable.PriceBook prices) {
        return new CandidateTable(new long[] {A, B, C},
                new double[] {0.04, 0.04, 0.04}, new double[] {2.4, 4.8, 24}, new double[] {0.25, 0.125, 0.025},
                new double[] {3.8, 1.9, 0.38}, new double[] {70, 70, 70},
                new double[] {Double.NaN, Double.NaN, Double.NaN}, prices);
    }

    private static RankingCase rankingCase(CoolingCase c, int maxModules, Objective objective) {
        return new RankingCase(c, Double.NaN, Double.NaN, Double.NaN, maxModules, objective, 0, 1, 1, 50);
    }

    @Test
    void singleModuleOfTmAReproducesCheckCaseS10() {
        var ranking = engine.rank(table(CandidateTable.PriceBook.NONE), rankingCase(s10(10), 1, Objective.COP));
        var best = ranking.candidates().get(0);
        assertThat(best.moduleId()).isEqualTo(A);
        // check case S10 (brute-force nested root finding on the raw equations): I 1.961596365 A, COP 0.8716659285
        assertThat(best.point().currentA()).isCloseTo(1.961596365, withinPercentage(1e-4));
        assertThat(best.point().cop()).isCloseTo(0.8716659285, withinPercentage(1e-4));
    }

    @Test
    void tooSmallModulesAreListedAsInfeasibleWithTheirReason() {
        // B holds at most about 8.7 W at 5 °C with this sink and C about 2 W, so 10 W is beyond both alone
        var ranking = engine.rank(table(CandidateTable.PriceBook.NONE), rankingCase(s10(10), 1, Objective.COP));
        assertThat(ranking.candidates()).extracting(Ranking.Candidate::moduleId).containsOnly(A);
        assertThat(ranking.infeasible()).extracting(Ranking.Rejection::moduleId).containsExactly(B, C);
        assertThat(ranking.infeasible()).allSatisfy(r -> {
            assertThat(r.code()).isEqualTo("LOAD_ABOVE_CAPACITY");
            assertThat(r.message()).contains("10.00 W");
        });
    }

    @Test
    void aModuleWhoseHotFacePassesItsStatedMaximumIsRefusedForThat() {
        // A stated at 25 °C: every design runs its hot face above the 25 °C ambient, so none may be shown
        var limited = new CandidateTable(new long[] {A}, new double[] {0.04}, new double[] {2.4},
                new double[] {0.25}, new double[] {3.8}, new double[] {70}, new double[] {Units.kelvinFromCelsius(25)},
                CandidateTable.PriceBook.NONE);
        var ranking = engine.rank(limited, rankingCase(s10(10), 2, Objective.COP));
        assertThat(ranking.candidates()).isEmpty();
        assertThat(ranking.infeasible()).singleElement().satisfies(r -> assertThat(r.code())
                .isEqualTo("HOT_SIDE_ABOVE_LIMIT"));
    }

    @Test
    void aRefusedModuleCarriesTheCapacityOfTheDesignItsReasonNames() {
        // B (R 4.8 Ω, K 0.125 W/K) and C (R 24 Ω, K 0.025 W/K) alone cannot take 10 W at 5 °C; how much they can
        // is the brute-force capacity of the raw balances (CoolerBruteForce), not the solver's own number
        var ranking = engine.rank(table(CandidateTable.PriceBook.NONE), rankingCase(s10(10), 1, Objective.COP));
        double[] b = CoolerBruteForce.capacityAtObject(new ModuleParameters(0.04, 4.8, 0.125), s10(10));
        double[] c = CoolerBruteForce.capacityAtObject(new ModuleParameters(0.04, 24, 0.025), s10(10));
        assertThat(ranking.infeasible()).extracting(Ranking.Rejection::maxHeatLoadW)
                .satisfiesExactly(w -> assertThat(w).isCloseTo(b[0], within(1e-6)),
                        w -> assertThat(w).isCloseTo(c[0], within(1e-6)));
        assertThat(ranking.infeasible()).extracting(Ranking.Rejection::currentAtMaxHeatLoadA)
                .satisfiesExactly(i -> assertThat(i).isCloseTo(b[1], within(1e-4)),
                        i -> assertThat(i).isCloseTo(c[1], within(1e-4)));
        assertThat(ranking.infeasible()).allSatisfy(r -> {
            assertThat(r.seriesCount()).isEqualTo(1);
            assertThat(r.parallelCount()).isEqualTo(1);
        });
    }

    @Test
    void largestArrayTriedIsNamedInTheReason() {
        var ranking = engine.rank(table(CandidateTable.PriceBook.NONE), rankingCase(s10(10), 2, Objective.COP));
        assertThat(ranking.infeasible()).singleElement().satisfies(r -> {
            assertThat(r.moduleId()).isEqualTo(C);
            assertThat(r.message()).startsWith("even 2 in series × 1 in parallel");
        });
    }

    @Test
    void everySplitUpToTheModuleCountIsEvaluated() {
        // 1; 1x2, 2x1; 1x3, 3x1; 1x4, 2x2, 4x1 → 8 configurations (the count for up to 4 modules)
        assertThat(RankingEngine.configurations(4)).hasNumberOfRows(8);
        var ranking = engine.rank(table(CandidateTable.PriceBook.NONE), rankingCase(s10(10), 4, Objective.COP));
        assertThat(ranking.evaluated()).isEqualTo(3 * 8);
    }

    @Test
    void moreModulesOfTheSameKindRaiseTheCop() {
        // two modules share the load at lower current each, so less Joule heat per watt removed
        var ranking = engine.rank(table(CandidateTable.PriceBook.NONE), rankingCase(s10(10), 2, Objective.COP));
        var best = ranking.candidates().get(0);
        assertThat(best.moduleId()).isEqualTo(A);
        assertThat(best.moduleCount()).isEqualTo(2);
        assertThat(best.point().cop()).isGreaterThan(0.8716659285);
    }

    @Test
    void candidatesAreInObjectiveOrder() {
        var byCop = engine.rank(table(CandidateTable.PriceBook.NONE), rankingCase(s10(6), 4, Objective.COP));
        assertThat(byCop.candidates()).extracting(c -> c.point().cop())
                .isSortedAccordingTo((x, y) -> Double.compare(y, x));
        var byPower = engine.rank(table(CandidateTable.PriceBook.NONE), rankingCase(s10(6), 4, Objective.POWER));
        assertThat(byPower.candidates()).extracting(c -> c.point().powerW()).isSorted();
        var byMargin = engine.rank(table(CandidateTable.PriceBook.NONE), rankingCase(s10(6), 4, Objective.MARGIN));
        assertThat(byMargin.candidates()).extracting(c -> c.point().marginK())
                .isSortedAccordingTo((x, y) -> Double.compare(y, x));
    }

    @Test
    void sameLoadMeansPowerOrderIsCopOrder() {
        // P = Q / COP at a fixed load, so the two objectives must agree
        var byCop = engine.rank(table(CandidateTable.PriceBook.NONE), rankingCase(s10(6), 4, Objective.COP));
        var byPower = engine.rank(table(CandidateTable.PriceBook.NONE), rankingCase(s10(6), 4, Objective.POWER));
        assertThat(byPower.candidates()).extracting(c -> c.moduleId() + ":" + c.seriesCount() + "x" + c.parallelCount())
                .containsExactlyElementsOf(byCop.candidates().stream()
                        .map(c -> c.moduleId() + ":" + c.seriesCount() + "x" + c.parallelCount()).toList());
    }

    @Test
    void costObjectivePutsTheCheapestArrayFirstAndMarksTheParetoFront() {
        // A costs 20 a piece, B 6: one B is the cheapest design, A designs buy COP with money
        CandidateTable.PriceBook prices = (index, quantity) -> index == 0 ? 20 : index == 1 ? 6 : 1;
        var ranking = engine.rank(table(prices), rankingCase(s10(4), 2, Objective.COST));
        var first = ranking.candidates().get(0);
        assertThat(first.moduleId()).isEqualTo(B);
        assertThat(first.moduleCount()).isEqualTo(1);
        assertThat(first.arrayCost()).isEqualTo(6);
        assertThat(first.paretoFront()).isTrue();
        assertThat(ranking.candidates()).extracting(Ranking.Candidate::arrayCost).isSorted();
        // Pareto dominance (all designs are shown here): another design is no dearer and no less
        // efficient, and better in one of the two
        for (var c : ranking.candidates()) {
            boolean dominated = ranking.candidates().stream().anyMatch(o ->
                    (o.arrayCost() < c.arrayCost() && o.point().cop() >= c.point().cop())
                            || (o.arrayCost() <= c.arrayCost() && o.point().cop() > c.point().cop()));
            assertThat(c.paretoFront()).as("%s", c).isEqualTo(!dominated);
        }
    }

    @Test
    void supplyVoltageLimitRulesOutSeriesStrings() {
        // TM-A at the S10 point needs about 5.8 V; two in series need more than 8 V
        var c = new RankingCase(s10(10), Double.NaN, 8, Double.NaN, 2, Objective.COP, 0, 1, 1, 50);
        var ranking = engine.rank(table(CandidateTable.PriceBook.NONE), c);
        assertThat(ranking.candidates()).allSatisfy(d -> assertThat(d.point().voltageV()).isLessThanOrEqualTo(8));
        assertThat(ranking.candidates()).noneMatch(d -> d.seriesCount() == 2);
    }

    @Test
    void imaxFractionFilterExplainsTheModulesItDrops() {
        // B alone needs well over 30 % of its 1.9 A at 4 W; two in parallel too
        var c = new RankingCase(s10(4), Double.NaN, Double.NaN, Double.NaN, 1, Objective.COP, 0, 0.3, 1, 50);
        var ranking = engine.rank(table(CandidateTable.PriceBook.NONE), c);
        assertThat(ranking.candidates()).allSatisfy(d -> assertThat(d.point().fractionOfImax()).isLessThanOrEqualTo(0.3));
        assertThat(ranking.infeasible()).anySatisfy(r -> assertThat(r.code()).isEqualTo("ABOVE_IMAX_FRACTION"));
    }

    @Test
    void minimumMarginFilterDropsThinDesigns() {
        var all = engine.rank(table(CandidateTable.PriceBook.NONE), rankingCase(s10(6), 4, Objective.COP));
        double median = all.candidates().get(all.candidates().size() / 2).point().marginK();
        var c = new RankingCase(s10(6), Double.NaN, Double.NaN, Double.NaN, 4, Objective.COP, median, 1, 1, 50);
        var filtered = engine.rank(table(CandidateTable.PriceBook.NONE), c);
        assertThat(filtered.candidates()).isNotEmpty()
                .allSatisfy(d -> assertThat(d.point().marginK()).isGreaterThanOrEqualTo(median));
        assertThat(filtered.candidates().size()).isLessThan(all.candidates().size());
    }

    @Test
    void sizingModeReportsTheSinkEachDesignNeeds() {
        // sink base held 10 K above ambient: the needed resistance is that rise over the heat rejected
        var c = new RankingCase(s10(10), 10, Double.NaN, Double.NaN, 1, Objective.COP, 0, 1, 1, 50);
        var best = engine.rank(table(CandidateTable.PriceBook.NONE), c).candidates().get(0);
        assertThat(best.requiredSinkKPerW()).isCloseTo(10 / best.point().heatRejectedW(), withinPercentage(1e-9));
    }

    @Test
    void paretoFrontIsJudgedAgainstEveryFeasibleDesignNotOnlyTheShownOnes() {
        // limit 1 shows only the best COP; the full list tells which designs are dominated
        CandidateTable.PriceBook prices = (index, quantity) -> index == 0 ? 20 : index == 1 ? 6 : 1;
        var all = engine.rank(table(prices), rankingCase(s10(4), 4, Objective.COP));
        var top = engine.rank(table(prices), new RankingCase(s10(4), Double.NaN, Double.NaN, Double.NaN, 4,
                Objective.COP, 0, 1, 1, 1)).candidates().get(0);
        var same = all.candidates().get(0);
        assertThat(top.moduleId()).isEqualTo(same.moduleId());
        assertThat(top.paretoFront()).isEqualTo(same.paretoFront());
        // by the definition: on the front when no design costs less with at least its COP
        boolean dominated = all.candidates().stream().anyMatch(c -> c.arrayCost() < same.arrayCost()
                && c.point().cop() >= same.point().cop());
        assertThat(same.paretoFront()).isEqualTo(!dominated);
    }

    @Test
    void marginFilterDeepInTheListStillReturnsSortedCandidates() {
        // a minimum margin that drops most designs makes the walk run past the first sorted `limit`
        var all = engine.rank(table(CandidateTable.PriceBook.NONE), rankingCase(s10(3), 4, Objective.COP));
        double high = all.candidates().stream().mapToDouble(c -> c.point().marginK()).max().orElseThrow() - 0.5;
        var c = new RankingCase(s10(3), Double.NaN, Double.NaN, Double.NaN, 4, Objective.COP, high, 1, 1, 2);
        var filtered = engine.rank(table(CandidateTable.PriceBook.NONE), c).candidates();
        assertThat(filtered).isNotEmpty().allSatisfy(d -> assertThat(d.point().marginK()).isGreaterThanOrEqualTo(high));
        assertThat(filtered).extracting(d -> d.point().cop()).isSortedAccordingTo((x, y) -> Double.compare(y, x));
    }

    @Test
    void limitCapsTheCandidatesReturned() {
        var c = new RankingCase(s10(4), Double.NaN, Double.NaN, Double.NaN, 4, Objective.COP, 0, 1, 1, 3);
        assertThat(engine.rank(table(CandidateTable.PriceBook.NONE), c).candidates()).hasSize(3)
                .extracting(Ranking.Candidate::rank).isEqualTo(List.of(1, 2, 3));
    }
}
