package org.chillwright.approval.api;

import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Pattern;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.Size;
import org.chillwright.approval.Text;

/** {@code POST /api/v1/lists/{id}/entries}: a catalog module proposed for the list. */
public record ProposeEntryRequest(
        @NotNull @Positive Long moduleId,
        @Size(max = Text.NOTE_MAX) @Pattern(regexp = Text.LINES, message = Text.BINARY_MESSAGE) String note) {
}
