package org.chillwright.account;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.groups.Tuple.tuple;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;

import java.util.Arrays;
import java.util.EnumSet;
import java.util.List;
import org.hibernate.annotations.Immutable;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

/**
 * Every change of an account is on record with who, when and what, never with a password; the trail is
 * append-only, administrators read it on a page, through the API and as CSV with formula-like text defused.
 */
@SpringBootTest
@AutoConfigureMockMvc
class AccountAuditTest {

    private static final String ADMIN_PASSWORD = "admin-test-password";
    private static final String FIRST_PASSWORD = "audit-first-password-7";
    private static final String RESET_PASSWORD = "audit-reset-password-8";
    private static final String OWN_PASSWORD = "audit-own-password-9";

    @Autowired
    MockMvc mvc;
    @Autowired
    AccountService accounts;
    @Autowired
    AccountAudit audit;

    private int send(MockHttpServletRequestBuilder request, String json) throws Exception {
        return mvc.perform(request.contentType(MediaType.APPLICATION_JSON).content(json)).andReturn().getResponse()
                .getStatus();
    }

    private List<AccountAuditView> linesAbout(String subject) {
        return audit.all().stream().filter(line -> line.subject().equals(subject)).toList();
    }

    private long idOf(String username) {
        return accounts.list().stream().filter(a -> a.username().equals(username)).findFirst().orElseThrow().id();
    }

    @Test
    void everyChangeOfAnAccountIsRecordedWithWhoAndWhatButNoPassword() throws Exception {
        String name = "audited-ana";
        assertThat(send(post("/api/v1/users").with(httpBasic("admin", ADMIN_PASSWORD)),
                "{\"username\":\"" + name + "\",\"password\":\"" + FIRST_PASSWORD + "\",\"roles\":[\"ENGINEER\"]}"))
                .isEqualTo(201);
        long id = idOf(name);
        mvc.perform(post("/admin/users/{id}/roles", id).with(user("admin").roles("ADMIN")).with(csrf())
                .param("roles", "ENGINEER").param("roles", "APPROVER"));
        mvc.perform(post("/admin/users/{id}/enabled", id).with(user("admin").roles("ADMIN")).with(csrf())
                .param("enabled", "false"));
        mvc.perform(post("/admin/users/{id}/enabled", id).with(user("admin").roles("ADMIN")).with(csrf())
                .param("enabled", "true"));
        assertThat(send(put("/api/v1/users/{id}/password", id).with(httpBasic("admin", ADMIN_PASSWORD)),
                "{\"password\":\"" + RESET_PASSWORD + "\"}")).isEqualTo(204);
        assertThat(send(put("/api/v1/account/password").with(httpBasic(name, RESET_PASSWORD)),
                "{\"currentPassword\":\"" + RESET_PASSWORD + "\",\"newPassword\":\"" + OWN_PASSWORD + "\"}"))
                .isEqualTo(204);

        var lines = linesAbout(name);
        assertThat(lines).extracting(AccountAuditView::by, AccountAuditView::event, AccountAuditView::detail)
                .containsExactly(
                        tuple("admin", AccountEvent.ACCOUNT_CREATED, "created with roles ENGINEER"),
                        tuple("admin", AccountEvent.ROLES_CHANGED, "roles ENGINEER → ENGINEER, APPROVER"),
                        tuple("admin", AccountEvent.ACCOUNT_DISABLED, "can no longer sign in; signed-in sessions ended"),
                        tuple("admin", AccountEvent.ACCOUNT_ENABLED, "may sign in again"),
                        tuple("admin", AccountEvent.PASSWORD_RESET,
                                "new password set by an administrator; signed-in sessions ended"),
                        tuple(name, AccountEvent.PASSWORD_CHANGED, "changed their own password"));
        assertThat(lines).allSatisfy(line -> assertThat(line.at()).isNotNull());
        var csv = new StringBuilder();
        audit.writeCsv(csv);
        for (String password : new String[] {FIRST_PASSWORD, RESET_PASSWORD, OWN_PASSWORD}) {
            assertThat(audit.all()).extracting(AccountAuditView::detail).noneMatch(d -> d.contains(password));
            assertThat(csv.toString()).doesNotContain(password);
        }
    }

    @Test
    void theFirstAdministratorIsRecordedAsMadeByTheSystem() {
        assertThat(linesAbout("admin")).extracting(AccountAuditView::by, AccountAuditView::event)
                .contains(tuple(AccountAudit.SYSTEM, AccountEvent.ACCOUNT_CREATED));
    }

    @Test
    void refusedAndEmptyChangesLeaveNoLine() throws Exception {
        String name = "audited-ben";
        accounts.create(name, FIRST_PASSWORD, EnumSet.of(Role.ENGINEER), "admin");
        long id = idOf(name);
        accounts.changeRoles(id, EnumSet.of(Role.ENGINEER), "admin");
        accounts.setEnabled(id, true, "admin");
        mvc.perform(post("/admin/users/{id}/password", id).with(user("admin").roles("ADMIN")).with(csrf())
                .param("password", "short"));
        assertThat(send(put("/api/v1/account/password").with(httpBasic(name, FIRST_PASSWORD)),
                "{\"currentPassword\":\"not-the-password\",\"newPassword\":\"" + OWN_PASSWORD + "\"}")).isEqualTo(400);
        assertThat(linesAbout(name)).extracting(AccountAuditView::event).containsExactly(AccountEvent.ACCOUNT_CREATED);
    }

    @Test
    void administratorsReadTheTrailOnAPage() throws Exception {
        accounts.create("audited-page", FIRST_PASSWORD, EnumSet.of(Role.PURCHASING), "admin");
        String page = mvc.perform(get("/admin/audit").with(user("admin").roles("ADMIN"))).andReturn().getResponse()
                .getContentAsString();
        assertThat(page).contains("Account audit trail", "audited-page", "account created",
                "created with roles PURCHASING", "href=\"/admin/audit.csv\"");
    }

    @Test
    void onlyAdministratorsReadTheTrail() throws Exception {
        assertThat(mvc.perform(get("/admin/audit").with(user("eng").roles("ENGINEER", "APPROVER"))).andReturn()
                .getResponse().getStatus()).isEqualTo(403);
        assertThat(mvc.perform(get("/admin/audit.csv").with(user("eng").roles("ENGINEER"))).andReturn()
                .getResponse().getStatus()).isEqualTo(403);
        accounts.create("audited-eng", FIRST_PASSWORD, EnumSet.of(Role.ENGINEER), "admin");
        var api = mvc.perform(get("/api/v1/users/audit").with(httpBasic("audited-eng", FIRST_PASSWORD))).andReturn()
                .getResponse();
        assertThat(api.getStatus()).isEqualTo(403);
        assertThat(api.getContentType()).startsWith(MediaType.APPLICATION_PROBLEM_JSON_VALUE);
    }

    @Test
    void theApiListsTheTrailOldestFirst() throws Exception {
        accounts.create("audited-api", FIRST_PASSWORD, EnumSet.of(Role.ENGINEER), "admin");
        var response = mvc.perform(get("/api/v1/users/audit").accept(MediaType.APPLICATION_JSON)
                .with(httpBasic("admin", ADMIN_PASSWORD))).andReturn().getResponse();
        assertThat(response.getStatus()).isEqualTo(200);
        assertThat(response.getContentAsString()).startsWith("[{\"at\":").contains(
                "\"by\":\"admin\",\"event\":\"ACCOUNT_CREATED\",\"subject\":\"audited-api\"");
    }

    @Test
    void csvDefusesFormulaLikeTextAsTheOtherExportsDo() throws Exception {
        // a user name may start with '-', which a spreadsheet would read as the start of a formula
        accounts.create("-1-audited", FIRST_PASSWORD, EnumSet.of(Role.ENGINEER), "admin");
        var page = mvc.perform(get("/admin/audit.csv").with(user("admin").roles("ADMIN"))).andReturn().getResponse();
        var api = mvc.perform(get("/api/v1/users/audit").accept("text/csv").with(httpBasic("admin", ADMIN_PASSWORD)))
                .andReturn().getResponse();
        for (var csv : List.of(page, api)) {
            assertThat(csv.getHeader("Content-Disposition")).contains("account-audit.csv");
            assertThat(csv.getContentAsString()).startsWith("at,by,event,subject,detail\r\n")
                    .contains(",admin,ACCOUNT_CREATED,'-1-audited,created with roles ENGINEER\r\n")
                    .doesNotContain(",-1-audited,");
        }
    }

    @Test
    void theTrailCanOnlyBeAddedTo() {
        assertThat(AccountAuditRecord.class).hasAnnotation(Immutable.class);
        assertThat(Arrays.stream(AccountAuditRepository.class.getMethods()).map(m -> m.getName()))
                .allMatch(name -> name.equals("save") || name.startsWith("find"));
    }
}
