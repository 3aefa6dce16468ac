package org.chillwright.approval;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;

@Entity
@Table(name = "list_entry")
class ListEntry {

    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    private Long id;

    @Column(name = "list_id", nullable = false)
    private long listId;

    @Column(name = "module_id", nullable = false)
    private long moduleId;

    @Enumerated(EnumType.STRING)
    @Column(nullable = false, length = 16)
    private EntryState state;

    @Column(length = 2000)
    private String note;

    @Column(name = "commercial_note", length = 2000)
    private String commercialNote;

    @Column(name = "replaced_by_entry_id")
    private Long replacedByEntryId;

    @Column(name = "proposed_by", nullable = false, length = 64)
    private String proposedBy;

    @Column(name = "proposed_at", nullable = false)
    private Instant proposedAt;

    /** Who last moved the entry to QUALIFYING; null until someone has. */
    @Column(name = "qualified_by", length = 64)
    private String qualifiedBy;

    @Column(name = "changed_by", nullable = false, length = 64)
    private String changedBy;

    @Column(name = "changed_at", nullable = false)
    private Instant changedAt;

    @Version
    private long version;

    protected ListEntry() {
    }

    ListEntry(long listId, long moduleId, String note, String by, Instant at) {
        this.listId = listId;
        this.moduleId = moduleId;
        this.state = EntryState.PROPOSED;
        this.note = note;
        this.proposedBy = by;
        this.proposedAt = at;
        this.changedBy = by;
        this.changedAt = at;
    }

    void moveTo(EntryState to, Long replacedBy, String by, Instant at) {
        this.state = to;
        this.replacedByEntryId = replacedBy;
        if (to == EntryState.QUALIFYING) {
            this.qualifiedBy = by;
        }
        touch(by, at);
    }

    void annotate(String commercialNote, String by, Instant at) {
        this.commercialNote = commercialNote;
        touch(by, at);
    }

    private void touch(String by, Instant at) {
        this.changedBy = by;
        this.changedAt = at;
    }

    Long getId() {
        return id;
    }

    long getListId() {
        return listId;
    }

    long getModuleId() {
        return moduleId;
    }

    EntryState getState() {
        return state;
    }

    String getNote() {
        return note;
    }

    String getCommercialNote() {
        return commercialNote;
    }

    Long getReplacedByEntryId() {
        return replacedByEntryId;
    }

    String getProposedBy() {
        return proposedBy;
    }

    Instant getProposedAt() {
        return proposedAt;
    }

    String getQualifiedBy() {
        return qualifiedBy;
    }

    String getChangedBy() {
        return changedBy;
    }

    Instant getChangedAt() {
        return changedAt;
    }

    long getVersion() {
        return version;
    }
}
