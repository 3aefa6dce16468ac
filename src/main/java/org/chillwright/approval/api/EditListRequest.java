package org.chillwright.approval.api;

import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Pattern;
import jakarta.validation.constraints.Size;
import org.chillwright.approval.Text;

/** {@code PUT /api/v1/lists/{id}}: {@code version} is the one read, so a change made meanwhile is not overwritten. */
public record EditListRequest(
        @NotBlank @Size(max = Text.NAME_MAX) @Pattern(regexp = Text.LINE, message = Text.BINARY_MESSAGE) String name,
        @Size(max = Text.NOTE_MAX) @Pattern(regexp = Text.LINES, message = Text.BINARY_MESSAGE) String description,
        @NotNull Long version) {
}
