package org.chillwright.selection.api;

import java.util.List;

/**
 * The whole array's operating point, SI with °C. Figures that do not exist (a COP with no power
 * drawn, a fraction of Imax with no rating) are null.
 */
public record OperatingPointResponse(
        boolean feasible,
        ReasonJson reason,
        Double currentA,
        Double voltageV,
        Double powerW,
        Double cop,
        Double setPointC,
        Double coldSideC,
        Double hotSideC,
        Double heatLoadW,
        Double heatRejectedW,
        Double fractionOfImax,
        Double maxHeatLoadW,
        Double currentAtMaxHeatLoadA,
        Double loadMarginPct,
        Double marginK,
        Double copOptimalCurrentA,
        Double maxCop,
        Double dewPointC,
        Double frostPointC,
        List<WarningJson> warnings,
        PerModule perModule,
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
