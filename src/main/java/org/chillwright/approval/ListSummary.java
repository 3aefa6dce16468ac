package org.chillwright.approval;

import jakarta.annotation.Nullable;
import java.time.Instant;

/** One line of the lists index. */
public record ListSummary(long id, String name, @Nullable String description, int entryCount, int approvedCount,
        Instant changedAt) {
}
