package org.chillwright.harvest;

import java.util.List;

/**
 * A harvest ranking with the catalog facts a person needs beside each design.
 *
 * @param catalogRevision the catalog state the ranking used
 */
public record HarvestResult(List<Row> candidates, List<Refusal> infeasible, int feasible, int evaluated,
                            long elapsedNanos, long catalogRevision) {

    public HarvestResult {
        candidates = List.copyOf(candidates);
        infeasible = List.copyOf(infeasible);
    }

    public double elapsedMs() {
        return elapsedNanos / 1e6;
    }

    /** A ranked design and its module's identity. */
    public record Row(int rank, HarvestDesign design, String supplier, String partNumber, String lifecycle,
                      String currency) {
    }

    /** A module with no design that works, and why. */
    public record Refusal(long moduleId, String supplier, String partNumber, String code, String message) {
    }
}
