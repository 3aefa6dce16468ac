package org.chillwright.selection.api;

import com.fasterxml.jackson.annotation.JsonUnwrapped;
import java.util.List;

/** The ranked designs, the modules that cannot do the job with their reasons, and what it took. */
public record RankingResponse(List<Candidate> candidates, List<Refused> infeasible, int feasible, int evaluated,
                              double elapsedMs, long catalogRevision) {

    /** One design with its operating point fields alongside (currentA, cop, hotSideC, ...). */
    public record Candidate(int rank, long moduleId, String partNumber, String supplier, String lifecycle,
                            Double unitPrice, Double arrayCost, String currency, boolean paretoFront,
                            Double requiredSinkKPerW, Heating heating, @JsonUnwrapped OperatingPointResponse point) {
    }

    /**
     * The heating check on the coldest day (current reversed).
     *
     * @param heatNeededW heat the object must get from the module, W (negative: it still runs warm)
     */
    public record Heating(boolean needsHeating, boolean reachable, boolean withinLimits, Double currentA,
                          Double voltageV, Double powerW, Double copHeating, double heatNeededW) {
    }

    /**
     * A module that has no design that works: the reason, the design it names, and that design's capacity at the
     * set-point ({@code maxHeatLoadW}, {@code currentAtMaxHeatLoadA}; null when not known), so a script sees how
     * far off it is.
     */
    public record Refused(long moduleId, String partNumber, String supplier, OperatingPointResponse.ReasonJson reason,
                          int seriesCount, int parallelCount, Double maxHeatLoadW, Double currentAtMaxHeatLoadA) {
    }
}
