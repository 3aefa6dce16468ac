package org.chillwright.selection.api;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.PositiveOrZero;
import org.chillwright.catalog.ModuleInput;

/** {@code POST /api/v1/cooldown}: a lumped object on the cold face at constant current and hot side. */
public record CooldownRequest(
        @NotNull @Valid ModuleInput module,
        @NotNull @PositiveOrZero Double currentA,
        @NotNull @DecimalMin(value = "-273.15", inclusive = false) @DecimalMax("400") Double hotSideC,
        @NotNull @Positive Double heatCapacityJPerK,
        @NotNull @PositiveOrZero Double heatLoadW,
        @NotNull @DecimalMin(value = "-273.15", inclusive = false) @DecimalMax("400") Double ambientC,
        @NotNull @Positive Double leakResistanceKPerW,
        @NotNull @DecimalMin(value = "-273.15", inclusive = false) @DecimalMax("400") Double startC,
        @NotNull @PositiveOrZero @DecimalMax("1e7") Double timeS,
        @DecimalMin(value = "-273.15", inclusive = false) @DecimalMax("400") Double targetC) {
}
