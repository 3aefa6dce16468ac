package org.chillwright.selection.api;

import jakarta.annotation.Nullable;
import java.util.List;

/**
 * The whole array's operating point, SI with °C. Figures that do not exist (a COP with no power
 * drawn, a fraction of Imax with no rating) are null.
 */
public record OperatingPointResponse(
        boolean feasible,
        @Nullable ReasonJson reason,
        @Nullable Double currentA,
        @Nullable Double voltageV,
        @Nullable Double powerW,
        @Nullable Double cop,
        @Nullable Double setPointC,
        @Nullable Double coldSideC,
        @Nullable Double hotSideC,
        @Nullable Double heatLoadW,
        @Nullable Double heatRejectedW,
        @Nullable Double fractionOfImax,
        @Nullable Double maxHeatLoadW,
        @Nullable Double currentAtMaxHeatLoadA,
        @Nullable Double loadMarginPct,
        @Nullable Double marginK,
        @Nullable Double copOptimalCurrentA,
        @Nullable Double maxCop,
        @Nullable Double dewPointC,
        @Nullable Double frostPointC,
        List<WarningJson> warnings,
        @Nullable PerModule perModule,
        int seriesCount,
        int parallelCount) {

    /** Why a design cannot work: a stable code and a sentence with the numbers. */
    public record ReasonJson(String code, String message) {
    }

    /** A risk on a solved point: a stable code and a sentence. */
    public record WarningJson(String code, String message) {
    }

    /** What one module of the array carries. */
    public record PerModule(Double currentA, Double voltageV, Double heatLoadW, Double heatRejectedW, Double powerW) {
    }
}
