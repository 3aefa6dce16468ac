package org.chillwright.approval.api;

import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Pattern;
import jakarta.validation.constraints.Size;
import org.chillwright.approval.Text;

/** {@code PUT /api/v1/lists/{id}/entries/{entryId}/commercial-note}: second source, price agreement, lead-time risk. */
public record CommercialNoteRequest(
        @NotNull @Size(max = Text.NOTE_MAX) @Pattern(regexp = Text.LINES, message = Text.BINARY_MESSAGE) String commercialNote,
        Long version) {
}
