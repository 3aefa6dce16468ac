package org.chillwright.approval;

import static org.assertj.core.api.Assertions.assertThat;
import static org.chillwright.approval.ApprovalFixtures.PASSWORD;
import static org.chillwright.approval.ApprovalFixtures.newList;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;

import java.util.EnumSet;
import org.chillwright.account.AccountService;
import org.chillwright.account.Role;
import org.chillwright.account.TeamSettings;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.mock.web.MockHttpServletResponse;
import org.springframework.test.web.servlet.MockMvc;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;

/**
 * Four eyes on every approval, through the API and the pages: neither the proposer nor the qualifier of
 * an entry may approve it, the refusal is a 409 that says why, a second person's approval names both
 * people in the audit trail, and only a team that relaxed the rule lets one person do all three.
 */
@SpringBootTest(properties = TestModuleDirectory.ENABLED)
@AutoConfigureMockMvc
class FourEyesTest {

    private static final Actor ENGINEER = new Actor("fe-engineer", EnumSet.of(Role.ENGINEER));
    private static final Actor LEAD = new Actor("fe-lead", EnumSet.of(Role.ENGINEER, Role.APPROVER));

    @Autowired
    MockMvc mvc;
    @Autowired
    ApprovedListService lists;
    @Autowired
    AccountService accounts;
    @Autowired
    TeamSettings settings;
    @Autowired
    ObjectMapper json;

    @BeforeEach
    void accounts() {
        ApprovalFixtures.account(accounts, ENGINEER.username(), ENGINEER.roles());
        ApprovalFixtures.account(accounts, LEAD.username(), LEAD.roles());
        ApprovalFixtures.account(accounts, "fe-approver", EnumSet.of(Role.APPROVER));
    }

    @AfterEach
    void keepTheRuleOn() {
        settings.setFourEyesApproval(true, settings.current().version(), "admin");
    }

    private MockHttpServletResponse approve(long listId, long entryId, String username, String password)
            throws Exception {
        return mvc.perform(post("/api/v1/lists/{id}/entries/{entryId}/transitions", listId, entryId)
                .with(httpBasic(username, password)).contentType(MediaType.APPLICATION_JSON)
                .content("{\"to\":\"APPROVED\",\"reason\":\"pilot build passed\"}")).andReturn().getResponse();
    }

    private EntryView qualifying(long listId, Actor proposer, Actor qualifier) {
        var entry = lists.propose(listId, TestModuleDirectory.ACTIVE, "for the detector head", proposer);
        return lists.transition(listId, entry.id(), EntryState.QUALIFYING, "datasheet in", null, null, qualifier);
    }

    private void assertRefusedWithReason(MockHttpServletResponse response, String reason) throws Exception {
        assertThat(response.getStatus()).isEqualTo(409);
        assertThat(response.getContentType()).startsWith(MediaType.APPLICATION_PROBLEM_JSON_VALUE);
        JsonNode body = json.readTree(response.getContentAsString());
        assertThat(body.get("title").asString()).isEqualTo("Approval needs a second person");
        assertThat(body.get("detail").asString()).contains(reason, "someone other than its proposer");
        assertThat(body.get("errors").get(0).get("field").asString()).isEqualTo("to");
    }

    @Test
    void theProposerMayNotApproveEvenWithTheApproverRole() throws Exception {
        var list = newList(lists);
        var entry = qualifying(list.id(), LEAD, ENGINEER);
        assertRefusedWithReason(approve(list.id(), entry.id(), LEAD.username(), PASSWORD), "you proposed this entry");
        assertThat(lists.list(list.id()).entries().get(0).state()).isEqualTo(EntryState.QUALIFYING);
        assertThat(lists.audit(list.id())).hasSize(2);
    }

    @Test
    void theQualifierMayNotApprove() throws Exception {
        var list = newList(lists);
        var entry = qualifying(list.id(), ENGINEER, LEAD);
        assertRefusedWithReason(approve(list.id(), entry.id(), LEAD.username(), PASSWORD),
                "you sent this entry to qualification");
        assertThat(lists.list(list.id()).entries().get(0).state()).isEqualTo(EntryState.QUALIFYING);
    }

    @Test
    void anAdministratorAloneMayNotProposeQualifyAndApprove() throws Exception {
        var list = newList(lists);
        var entry = qualifying(list.id(), ApprovalFixtures.ADMIN, ApprovalFixtures.ADMIN);
        assertRefusedWithReason(approve(list.id(), entry.id(), "admin", "admin-test-password"),
                "you proposed this entry and sent it to qualification");
    }

    @Test
    void aSecondPersonApprovesAndTheAuditLineNamesTheProposerAndTheQualifier() throws Exception {
        var list = newList(lists);
        var entry = qualifying(list.id(), LEAD, ENGINEER);
        assertThat(approve(list.id(), entry.id(), "fe-approver", PASSWORD).getStatus()).isEqualTo(200);

        var approval = lists.audit(list.id()).get(2);
        assertThat(approval.by()).isEqualTo("fe-approver");
        assertThat(approval.proposedBy()).isEqualTo("fe-lead");
        assertThat(approval.qualifiedBy()).isEqualTo("fe-engineer");
        assertThat(approval.independentApproval()).isTrue();
        var api = mvc.perform(get("/api/v1/lists/{id}/audit", list.id()).with(httpBasic("fe-engineer", PASSWORD)))
                .andReturn().getResponse().getContentAsString();
        assertThat(json.readTree(api).get(2).get("proposedBy").asString()).isEqualTo("fe-lead");
        assertThat(json.readTree(api).get(2).get("qualifiedBy").asString()).isEqualTo("fe-engineer");
        var csv = mvc.perform(get("/api/v1/lists/{id}/audit", list.id()).accept("text/csv")
                .with(httpBasic("fe-engineer", PASSWORD))).andReturn().getResponse().getContentAsString();
        assertThat(csv).contains(",fe-approver,").contains("QUALIFYING,APPROVED,pilot build passed,fe-lead,fe-engineer\r\n");
        var page = mvc.perform(get("/lists/{id}", list.id()).with(user("fe-engineer").roles("ENGINEER"))).andReturn()
                .getResponse().getContentAsString();
        assertThat(page).contains("(proposed by fe-lead, qualified by fe-engineer)");
    }

    @Test
    void thePageRefusesTheProposerWithTheReasonBesideTheForm() throws Exception {
        var list = newList(lists);
        var entry = qualifying(list.id(), LEAD, ENGINEER);
        var page = mvc.perform(post("/lists/{id}/entries/{entryId}/transitions", list.id(), entry.id())
                        .with(user("fe-lead").roles("ENGINEER", "APPROVER")).with(csrf())
                        .param("to", "APPROVED").param("reason", "looks fine to me")
                        .param("version", String.valueOf(entry.version())))
                .andReturn().getResponse();
        assertThat(page.getStatus()).isEqualTo(200);
        assertThat(page.getContentAsString()).contains("<p class=\"field-error\">Approval needs a second person: "
                + "you proposed this entry");
        assertThat(lists.list(list.id()).entries().get(0).state()).isEqualTo(EntryState.QUALIFYING);
    }

    @Test
    void thePageTellsTheProposerBeforeTheyTry() throws Exception {
        var list = newList(lists);
        qualifying(list.id(), LEAD, ENGINEER);
        var asLead = mvc.perform(get("/lists/{id}", list.id()).with(user("fe-lead").roles("ENGINEER", "APPROVER")))
                .andReturn().getResponse().getContentAsString();
        var asApprover = mvc.perform(get("/lists/{id}", list.id()).with(user("fe-approver").roles("APPROVER")))
                .andReturn().getResponse().getContentAsString();
        assertThat(asLead).contains("class=\"small four-eyes\"", "you proposed this entry");
        assertThat(asApprover).doesNotContain("class=\"small four-eyes\"").contains("qualified by <span");
    }

    @Test
    void aTeamThatRelaxedTheRuleLetsOnePersonApproveAndTheTrailStillShowsIt() throws Exception {
        settings.setFourEyesApproval(false, settings.current().version(), "admin");
        var list = newList(lists);
        var entry = qualifying(list.id(), LEAD, LEAD);
        assertThat(approve(list.id(), entry.id(), LEAD.username(), PASSWORD).getStatus()).isEqualTo(200);
        var approval = lists.audit(list.id()).get(2);
        assertThat(approval.by()).isEqualTo("fe-lead");
        assertThat(approval.proposedBy()).isEqualTo("fe-lead");
        assertThat(approval.independentApproval()).isFalse();
        assertThat(mvc.perform(get("/lists/{id}", list.id()).with(user("fe-lead").roles("ENGINEER"))).andReturn()
                .getResponse().getContentAsString()).contains("The team has relaxed the four-eyes rule");
    }
}
