package org.chillwright.selection.api;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.PositiveOrZero;
import org.chillwright.catalog.ModuleInput;

/**
 * {@code POST /api/v1/cascade/operating-point}: two stages, cold first, between fixed face temperatures.
 * Either both stage currents, or a heat load with one current through both stages.
 */
public record CascadeRequest(
        @NotNull @Valid Stage coldStage,
        @NotNull @Valid Stage hotStage,
        @NotNull @DecimalMin(value = "-273.15", inclusive = false) @DecimalMax("400") Double coldSideC,
        @NotNull @DecimalMin(value = "-273.15", inclusive = false) @DecimalMax("400") Double hotSideC,
        @PositiveOrZero Double coldStageCurrentA,
        @PositiveOrZero Double hotStageCurrentA,
        @PositiveOrZero Double heatLoadW) {

    /** One stage: a module and how many of it, wired series × parallel on common plates. */
    public record Stage(@NotNull @Valid ModuleInput module, @Min(1) @Max(64) Integer seriesCount,
                        @Min(1) @Max(64) Integer parallelCount) {
    }
}
