package org.chillwright.selection.api;

import com.fasterxml.jackson.annotation.JsonUnwrapped;
import java.util.List;

/** The ranked designs, the modules that cannot do the job with their reasons, and what it took. */
public record RankingResponse(List<Candidate> candidates, List<Refused> infeasible, int feasible, int evaluated,
                              double elapsedMs, long catalogRevision) {

    /** One design with its operating point fields alongside (currentA, cop, hotSideC, ...). */
    public record Candidate(int rank, long moduleId, String partNumber, String supplier, String lifecycle,
                            Double unitPrice, Double arrayCost, String currency, boolean paretoFront,
                            Double requiredSinkKPerW, @JsonUnwrapped OperatingPointResponse point) {
    }

    /** A module that has no design that works. */
    public record Refused(long moduleId, String partNumber, String supplier, OperatingPointResponse.ReasonJson reason) {
    }
}
