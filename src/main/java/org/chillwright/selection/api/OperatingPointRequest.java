package org.chillwright.selection.api;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.PositiveOrZero;
import org.chillwright.catalog.ModuleInput;

/**
 * {@code POST /api/v1/operating-point}: one module or array against one cooling case. Without
 * {@code currentA} or {@code voltageV} the load is solved at {@code setPointC}; with one of them the
 * object temperature reached at that drive is reported.
 */
public record OperatingPointRequest(
        @NotNull @Valid ModuleInput module,
        @Min(1) @Max(64) Integer seriesCount,
        @Min(1) @Max(64) Integer parallelCount,
        @DecimalMin(value = "-273.15", inclusive = false) @DecimalMax("400") Double setPointC,
        @NotNull @DecimalMin(value = "-273.15", inclusive = false) @DecimalMax("400") Double ambientC,
        @NotNull @PositiveOrZero Double heatLoadW,
        @NotNull @PositiveOrZero Double sinkResistanceKPerW,
        @PositiveOrZero Double coldInterfaceKPerW,
        @PositiveOrZero Double hotInterfaceKPerW,
        @PositiveOrZero Double currentA,
        @Positive Double voltageV,
        @Positive Double supplyMaxV,
        @Positive Double supplyMaxA,
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100") Double relativeHumidityPct) {
}
