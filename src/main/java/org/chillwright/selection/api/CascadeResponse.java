package org.chillwright.selection.api;

import jakarta.annotation.Nullable;
import java.util.List;

/** A two-stage cascade's point; figures are null when it is infeasible. */
public record CascadeResponse(
        boolean feasible,
        @Nullable OperatingPointResponse.ReasonJson reason,
        @Nullable Double interstageC,
        @Nullable Double heatLoadW,
        @Nullable Double currentA,
        List<Double> stageCurrentsA,
        @Nullable Double powerW,
        @Nullable Double cop,
        @Nullable Double coldStageCop,
        @Nullable Double hotStageCop,
        @Nullable Double heatRejectedW) {
}
