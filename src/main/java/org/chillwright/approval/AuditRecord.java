package org.chillwright.approval;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import java.time.Instant;
import org.hibernate.annotations.Immutable;

/** One line of the audit trail. Written once, never changed: no setters, and Hibernate treats it as read-only. */
@Entity
@Immutable
@Table(name = "list_audit")
class AuditRecord {

    /** What kind of change a row records. */
    enum Action { PROPOSED, TRANSITION, COMMERCIAL_NOTE }

    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    private Long id;

    @Column(name = "list_id", nullable = false)
    private long listId;

    @Column(name = "entry_id")
    private Long entryId;

    @Column(name = "occurred_at", nullable = false)
    private Instant occurredAt;

    @Column(nullable = false, length = 64)
    private String actor;

    @Enumerated(EnumType.STRING)
    @Column(nullable = false, length = 24)
    private Action action;

    @Enumerated(EnumType.STRING)
    @Column(name = "from_state", length = 16)
    private EntryState fromState;

    @Enumerated(EnumType.STRING)
    @Column(name = "to_state", length = 16)
    private EntryState toState;

    @Column(nullable = false, length = 2000)
    private String reason;

    /** On an approval: the entry's proposer, so the line shows both people. */
    @Column(name = "proposed_by", length = 64)
    private String proposedBy;

    /** On an approval: who moved the entry to QUALIFYING. */
    @Column(name = "qualified_by", length = 64)
    private String qualifiedBy;

    protected AuditRecord() {
    }

    AuditRecord(ListEntry entry, Action action, EntryState from, String actor, Instant at, String reason) {
        this.listId = entry.getListId();
        this.entryId = entry.getId();
        this.action = action;
        this.fromState = from;
        this.toState = entry.getState();
        this.actor = actor;
        this.occurredAt = at;
        this.reason = reason;
        if (action == Action.TRANSITION && entry.getState() == EntryState.APPROVED) {
            this.proposedBy = entry.getProposedBy();
            this.qualifiedBy = entry.getQualifiedBy();
        }
    }

    AuditView view() {
        return new AuditView(occurredAt, actor, entryId, fromState, toState, reason, action.name(), proposedBy,
                qualifiedBy);
    }
}
