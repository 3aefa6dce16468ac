package org.chillwright.approval.api;

import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Pattern;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.Size;
import org.chillwright.approval.EntryState;
import org.chillwright.approval.Text;

/**
 * {@code POST /api/v1/lists/{id}/entries/{entryId}/transitions}. {@code version} (optional) is the
 * entry version acted on; {@code replacedByEntryId} (optional) names the successor of an entry made OBSOLETE.
 */
public record TransitionRequest(
        @NotNull EntryState to,
        @NotBlank @Size(max = Text.NOTE_MAX) @Pattern(regexp = Text.LINES, message = Text.BINARY_MESSAGE) String reason,
        Long version,
        @Positive Long replacedByEntryId) {
}
