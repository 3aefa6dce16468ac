package org.chillwright.approval;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Map;
import org.flywaydb.core.Flyway;
import org.junit.jupiter.api.Test;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.jdbc.datasource.SingleConnectionDataSource;

/**
 * Migration V23 on a database that already holds entries: each entry's qualifier is taken from the
 * audit trail (the last move to QUALIFYING, not a commercial note made while qualifying), the four-eyes
 * rule starts on, and the audit rows written before stay as they were.
 */
class FourEyesMigrationTest {

    private static final String AT = "TIMESTAMP WITH TIME ZONE '2026-03-02 09:00:00+00'";

    @Test
    void entriesThatWereQualifiedBeforeTheUpgradeKnowTheirQualifier() {
        // one connection throughout, as the application's pool keeps them open
        var dataSource = new SingleConnectionDataSource("jdbc:h2:mem:four-eyes-" + System.nanoTime(), "sa", "", true);
        Flyway before = Flyway.configure().dataSource(dataSource)
                .locations("classpath:db/migration", "classpath:db/vendor/h2").target("21").load(); // V22 is PostgreSQL-only
        before.migrate();
        var jdbc = new JdbcTemplate(dataSource);
        jdbc.update("INSERT INTO approved_list (id, name, created_by, created_at, changed_by, changed_at, version) "
                + "VALUES (1, 'Line', 'ana', " + AT + ", 'ana', " + AT + ", 0)");
        String entry = "INSERT INTO list_entry (id, list_id, module_id, state, proposed_by, proposed_at, changed_by, "
                + "changed_at, version) VALUES (%d, 1, %d, '%s', 'ana', " + AT + ", 'ana', " + AT + ", 0)";
        jdbc.update(entry.formatted(1, 101, "QUALIFYING"));
        jdbc.update(entry.formatted(2, 102, "PROPOSED"));
        String line = "INSERT INTO list_audit (list_id, entry_id, occurred_at, actor, action, from_state, to_state, reason) "
                + "VALUES (1, ?, " + AT + ", ?, ?, ?, ?, 'r')";
        jdbc.update(line, 1, "ana", "PROPOSED", null, "PROPOSED");
        jdbc.update(line, 1, "ben", "TRANSITION", "PROPOSED", "QUALIFYING");
        jdbc.update(line, 1, "carl", "TRANSITION", "QUALIFYING", "PROPOSED");
        jdbc.update(line, 1, "dora", "TRANSITION", "PROPOSED", "QUALIFYING");
        jdbc.update(line, 1, "erik", "COMMERCIAL_NOTE", "QUALIFYING", "QUALIFYING");
        jdbc.update(line, 2, "ana", "PROPOSED", null, "PROPOSED");

        Flyway.configure().dataSource(dataSource).locations("classpath:db/migration", "classpath:db/vendor/h2").load()
                .migrate();

        assertThat(jdbc.queryForList("SELECT id, qualified_by FROM list_entry ORDER BY id")).containsExactly(
                Map.of("ID", 1L, "QUALIFIED_BY", "dora"), nullQualifier(2L));
        assertThat(jdbc.queryForObject("SELECT four_eyes_approval FROM team_settings WHERE id = 1", Boolean.class))
                .isTrue();
        assertThat(jdbc.queryForObject("SELECT count(*) FROM list_audit WHERE proposed_by IS NULL", Integer.class))
                .isEqualTo(6);
        dataSource.destroy();
    }

    private static Map<String, Object> nullQualifier(long id) {
        var row = new java.util.HashMap<String, Object>();
        row.put("ID", id);
        row.put("QUALIFIED_BY", null);
        return row;
    }
}
