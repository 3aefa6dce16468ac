package org.chillwright.selection.api;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotNull;
import org.chillwright.catalog.ModuleInput;

/** {@code POST /api/v1/derive}: a module, and optionally the hot side at which to restate its ideal ratings. */
public record DeriveRequest(
        @NotNull @Valid ModuleInput module,
        @DecimalMin(value = "-273.15", inclusive = false) @DecimalMax("400") Double atHotSideC) {
}
