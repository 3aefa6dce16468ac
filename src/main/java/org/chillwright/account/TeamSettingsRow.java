package org.chillwright.account;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;

/** The one row of team-wide settings (id 1, made by migration V23). */
@Entity
@Table(name = "team_settings")
class TeamSettingsRow {

    static final int ID = 1;

    @Id
    private Integer id;

    @Column(name = "four_eyes_approval", nullable = false)
    private boolean fourEyesApproval;

    @Column(name = "changed_by", nullable = false, length = 64)
    private String changedBy;

    @Column(name = "changed_at", nullable = false)
    private Instant changedAt;

    @Version
    private long version;

    protected TeamSettingsRow() {
    }

    void setFourEyesApproval(boolean on, String by, Instant at) {
        this.fourEyesApproval = on;
        this.changedBy = by;
        this.changedAt = at;
    }

    TeamSettingsView view() {
        return new TeamSettingsView(fourEyesApproval, version, changedBy, changedAt);
    }

    boolean isFourEyesApproval() {
        return fourEyesApproval;
    }

    long getVersion() {
        return version;
    }
}
