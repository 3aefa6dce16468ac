package org.chillwright.bench;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.chillwright.physics.CoolingCase;
import org.chillwright.selection.CandidateTable;
import org.chillwright.selection.Objective;
import org.chillwright.selection.Ranking;
import org.chillwright.selection.RankingCase;
import org.chillwright.selection.RankingEngine;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * Server-side ranking of a 10,000-module catalog with up to 4 modules per design (8 splits each, 80,000
 * solves) against one case, detailing the top 50: the work behind {@code POST /api/v1/rankings} after the
 * catalog's solver inputs are in memory.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class RankingBenchmark {

    private static final int MODULES = 10_000;

    @Param({"COP", "COST"})
    public Objective objective;

    private final RankingEngine engine = new RankingEngine();
    private CandidateTable table;
    private RankingCase rankingCase;

    @Setup
    public void setUp() {
        // invented modules spread around the synthetic TM-A of the check cases (fixed seed: comparable runs)
        var random = new SplittableRandom(7);
        long[] ids = new long[MODULES];
        double[] s = new double[MODULES];
        double[] r = new double[MODULES];
        double[] k = new double[MODULES];
        double[] imax = new double[MODULES];
        double[] dtmax = new double[MODULES];
        double[] maxHot = new double[MODULES];
        double[] price = new double[MODULES];
        for (int i = 0; i < MODULES; i++) {
            double scale = 0.3 + 3 * random.nextDouble();
            ids[i] = i + 1;
            s[i] = 0.03 + 0.02 * random.nextDouble();
            r[i] = 2.4 / scale * (0.8 + 0.4 * random.nextDouble());
            k[i] = 0.25 * scale * (0.8 + 0.4 * random.nextDouble());
            imax[i] = 0.75 * s[i] * 300 / r[i];
            dtmax[i] = 70;
            maxHot[i] = 353.15;
            price[i] = 5 + 30 * random.nextDouble();
        }
        table = new CandidateTable(ids, s, r, k, imax, dtmax, maxHot,
                (index, quantity) -> price[index] * (quantity >= 100 ? 0.8 : 1));
        // 10 W from an object at 5 °C in a 25 °C ambient, 0.3 K/W sink (the set-up of check case S10)
        var coolingCase = new CoolingCase(278.15, 298.15, 10, 0.3, 0.1, 0.05);
        rankingCase = new RankingCase(coolingCase, Double.NaN, 24, 12, 4, objective, 0, 1, 100, 50);
    }

    @Benchmark
    public Ranking rankTenThousandModules() {
        return engine.rank(table, rankingCase);
    }
}
