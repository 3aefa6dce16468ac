package org.chillwright.bench;

import java.util.concurrent.TimeUnit;

import org.chillwright.physics.CoolingCase;
import org.chillwright.physics.DetailedArray;
import org.chillwright.physics.DetailedResult;
import org.chillwright.physics.DetailedSolver;
import org.chillwright.physics.DriveLimits;
import org.chillwright.physics.MaterialSet;
import org.chillwright.physics.MaxRatings;
import org.chillwright.physics.ModuleArray;
import org.chillwright.physics.ModuleParameters;
import org.chillwright.physics.RatingsFit;
import org.chillwright.physics.ToleranceAnalysis;
import org.chillwright.physics.ToleranceResult;
import org.chillwright.physics.ToleranceSpread;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * Speed of the detailed model and the tolerance analysis: one detailed design (operating point and
 * most heat at the set-point, Bi2Te3 set fitted to invented ratings), 10,000 tolerance samples on one
 * thread, and the ratings fit itself.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
public class DetailedBenchmark {

    private final DetailedSolver solver = new DetailedSolver();
    private final ToleranceAnalysis analysis = new ToleranceAnalysis();
    private final MaxRatings ratings = MaxRatings.withoutQmax(6, 15.4, 70, 300); // invented module
    private DetailedArray detailed;
    private CoolingCase coolingCase;
    private ToleranceAnalysis.Request tolerance;

    @Setup
    public void setUp() {
        detailed = DetailedArray.single(new RatingsFit().fit(ratings, MaterialSet.BI2TE3_COUPLE_AVERAGE).module());
        coolingCase = new CoolingCase(278.15, 298.15, 10, 0.3, 0.1, 0.05); // the set-up of check case S10
        var limits = new DriveLimits(3.8, 15, 6, 353.15);
        tolerance = new ToleranceAnalysis.Request(ModuleArray.single(new ModuleParameters(0.04, 2.4, 0.25)),
                coolingCase, limits, new ToleranceSpread(0.05, 0.05, 0.05, 0.1, 0.1, 0.02), 288.15, 10_000, 42);
    }

    @Benchmark
    @OutputTimeUnit(TimeUnit.MICROSECONDS)
    public DetailedResult detailedDesign() {
        return solver.solve(detailed, coolingCase, DriveLimits.NONE);
    }

    @Benchmark
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    public ToleranceResult tolerance10000() {
        return analysis.run(tolerance);
    }

    @Benchmark
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    public Object ratingsFit() {
        return new RatingsFit().fit(ratings, MaterialSet.BI2TE3_COUPLE_AVERAGE);
    }
}
