package org.chillwright.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;

import org.chillwright.physics.CandidateModule;
import org.chillwright.physics.CoolingCase;
import org.chillwright.physics.DriveLimits;
import org.chillwright.physics.ModuleParameters;
import org.chillwright.physics.StackRanker;
import org.chillwright.physics.StackRanking;
import org.chillwright.physics.StackSearch;
import org.chillwright.physics.Units;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * A 1,000-module catalog ranked for two-stage stacks of up to four modules a stage (8 splits a stage, 41 million
 * cold × hot pairs), best 50 returned with their margins: the work behind a two-stage ranking once the catalog's
 * solver inputs are in memory. Cases: −55 °C, which no single stage of this catalog holds, and −40 °C, which a few
 * do, both at 25 °C ambient with a forced-air sink and a 24 V / 10 A supply.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class StackRankingBenchmark {

    private static final int MODULES = 1_000;

    @Param({"-55", "-40"})
    public double setPointC;

    private final StackRanker ranker = new StackRanker();
    private List<CandidateModule> catalog;
    private StackSearch search;

    @Setup
    public void setUp() {
        // invented modules: 20 to 260 couples of the synthetic TM-A legs (check-cases.json), leg shape 0.3 to 3,
        // ZT about 0.55 to 0.85 at 300 K; a fixed seed keeps runs comparable
        var random = new SplittableRandom(11);
        catalog = new ArrayList<>(MODULES);
        for (int i = 0; i < MODULES; i++) {
            double couples = 20 + 240 * random.nextDouble();
            double shape = 0.3 + 2.7 * random.nextDouble();
            double zFactor = 0.95 + 0.25 * random.nextDouble();
            var p = new ModuleParameters(0.0004 * couples, 0.024 * couples / shape * zFactor,
                    0.0025 * couples * shape * zFactor);
            catalog.add(new CandidateModule(i + 1, p, p.ratingsAt(300).imaxA(), 353.15));
        }
        double loadW = setPointC < -50 ? 0.5 : 1.0;
        var coolingCase = new CoolingCase(Units.kelvinFromCelsius(setPointC), Units.kelvinFromCelsius(25), loadW, 0.1,
                0.1, 0.05);
        search = new StackSearch(coolingCase, new DriveLimits(Double.NaN, 24, 10, Double.NaN), 4, 50);
    }

    @Benchmark
    public StackRanking rankThousandModulesForStacks() {
        return ranker.rank(catalog, search);
    }
}
