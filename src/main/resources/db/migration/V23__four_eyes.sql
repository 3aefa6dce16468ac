-- Four eyes on every approval: an entry cannot be approved by the account that proposed it nor by the
-- one that sent it to qualification. The team may relax the rule (team_settings, one row); changing it
-- is recorded in account_audit.
CREATE TABLE team_settings (
    id                  INTEGER     NOT NULL PRIMARY KEY,
    four_eyes_approval  BOOLEAN     NOT NULL,
    changed_by          VARCHAR(64) NOT NULL,
    changed_at          TIMESTAMP WITH TIME ZONE NOT NULL,
    version             BIGINT      NOT NULL
);
INSERT INTO team_settings (id, four_eyes_approval, changed_by, changed_at, version)
    VALUES (1, TRUE, 'system', CURRENT_TIMESTAMP, 0);

-- Who last moved each entry to QUALIFYING, taken from the audit trail for entries that already got there.
ALTER TABLE list_entry ADD COLUMN qualified_by VARCHAR(64);
UPDATE list_entry SET qualified_by = (
    SELECT a.actor FROM list_audit a WHERE a.id = (
        SELECT MAX(b.id) FROM list_audit b
        WHERE b.entry_id = list_entry.id AND b.action = 'TRANSITION' AND b.to_state = 'QUALIFYING'));

-- An approval line names the proposer and the qualifier beside the approver, so it stands on its own.
-- Adding columns fires no row trigger: the append-only rule of V12 is untouched, and old lines stay as written.
ALTER TABLE list_audit ADD COLUMN proposed_by VARCHAR(64);
ALTER TABLE list_audit ADD COLUMN qualified_by VARCHAR(64);
