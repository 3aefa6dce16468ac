package org.chillwright.approval;

import java.time.Instant;

/**
 * One audit line as the API and the page show it: who did what to which entry, when and why.
 *
 * @param from null for the proposal that created the entry
 * @param action {@code PROPOSED}, {@code TRANSITION} or {@code COMMERCIAL_NOTE}
 */
public record AuditView(Instant at, String by, Long entryId, EntryState from, EntryState to, String reason,
        String action) {
}
