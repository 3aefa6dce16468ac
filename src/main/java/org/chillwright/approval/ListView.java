package org.chillwright.approval;

import jakarta.annotation.Nullable;
import java.time.Instant;
import java.util.List;

/** An approved list with its entries. Send {@code version} back with an edit. */
public record ListView(long id, long version, String name, @Nullable String description, String createdBy,
        Instant createdAt, String changedBy, Instant changedAt, List<EntryView> entries) {
}
