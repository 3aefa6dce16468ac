package org.chillwright.selection;

import java.util.List;
import org.chillwright.physics.Solved;

/**
 * Result of ranking a catalog against a case.
 *
 * @param candidates   the best designs in order, in full detail
 * @param infeasible   modules with no design that works, each with its reason
 * @param feasible     how many designs (module × configuration) work and pass the filters
 * @param evaluated    how many designs were solved
 * @param elapsedNanos server time spent ranking
 */
public record Ranking(List<Candidate> candidates, List<Rejection> infeasible, int feasible, int evaluated,
                      long elapsedNanos) {

    public Ranking {
        candidates = List.copyOf(candidates);
        infeasible = List.copyOf(infeasible);
    }

    /**
     * One design: {@code seriesCount × parallelCount} of one module.
     *
     * @param unitPrice         price of one module at the build quantity, NaN when unknown
     * @param arrayCost         modules × unit price, NaN when unknown
     * @param paretoFront       no other feasible design has both a higher COP and a lower cost
     * @param requiredSinkKPerW in sizing mode, the heat-sink resistance this design needs; else NaN
     */
    public record Candidate(int rank, long moduleId, int seriesCount, int parallelCount, Solved point,
                            double unitPrice, double arrayCost, boolean paretoFront, double requiredSinkKPerW) {

        public int moduleCount() {
            return seriesCount * parallelCount;
        }
    }

    /**
     * Why a module is not among the candidates: a stable code and a sentence with the numbers, for the design
     * the sentence names, with that design's capacity at the set-point.
     *
     * @param seriesCount           modules in series in the design named
     * @param parallelCount         strings in parallel in the design named
     * @param maxHeatLoadW          most heat that design can remove at the set-point with this heat sink, W
     * @param currentAtMaxHeatLoadA current at that most heat, A
     */
    public record Rejection(long moduleId, String code, String message, int seriesCount, int parallelCount,
                            double maxHeatLoadW, double currentAtMaxHeatLoadA) {
    }
}
