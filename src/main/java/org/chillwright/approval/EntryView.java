package org.chillwright.approval;

import jakarta.annotation.Nullable;
import java.time.Instant;

/**
 * One module on a list. {@code supplier}, {@code partNumber} and {@code lifecycle} come from the
 * catalog and are null when it no longer knows the module. Send {@code version} back with a transition.
 *
 * @param qualifiedBy who last moved the entry to QUALIFYING, or null when nobody has yet
 */
public record EntryView(long id, long version, long moduleId, @Nullable String supplier, @Nullable String partNumber,
        @Nullable String lifecycle, EntryState state, @Nullable String note, @Nullable String commercialNote,
        @Nullable Long replacedByEntryId, String proposedBy, Instant proposedAt, String changedBy, Instant changedAt,
        @Nullable String qualifiedBy) {
}
