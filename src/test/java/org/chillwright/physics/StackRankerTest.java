package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.TreeMap;
import java.util.stream.Stream;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.statistics.Statistics;
import net.jqwik.api.statistics.StatisticsReport;
import net.jqwik.api.constraints.LongRange;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The catalog search for two-stage stacks against a brute-force pair search written here: every cold stage
 * (module × split) on every hot stage with at least as many modules, each solved in full by
 * {@link TwoStageStack#solve}. Catalogs are invented modules scaled from the synthetic TM-A of
 * check-cases.json (S 0.04 V/K, R 2.4 Ω, K 0.25 W/K for 100 couples) in couples and leg shape.
 */
class StackRankerTest {

    private final StackRanker ranker = new StackRanker();

    /** An invented module of {@code couples} TM-A couples with legs {@code shape} times as wide for their length. */
    static CandidateModule invented(long id, double couples, double shape, double zFactor) {
        var p = new ModuleParameters(0.0004 * couples, 0.024 * couples / shape * zFactor,
                0.0025 * couples * shape * zFactor);
        return new CandidateModule(id, p, p.ratingsAt(300).imaxA(), 353.15);
    }

    static List<CandidateModule> smallCatalog() {
        return List.of(invented(1, 31, 0.6, 1.0), invented(2, 71, 1.0, 1.05), invented(3, 127, 1.4, 1.1),
                invented(4, 127, 0.5, 1.0), invented(5, 199, 2.0, 1.15), invented(6, 241, 1.2, 1.02));
    }

    static List<CandidateModule> randomCatalog(int size, long seed) {
        var random = new SplittableRandom(seed);
        var modules = new ArrayList<CandidateModule>();
        for (int i = 0; i < size; i++) {
            modules.add(invented(i + 1, 20 + 240 * random.nextDouble(), 0.3 + 2.7 * random.nextDouble(),
                    0.95 + 0.25 * random.nextDouble()));
        }
        return modules;
    }

    /** A stack as a comparable key: cold id, split, hot id, split. */
    private static String key(StackSolved s) {
        return s.coldStage().moduleId() + " " + s.coldStage().seriesCount() + "x" + s.coldStage().parallelCount()
                + " on " + s.hotStage().moduleId() + " " + s.hotStage().seriesCount() + "x"
                + s.hotStage().parallelCount();
    }

    /** Every feasible stack, by brute force: key → power. */
    private static Map<String, Double> bruteForce(List<CandidateModule> catalog, StackSearch search) {
        Map<String, Double> feasible = new TreeMap<>();
        int[][] splits = ModuleArray.splits(search.maxModulesPerStage());
        for (CandidateModule cold : catalog) {
            for (int[] coldSplit : splits) {
                for (CandidateModule hot : catalog) {
                    for (int[] hotSplit : splits) {
                        if (hotSplit[0] * hotSplit[1] < coldSplit[0] * coldSplit[1]) {
                            continue;
                        }
                        var stack = new TwoStageStack(new StageDesign(cold, coldSplit[0], coldSplit[1]),
                                new StageDesign(hot, hotSplit[0], hotSplit[1]));
                        if (stack.solve(search.coolingCase(), search.limits()) instanceof StackSolved s) {
                            feasible.put(key(s), s.powerW());
                        }
                    }
                }
            }
        }
        return feasible;
    }

    static Stream<Arguments> cases() {
        var deep = new CoolingCase(228.15, 298.15, 0.3, 0.2, 0.1, 0.05);
        var moderate = new CoolingCase(253.15, 308.15, 2.0, 0.1, 0.05, 0.05);
        return Stream.of(
                Arguments.of("−45 °C, 0.3 W, no supply limit", deep, DriveLimits.NONE),
                Arguments.of("−45 °C, 0.3 W, 6 V and 2 A supply", deep, new DriveLimits(Double.NaN, 6, 2, Double.NaN)),
                Arguments.of("−45 °C, 0.3 W, 1.2 A at the terminals", deep, DriveLimits.ofRatedImaxA(1.2)),
                Arguments.of("−20 °C at 35 °C, 2 W, 12 V supply", moderate,
                        new DriveLimits(Double.NaN, 12, Double.NaN, Double.NaN)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void pruningLosesNoFeasibleStack(String name, CoolingCase c, DriveLimits limits) {
        // With room for every stack, the search must return exactly the feasible stacks of the brute force,
        // with the same power: no bound may rule out a feasible stack.
        var search = new StackSearch(c, limits, 3, StackSearch.MAX_LIMIT);
        Map<String, Double> expected = bruteForce(smallCatalog(), search);
        StackRanking ranking = ranker.rank(smallCatalog(), search);
        assertThat(expected).as("the case must have feasible stacks to prove anything").isNotEmpty();
        assertThat(ranking.stacks()).extracting(StackRankerTest::key).containsExactlyInAnyOrderElementsOf(
                expected.keySet());
        for (StackSolved s : ranking.stacks()) {
            assertThat(s.powerW()).isCloseTo(expected.get(key(s)), within(1e-9));
        }
        assertThat(ranking.stacks()).isSortedAccordingTo(Comparator.comparingDouble(StackSolved::powerW));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void bestStacksAreTheBruteForceBest(String name, CoolingCase c, DriveLimits limits) {
        // With a short list the bounds also prune against the worst of the best found so far: the list must
        // still be the brute force's best, in order of power (highest COP first).
        var search = new StackSearch(c, limits, 3, 5);
        List<Double> expected = bruteForce(smallCatalog(), search).values().stream().sorted().limit(5).toList();
        StackRanking ranking = ranker.rank(smallCatalog(), search);
        assertThat(expected).as("the case must have feasible stacks to prove anything").isNotEmpty();
        assertThat(ranking.stacks()).hasSize(expected.size());
        for (int n = 0; n < expected.size(); n++) {
            assertThat(ranking.stacks().get(n).powerW()).isCloseTo(expected.get(n), within(1e-9));
        }
        assertThat(ranking.stacksEvaluated()).isLessThan(ranking.stacksPossible());
    }

    @Property(tries = 25)
    @StatisticsReport(StatisticsReport.StatisticsReportMode.OFF)
    void randomCatalogsLoseNoBestStack(@ForAll @LongRange(min = 1, max = 1_000_000) long seed) {
        var random = new SplittableRandom(seed);
        var c = new CoolingCase(298.15 - 50 - 30 * random.nextDouble(), 298.15, 0.1 + 2 * random.nextDouble(),
                0.05 + 0.3 * random.nextDouble(), 0.1 * random.nextDouble(), 0.05);
        var limits = random.nextBoolean() ? DriveLimits.NONE
                : new DriveLimits(Double.NaN, 4 + 20 * random.nextDouble(), 1 + 5 * random.nextDouble(), Double.NaN);
        var catalog = randomCatalog(7, seed);
        var search = new StackSearch(c, limits, 3, 8);
        List<Double> expected = bruteForce(catalog, search).values().stream().sorted().limit(8).toList();
        Statistics.label("feasible stacks").collect(expected.isEmpty() ? "none" : "some");
        StackRanking ranking = ranker.rank(catalog, search);
        assertThat(ranking.stacks()).extracting(StackSolved::powerW)
                .usingElementComparator((a, b) -> Math.abs(a - b) <= 1e-9 ? 0 : Double.compare(a, b))
                .containsExactlyElementsOf(expected);
        Statistics.label("feasible stacks").coverage(checker -> checker.check("some").percentage(p -> p >= 50));
    }

    @Test
    void aStackHoldsWhatNoSingleStageCan() {
        // −55 °C against 25 °C with a forced-air sink: beyond a single Bi2Te3 stage (ΔTmax ≈ 70 K at a 300 K hot
        // side for these modules, ZT ≈ 0.8), within reach of two.
        var c = new CoolingCase(218.15, 298.15, 0.5, 0.1, 0.1, 0.05);
        var limits = new DriveLimits(Double.NaN, 24, 10, Double.NaN);
        List<CandidateModule> catalog = randomCatalog(40, 11);
        var solver = new OperatingPointSolver();
        for (CandidateModule m : catalog) {
            for (int[] split : ModuleArray.splits(8)) {
                var single = new DriveLimits(m.ratedImaxA() * split[1], 24, 10, m.maxHotSideK());
                assertThat(solver.solve(new ModuleArray(m.parameters(), split[0], split[1]), c, single).feasible())
                        .as("module %d as %dx%d", m.moduleId(), split[0], split[1]).isFalse();
            }
        }
        StackRanking ranking = ranker.rank(catalog, new StackSearch(c, limits, 4, 10));
        assertThat(ranking.stacks()).isNotEmpty();
        StackSolved best = ranking.stacks().get(0);
        assertThat(best.setPointK()).isEqualTo(218.15);
        assertThat(best.hotSideK() - best.coldSideK()).isGreaterThan(80);
        assertThat(best.interstageK()).isBetween(best.coldSideK(), best.hotSideK());
    }

    @Test
    void countsWhatWasSearched() {
        var search = new StackSearch(new CoolingCase(228.15, 298.15, 0.3, 0.2, 0.1, 0.05), DriveLimits.NONE, 4, 10);
        StackRanking ranking = ranker.rank(smallCatalog(), search);
        // 8 splits up to 4 modules (counts 1, 2, 2, 3, 3, 4, 4, 4): 41 split pairs with the hot count ≥ cold count
        assertThat(ranking.stacksPossible()).isEqualTo(41L * 6 * 6);
        assertThat(ranking.stacksPruned()).isEqualTo(ranking.stacksPossible() - ranking.stacksEvaluated());
        assertThat(ranking.stacksFeasible()).isBetween((long) ranking.stacks().size(), ranking.stacksEvaluated());
        assertThat(ranking.stacks()).allSatisfy(s -> assertThat(s.hotStage().seriesCount()
                * s.hotStage().parallelCount()).isGreaterThanOrEqualTo(s.coldStage().seriesCount()
                * s.coldStage().parallelCount()));
    }

    @Test
    void anEmptyCatalogHasNoStacks() {
        var search = new StackSearch(new CoolingCase(228.15, 298.15, 0.3, 0.2, 0.1, 0.05), DriveLimits.NONE, 2, 10);
        StackRanking ranking = ranker.rank(List.of(), search);
        assertThat(ranking.stacks()).isEmpty();
        assertThat(ranking.stacksEvaluated()).isZero();
    }

    @Test
    void rejectsAStageSizeOfZeroNamingIt() {
        assertThatThrownBy(() -> new StackSearch(new CoolingCase(228.15, 298.15, 0.3, 0.2, 0.1, 0.05),
                DriveLimits.NONE, 0, 10)).isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("maxModulesPerStage"));
    }

    @Test
    void rejectsAListLongerThanTheMostItReturnsNamingIt() {
        assertThatThrownBy(() -> new StackSearch(new CoolingCase(228.15, 298.15, 0.3, 0.2, 0.1, 0.05),
                DriveLimits.NONE, 2, StackSearch.MAX_LIMIT + 1)).isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("limit"));
    }
}
