package org.chillwright.account;

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

/** One line of the account audit trail. Written once, never changed: no setters, and Hibernate treats it as read-only. */
@Entity
@Immutable
@Table(name = "account_audit")
class AccountAuditRecord {

    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    private Long id;

    @Column(name = "occurred_at", nullable = false)
    private Instant occurredAt;

    @Column(nullable = false, length = 64)
    private String actor;

    @Enumerated(EnumType.STRING)
    @Column(name = "event_type", nullable = false, length = 32)
    private AccountEvent event;

    @Column(nullable = false, length = 64)
    private String subject;

    @Column(nullable = false, length = 2000)
    private String detail;

    protected AccountAuditRecord() {
    }

    AccountAuditRecord(Instant at, String actor, AccountEvent event, String subject, String detail) {
        this.occurredAt = at;
        this.actor = actor;
        this.event = event;
        this.subject = subject;
        this.detail = detail;
    }

    AccountAuditView view() {
        return new AccountAuditView(occurredAt, actor, event, subject, detail);
    }
}
