package org.chillwright.bench;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;

import org.chillwright.physics.CoolingCase;
import org.chillwright.physics.DriveLimits;
import org.chillwright.physics.ModuleArray;
import org.chillwright.physics.ModuleParameters;
import org.chillwright.physics.OperatingPoint;
import org.chillwright.physics.OperatingPointSolver;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * Speed of the heat-sink-coupled operating point: one full solve (lower root, capacity, marginK,
 * COP optimum, warnings) and a ranking of 80,000 candidates on the allocation-free path.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
public class PhysicsBenchmark {

    private static final int CANDIDATES = 80_000;

    private final OperatingPointSolver solver = new OperatingPointSolver();
    private ModuleArray array;
    private CoolingCase coolingCase;
    private DriveLimits limits;
    private double[] seebeckVPerK;
    private double[] resistanceOhm;
    private double[] conductanceWPerK;

    @Setup
    public void setUp() {
        array = ModuleArray.single(new ModuleParameters(0.04, 2.4, 0.25)); // synthetic module TM-A
        coolingCase = new CoolingCase(278.15, 298.15, 10, 0.3, 0.1, 0.05);  // the set-up of check case S10
        limits = new DriveLimits(3.8, 15, 6, 353.15);
        // Invented candidates spread around TM-A (a fixed seed keeps runs comparable).
        var random = new SplittableRandom(42);
        seebeckVPerK = new double[CANDIDATES];
        resistanceOhm = new double[CANDIDATES];
        conductanceWPerK = new double[CANDIDATES];
        for (int n = 0; n < CANDIDATES; n++) {
            double scale = 0.3 + 3 * random.nextDouble();
            seebeckVPerK[n] = 0.02 + 0.05 * random.nextDouble();
            resistanceOhm[n] = 2.4 / scale * (0.7 + 0.6 * random.nextDouble());
            conductanceWPerK[n] = 0.25 * scale * (0.7 + 0.6 * random.nextDouble());
        }
    }

    @Benchmark
    @OutputTimeUnit(TimeUnit.NANOSECONDS)
    public OperatingPoint fullSolve() {
        return solver.solve(array, coolingCase, limits);
    }

    /** Best COP over all candidates; the sum of infeasible counts keeps the loop from being elided. */
    @Benchmark
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    public double rankingOf80000() {
        double coldSideK = coolingCase.coldSideAtLoadK();
        double ambientK = coolingCase.ambientK();
        double hotPathKPerW = coolingCase.hotPathKPerW();
        double loadW = coolingCase.heatLoadW();
        double bestCop = 0;
        int infeasible = 0;
        for (int n = 0; n < CANDIDATES; n++) {
            double cop = OperatingPointSolver.copAtLoad(seebeckVPerK[n], resistanceOhm[n], conductanceWPerK[n],
                    coldSideK, ambientK, hotPathKPerW, loadW);
            if (Double.isNaN(cop)) {
                infeasible++;
            } else if (cop > bestCop) {
                bestCop = cop;
            }
        }
        return bestCop + infeasible;
    }
}
