package org.chillwright.approval;

import jakarta.annotation.Nullable;
import java.time.Instant;

/**
 * One audit line as the API and the page show it: who did what to which entry, when and why.
 *
 * @param from null for the proposal that created the entry
 * @param action {@code PROPOSED}, {@code TRANSITION} or {@code COMMERCIAL_NOTE}
 * @param proposedBy on an approval, who had proposed the entry (null on other lines and on approvals
 *        recorded before approvals named them)
 * @param qualifiedBy on an approval, who had moved the entry to QUALIFYING
 */
public record AuditView(Instant at, String by, @Nullable Long entryId, @Nullable EntryState from,
        @Nullable EntryState to, String reason, String action, @Nullable String proposedBy,
        @Nullable String qualifiedBy) {

    /** Whether this line is an approval by someone other than its proposer and its qualifier. */
    public boolean independentApproval() {
        return to == EntryState.APPROVED && proposedBy != null && !proposedBy.equals(by) && !by.equals(qualifiedBy);
    }
}
