package org.chillwright.selection;

import static org.assertj.core.api.Assertions.assertThat;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.chillwright.physics.CoolingCase;
import org.chillwright.physics.DriveLimits;
import org.chillwright.physics.ModuleArray;
import org.chillwright.physics.ModuleParameters;
import org.chillwright.physics.OperatingPointSolver;
import org.chillwright.physics.Solved;

/** The ranking's two passes agree, and what it returns is what the full solver says. */
class RankingEngineProperties {

    private final RankingEngine engine = new RankingEngine();
    private final OperatingPointSolver solver = new OperatingPointSolver();

    @Property(tries = 200)
    void everyRankedDesignIsTheFullSolversPointWithinItsLimits(
            @ForAll @DoubleRange(min = 0.02, max = 0.06) double seebeckVPerK,
            @ForAll @DoubleRange(min = 0.5, max = 6) double resistanceOhm,
            @ForAll @DoubleRange(min = 0.1, max = 1.0) double conductanceWPerK,
            @ForAll @DoubleRange(min = 0.5, max = 15) double heatLoadW,
            @ForAll @DoubleRange(min = 0.05, max = 1.0) double sinkResistanceKPerW,
            @ForAll @DoubleRange(min = 2, max = 30) double supplyMaxV) {
        double imaxA = 0.8 * seebeckVPerK * 300 / resistanceOhm;
        var table = new CandidateTable(new long[] {7}, new double[] {seebeckVPerK}, new double[] {resistanceOhm},
                new double[] {conductanceWPerK}, new double[] {imaxA}, new double[] {70}, new double[] {Double.NaN},
                CandidateTable.PriceBook.NONE);
        var coolingCase = new CoolingCase(288.15, 308.15, heatLoadW, sinkResistanceKPerW, 0.05, 0.05);
        var rankingCase = new RankingCase(coolingCase, Double.NaN, supplyMaxV, Double.NaN, 4, Objective.COP, 0, 1, 1, 50);
        var ranking = engine.rank(table, rankingCase);
        assertThat(ranking.candidates().size() + ranking.infeasible().size()).isPositive();
        for (var candidate : ranking.candidates()) {
            var array = new ModuleArray(new ModuleParameters(seebeckVPerK, resistanceOhm, conductanceWPerK),
                    candidate.seriesCount(), candidate.parallelCount());
            var limits = new DriveLimits(imaxA * candidate.parallelCount(), supplyMaxV, Double.NaN, Double.NaN);
            var point = solver.solve(array, coolingCase, limits);
            assertThat(point).isInstanceOf(Solved.class);
            assertThat(((Solved) point).currentA()).isEqualTo(candidate.point().currentA());
            assertThat(candidate.point().currentA()).isLessThanOrEqualTo(imaxA * candidate.parallelCount());
            assertThat(candidate.point().voltageV()).isLessThanOrEqualTo(supplyMaxV);
        }
    }
}
