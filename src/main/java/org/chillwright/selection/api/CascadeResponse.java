package org.chillwright.selection.api;

import java.util.List;

/** A two-stage cascade's point; figures are null when it is infeasible. */
public record CascadeResponse(
        boolean feasible,
        OperatingPointResponse.ReasonJson reason,
        Double interstageC,
        Double heatLoadW,
        Double currentA,
        List<Double> stageCurrentsA,
        Double powerW,
        Double cop,
        Double coldStageCop,
        Double hotStageCop,
        Double heatRejectedW) {
}
