package org.chillwright.approval;

import java.time.Instant;

/** One line of the lists index. */
public record ListSummary(long id, String name, String description, int entryCount, int approvedCount,
        Instant changedAt) {
}
