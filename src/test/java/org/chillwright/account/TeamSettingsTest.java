package org.chillwright.account;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;

import java.util.EnumSet;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.mock.web.MockHttpServletResponse;
import org.springframework.test.web.servlet.MockMvc;

/** The four-eyes setting: on by default, changed only by administrators (API and page), every change audited. */
@SpringBootTest
@AutoConfigureMockMvc
class TeamSettingsTest {

    private static final String ADMIN_PASSWORD = "admin-test-password";

    @Autowired
    MockMvc mvc;
    @Autowired
    TeamSettings settings;
    @Autowired
    AccountAudit audit;
    @Autowired
    AccountService accounts;

    @AfterEach
    void keepTheRuleOn() {
        settings.setFourEyesApproval(true, settings.current().version(), "admin");
    }

    private MockHttpServletResponse putSettings(String username, String password, String body) throws Exception {
        return mvc.perform(put("/api/v1/settings").with(httpBasic(username, password))
                .contentType(MediaType.APPLICATION_JSON).content(body)).andReturn().getResponse();
    }

    private AccountAuditView lastSettingChange() {
        return audit.all().stream().filter(line -> line.event() == AccountEvent.SETTING_CHANGED)
                .reduce((first, second) -> second).orElseThrow();
    }

    @Test
    void fourEyesIsOnUntilSomeoneTurnsItOff() throws Exception {
        assertThat(settings.fourEyesApproval()).isTrue();
        if (!accounts.exists("settings-reader")) {
            accounts.create("settings-reader", "settings-reader-password", EnumSet.of(Role.ENGINEER), "test-setup");
        }
        var read = mvc.perform(get("/api/v1/settings").with(httpBasic("settings-reader", "settings-reader-password")))
                .andReturn().getResponse();
        assertThat(read.getStatus()).isEqualTo(200);
        assertThat(read.getContentAsString()).contains("\"fourEyesApproval\":true");
    }

    @Test
    void anAdministratorTurnsItOffThroughTheApiAndTheChangeIsAudited() throws Exception {
        long version = settings.current().version();
        var changed = putSettings("admin", ADMIN_PASSWORD,
                "{\"fourEyesApproval\":false,\"version\":" + version + "}");
        assertThat(changed.getStatus()).isEqualTo(200);
        assertThat(changed.getContentAsString()).contains("\"fourEyesApproval\":false", "\"changedBy\":\"admin\"");
        assertThat(settings.fourEyesApproval()).isFalse();
        var line = lastSettingChange();
        assertThat(line.by()).isEqualTo("admin");
        assertThat(line.subject()).isEqualTo(TeamSettings.FOUR_EYES);
        assertThat(line.detail()).startsWith("on → off");
    }

    @Test
    void onlyAdministratorsChangeIt() throws Exception {
        if (!accounts.exists("settings-approver")) {
            accounts.create("settings-approver", "settings-approver-password", EnumSet.of(Role.APPROVER, Role.ENGINEER),
                    "test-setup");
        }
        var refused = putSettings("settings-approver", "settings-approver-password",
                "{\"fourEyesApproval\":false,\"version\":" + settings.current().version() + "}");
        assertThat(refused.getStatus()).isEqualTo(403);
        assertThat(refused.getContentType()).startsWith(MediaType.APPLICATION_PROBLEM_JSON_VALUE);
        assertThat(mvc.perform(post("/admin/settings").with(user("eng").roles("ENGINEER", "APPROVER")).with(csrf())
                .param("version", "0")).andReturn().getResponse().getStatus()).isEqualTo(403);
        assertThat(settings.fourEyesApproval()).isTrue();
    }

    @Test
    void aStaleChangeIsRefusedAndChangesNothing() throws Exception {
        long version = settings.current().version();
        settings.setFourEyesApproval(false, version, "admin");
        var stale = putSettings("admin", ADMIN_PASSWORD, "{\"fourEyesApproval\":true,\"version\":" + version + "}");
        assertThat(stale.getStatus()).isEqualTo(409);
        assertThat(stale.getContentAsString()).contains("Stale edit");
        assertThat(settings.fourEyesApproval()).isFalse();
    }

    @Test
    void aMissingValueIsABadRequestNamingIt() throws Exception {
        var bad = putSettings("admin", ADMIN_PASSWORD, "{\"version\":" + settings.current().version() + "}");
        assertThat(bad.getStatus()).isEqualTo(400);
        assertThat(bad.getContentAsString()).contains("\"field\":\"fourEyesApproval\"");
    }

    @Test
    void thePageShowsTheSettingAndAnUntickedBoxTurnsItOff() throws Exception {
        var page = mvc.perform(get("/admin/settings").with(user("admin").roles("ADMIN"))).andReturn().getResponse()
                .getContentAsString();
        assertThat(page).contains("Team settings").containsPattern("id=\"fourEyesApproval\"[^>]*checked");
        var saved = mvc.perform(post("/admin/settings").with(user("admin").roles("ADMIN")).with(csrf())
                .param("version", String.valueOf(settings.current().version()))).andReturn();
        assertThat(saved.getResponse().getRedirectedUrl()).isEqualTo("/admin/settings");
        assertThat(settings.fourEyesApproval()).isFalse();
        assertThat(lastSettingChange().by()).isEqualTo("admin");
        var trail = mvc.perform(get("/admin/audit").with(user("admin").roles("ADMIN"))).andReturn().getResponse()
                .getContentAsString();
        assertThat(trail).contains("team setting changed", TeamSettings.FOUR_EYES, "on → off");
    }
}
