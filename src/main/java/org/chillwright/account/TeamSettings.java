package org.chillwright.account;

import java.time.Clock;
import org.chillwright.web.StaleEditException;
import org.springframework.dao.ConcurrencyFailureException;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Settings that apply to the whole team, kept in the database so every instance reads the same, and
 * changed only by administrators. Each change is a line of the {@link AccountAudit account audit trail}.
 */
@Service
public class TeamSettings {

    /** How the four-eyes setting is named in the audit trail. */
    public static final String FOUR_EYES = "four-eyes approval";

    private final TeamSettingsRepository rows;
    private final AccountAudit audit;
    private final Clock clock;

    TeamSettings(TeamSettingsRepository rows, AccountAudit audit, Clock clock) {
        this.rows = rows;
        this.audit = audit;
        this.clock = clock;
    }

    @Transactional(readOnly = true)
    public TeamSettingsView current() {
        return row().view();
    }

    /** Whether approvals need a second person: on unless the team has relaxed it. */
    @Transactional(readOnly = true)
    public boolean fourEyesApproval() {
        return row().isFourEyesApproval();
    }

    /**
     * Turns the four-eyes rule on or off, if nobody changed the settings since {@code version}.
     *
     * @throws StaleEditException when the stored version differs
     */
    @Transactional
    public TeamSettingsView setFourEyesApproval(boolean on, long version, String actingUsername) {
        var row = row();
        if (row.getVersion() != version) {
            throw new StaleEditException("team settings", TeamSettingsRow.ID, version, row.getVersion());
        }
        boolean before = row.isFourEyesApproval();
        if (before == on) {
            return row.view();
        }
        row.setFourEyesApproval(on, actingUsername, clock.instant());
        try {
            row = rows.saveAndFlush(row);
        } catch (ConcurrencyFailureException concurrent) {
            throw new StaleEditException("team settings", TeamSettingsRow.ID, version, version + 1);
        }
        audit.record(actingUsername, AccountEvent.SETTING_CHANGED, FOUR_EYES, onOff(before) + " → " + onOff(on)
                + (on ? "" : ": one person may now propose, qualify and approve the same entry"));
        return row.view();
    }

    private TeamSettingsRow row() {
        return rows.findById(TeamSettingsRow.ID)
                .orElseThrow(() -> new IllegalStateException("team_settings has no row " + TeamSettingsRow.ID));
    }

    private static String onOff(boolean on) {
        return on ? "on" : "off";
    }
}
