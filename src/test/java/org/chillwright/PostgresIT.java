package org.chillwright;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.util.EnumSet;
import org.chillwright.account.AccountService;
import org.chillwright.account.Role;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.dao.DataAccessException;
import org.springframework.jdbc.core.JdbcTemplate;

/** The same Flyway migrations run on a real PostgreSQL server, and data round-trips. */
@SpringBootTest
@PostgresDatabase
class PostgresIT {

    @Autowired
    JdbcTemplate jdbc;
    @Autowired
    AccountService accounts;

    @Test
    void runsOnPostgresql() {
        assertThat(jdbc.queryForObject("SELECT version()", String.class)).startsWith("PostgreSQL");
    }

    @Test
    void embeddedServerIsPostgresql16AsInTheComposeFile() {
        assumeFalse(PostgresTestServer.isNamed(), "a named server runs whatever version it has");
        assertThat(jdbc.queryForObject("SHOW server_version", String.class)).startsWith("16.");
    }

    @Test
    void embeddedServerGivesTheApplicationADatabaseOfItsOwnAndNoSuperuserRights() {
        assumeFalse(PostgresTestServer.isNamed(), "a named server's database and role are as given");
        assertThat(jdbc.queryForObject("SELECT current_database()", String.class)).startsWith("chillwright_it_");
        assertThat(jdbc.queryForObject("SELECT rolsuper FROM pg_roles WHERE rolname = current_user", Boolean.class))
                .isFalse();
    }

    @Test
    void everyMigrationApplied() {
        var failed = jdbc.queryForObject("SELECT count(*) FROM flyway_schema_history WHERE NOT success", Integer.class);
        var applied = jdbc.queryForObject("SELECT count(*) FROM flyway_schema_history WHERE success", Integer.class);
        assertThat(failed).isZero();
        assertThat(applied).isPositive();
    }

    @Test
    void accountRoundTrips() {
        String name = "pg-user-" + System.nanoTime();
        accounts.create(name, "pg-user-password", EnumSet.of(Role.PURCHASING, Role.APPROVER), "test-setup");
        var loaded = accounts.loadUserByUsername(name);
        assertThat(loaded.getAuthorities()).extracting(Object::toString)
                .containsExactlyInAnyOrder("ROLE_PURCHASING", "ROLE_APPROVER");
    }

    @Test
    void accountAuditRowsCannotBeChangedEvenBySql() {
        String name = "pg-audited-" + System.nanoTime();
        accounts.create(name, "pg-user-password", EnumSet.of(Role.ENGINEER), "test-setup");
        assertThatThrownBy(() -> jdbc.update("UPDATE account_audit SET detail = 'rewritten' WHERE subject = ?", name))
                .isInstanceOf(DataAccessException.class).hasMessageContaining("append-only");
        assertThatThrownBy(() -> jdbc.update("DELETE FROM account_audit WHERE subject = ?", name))
                .isInstanceOf(DataAccessException.class).hasMessageContaining("append-only");
        assertThat(jdbc.queryForObject("SELECT count(*) FROM account_audit WHERE subject = ?", Integer.class, name))
                .isEqualTo(1);
    }
}
