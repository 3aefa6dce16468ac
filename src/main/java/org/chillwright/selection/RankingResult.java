package org.chillwright.selection;

import java.util.List;
import org.chillwright.physics.HeatingCheck;

/**
 * A ranking with the catalog facts a person needs beside each design.
 *
 * @param catalogRevision the catalog state the ranking used
 */
public record RankingResult(List<Row> candidates, List<Refusal> infeasible, int feasible, int evaluated,
                            long elapsedNanos, long catalogRevision) {

    public RankingResult {
        candidates = List.copyOf(candidates);
        infeasible = List.copyOf(infeasible);
    }

    public double elapsedMs() {
        return elapsedNanos / 1e6;
    }

    /**
     * A ranked design and its module's identity.
     *
     * @param heating the heating check on the coldest day, or null when none was asked for
     */
    public record Row(Ranking.Candidate design, String supplier, String partNumber, String lifecycle,
                      String currency, HeatingCheck.Result heating) {
    }

    /**
     * A module with no design that works, and why, with the capacity at the set-point of the design named
     * (see {@link Ranking.Rejection}).
     */
    public record Refusal(long moduleId, String supplier, String partNumber, String code, String message,
                          int seriesCount, int parallelCount, double maxHeatLoadW, double currentAtMaxHeatLoadA) {
    }
}
