package org.chillwright.approval;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.chillwright.approval.ApprovalFixtures.ADMIN;
import static org.chillwright.approval.ApprovalFixtures.entryIn;
import static org.chillwright.approval.ApprovalFixtures.newList;

import java.util.EnumSet;
import org.chillwright.PostgresDatabase;
import org.chillwright.account.Role;
import org.chillwright.web.StaleEditException;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.dao.DataAccessException;
import org.springframework.jdbc.core.JdbcTemplate;

/** The approval schema and workflow on the real PostgreSQL server. */
@SpringBootTest(properties = TestModuleDirectory.ENABLED)
@PostgresDatabase
class ApprovalWorkflowPostgresIT {

    @Autowired
    ApprovedListService lists;
    @Autowired
    JdbcTemplate jdbc;

    @Test
    void approvalMigrationsIncludingThePostgresqlOnlyOneApplied() {
        assertThat(jdbc.queryForList("SELECT version FROM flyway_schema_history WHERE success", String.class))
                .contains("10", "11", "12");
    }

    @Test
    void signOffFromProposalToApprovalIsAuditedInOrder() {
        var list = newList(lists);
        var engineer = new Actor("pg-engineer", EnumSet.of(Role.ENGINEER));
        var approver = new Actor("pg-approver", EnumSet.of(Role.APPROVER));
        var entry = lists.propose(list.id(), TestModuleDirectory.ACTIVE, "candidate for the sensor head", engineer);
        lists.transition(list.id(), entry.id(), EntryState.QUALIFYING, "datasheet and outline in", null, null, engineer);
        lists.transition(list.id(), entry.id(), EntryState.APPROVED, "pilot build passed", null, null, approver);

        assertThat(lists.audit(list.id())).extracting(AuditView::by, AuditView::to).containsExactly(
                org.assertj.core.groups.Tuple.tuple("pg-engineer", EntryState.PROPOSED),
                org.assertj.core.groups.Tuple.tuple("pg-engineer", EntryState.QUALIFYING),
                org.assertj.core.groups.Tuple.tuple("pg-approver", EntryState.APPROVED));
    }

    @Test
    void approvedModuleIdsComeFromTheDatabase() {
        var list = newList(lists);
        entryIn(lists, list.id(), 210, EntryState.APPROVED);
        entryIn(lists, list.id(), 211, EntryState.QUALIFYING);
        assertThat(lists.approvedModuleIds(list.id())).containsExactly(210L);
    }

    @Test
    void staleTransitionIsRefused() {
        var list = newList(lists);
        var entry = entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, EntryState.QUALIFYING);
        lists.transition(list.id(), entry.id(), EntryState.APPROVED, "first", entry.version(), null,
                ApprovalFixtures.APPROVER);
        assertThatThrownBy(() -> lists.transition(list.id(), entry.id(), EntryState.PROPOSED, "second", entry.version(),
                null, ADMIN)).isInstanceOf(StaleEditException.class);
    }

    @Test
    void auditRowsCannotBeUpdatedEvenBySql() {
        var list = newList(lists);
        entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, EntryState.PROPOSED);
        assertThatThrownBy(() -> jdbc.update("UPDATE list_audit SET reason = 'rewritten' WHERE list_id = ?", list.id()))
                .isInstanceOf(DataAccessException.class).hasMessageContaining("append-only");
    }

    @Test
    void auditRowsCannotBeDeletedEvenBySql() {
        var list = newList(lists);
        entryIn(lists, list.id(), TestModuleDirectory.ACTIVE, EntryState.PROPOSED);
        assertThatThrownBy(() -> jdbc.update("DELETE FROM list_audit WHERE list_id = ?", list.id()))
                .isInstanceOf(DataAccessException.class).hasMessageContaining("append-only");
    }
}
