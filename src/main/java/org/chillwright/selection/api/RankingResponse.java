package org.chillwright.selection.api;

import com.fasterxml.jackson.annotation.JsonUnwrapped;
import jakarta.annotation.Nullable;
import java.util.List;

/** The ranked designs, the modules that cannot do the job with their reasons, and what it took. */
public record RankingResponse(List<Candidate> candidates, List<Refused> infeasible, int feasible, int evaluated,
                              double elapsedMs, long catalogRevision) {

    /** One design with its operating point fields alongside (currentA, cop, hotSideC, ...). */
    public record Candidate(int rank, long moduleId, String partNumber, String supplier, String lifecycle,
                            @Nullable Double unitPrice, @Nullable Double arrayCost, @Nullable String currency,
                            boolean paretoFront, @Nullable Double requiredSinkKPerW, @Nullable Heating heating,
                            @JsonUnwrapped OperatingPointResponse point) {
    }

    /**
     * The heating check on the coldest day (current reversed).
     *
     * @param heatNeededW heat the object must get from the module, W (negative: it still runs warm)
     */
    public record Heating(boolean needsHeating, boolean reachable, boolean withinLimits,
                          @Nullable Double currentA, @Nullable Double voltageV, @Nullable Double powerW,
                          @Nullable Double copHeating, double heatNeededW) {
    }

    /**
     * A module that has no design that works: the reason, the design it names, and that design's capacity at the
     * set-point ({@code maxHeatLoadW}, {@code currentAtMaxHeatLoadA}; null when not known), so a script sees how
     * far off it is.
     */
    public record Refused(long moduleId, String partNumber, String supplier, OperatingPointResponse.ReasonJson reason,
                          int seriesCount, int parallelCount, @Nullable Double maxHeatLoadW,
                          @Nullable Double currentAtMaxHeatLoadA) {
    }
}
