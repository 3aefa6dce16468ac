package org.chillwright.harvest;

import java.util.List;

/**
 * Result of ranking generator designs against a harvest case.
 *
 * @param candidates   the best designs in order
 * @param infeasible   modules with no design that works, each with its reason
 * @param feasible     how many designs (module × split) work and pass the filters
 * @param evaluated    how many designs were solved
 * @param elapsedNanos time spent ranking
 */
public record HarvestRanking(List<Candidate> candidates, List<Rejection> infeasible, int feasible, int evaluated,
                             long elapsedNanos) {

    /** Module hot face above its stated maximum operating temperature in every design tried. */
    public static final String HOT_SIDE_ABOVE_LIMIT = "HOT_SIDE_ABOVE_LIMIT";
    /** No design reaches the required voltage at its best-power load. */
    public static final String BELOW_MIN_VOLTAGE = "BELOW_MIN_VOLTAGE";

    public HarvestRanking {
        candidates = List.copyOf(candidates);
        infeasible = List.copyOf(infeasible);
    }

    /** A ranked design. */
    public record Candidate(int rank, HarvestDesign design) {
    }

    /** Why a module is not among the candidates: a stable code and a sentence with the numbers. */
    public record Rejection(long moduleId, String code, String message) {
    }
}
