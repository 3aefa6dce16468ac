package org.chillwright.account;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestBuilders.formLogin;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.EnumSet;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.test.web.servlet.MockMvc;

/** Access on the embedded default: pages and reads open, writes need an account with the right role. */
@SpringBootTest
@AutoConfigureMockMvc
class AccessRulesTest {

    private static final String NEW_USER = "{\"username\":\"%s\",\"password\":\"long-enough-secret\",\"roles\":[\"ENGINEER\"]}";

    @Autowired
    MockMvc mvc;
    @Autowired
    AccountService accounts;
    @Autowired
    PasswordEncoder passwordEncoder;

    @Test
    void homePageIsOpen() throws Exception {
        mvc.perform(get("/")).andExpect(status().isOk())
                .andExpect(content().string(org.hamcrest.Matchers.containsString("Chillwright")));
    }

    @Test
    void methodPageNamesItsSources() throws Exception {
        mvc.perform(get("/method")).andExpect(status().isOk())
                .andExpect(content().string(org.hamcrest.Matchers.allOf(
                        org.hamcrest.Matchers.containsString("Alduchov"),
                        org.hamcrest.Matchers.containsString("Ioffe"),
                        org.hamcrest.Matchers.containsString("I_COPmax"))));
    }

    @Test
    void computationsAreOpenOnTheEmbeddedDefault() throws Exception {
        mvc.perform(post("/api/v1/derive").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"module\":{\"seebeckVPerK\":0.04,\"resistanceOhm\":2.4,\"conductanceWPerK\":0.25}}"))
                .andExpect(status().isOk());
    }

    @Test
    void adminPagesRedirectAnonymousVisitorsToLogin() throws Exception {
        mvc.perform(get("/admin/users").accept(MediaType.TEXT_HTML))
                .andExpect(status().isFound())
                .andExpect(header().string("Location", org.hamcrest.Matchers.endsWith("/login")));
    }

    @Test
    void anonymousApiWriteIsRefusedWithAProblemBody() throws Exception {
        mvc.perform(post("/api/v1/users").contentType(MediaType.APPLICATION_JSON).content(NEW_USER.formatted("x1")))
                .andExpect(status().isUnauthorized())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON))
                .andExpect(jsonPath("$.status").value(401));
    }

    @Test
    void wrongPasswordIsUnauthorized() throws Exception {
        mvc.perform(post("/api/v1/users").with(httpBasic("admin", "not-the-password"))
                        .contentType(MediaType.APPLICATION_JSON).content(NEW_USER.formatted("x2")))
                .andExpect(status().isUnauthorized());
    }

    @Test
    void roleWithoutAdminIsForbiddenToCreateUsers() throws Exception {
        accounts.create("eng-only", "eng-only-password", EnumSet.of(Role.ENGINEER), "test-setup");
        mvc.perform(post("/api/v1/users").with(httpBasic("eng-only", "eng-only-password"))
                        .contentType(MediaType.APPLICATION_JSON).content(NEW_USER.formatted("x3")))
                .andExpect(status().isForbidden())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON));
    }

    @Test
    void apiNeedsNoCsrfTokenButTakesNoSessionEither() throws Exception {
        mvc.perform(post("/api/v1/users").with(httpBasic("admin", "admin-test-password"))
                        .contentType(MediaType.APPLICATION_JSON).content(NEW_USER.formatted("x4")))
                .andExpect(status().isCreated())
                .andExpect(header().doesNotExist("Set-Cookie"));
    }

    @Test
    void pageFormPostedWithoutCsrfTokenIsRefused() throws Exception {
        mvc.perform(post("/login").param("username", "admin").param("password", "admin-test-password"))
                .andExpect(status().isForbidden());
    }

    @Test
    void formLoginWithTheAdminPasswordSignsIn() throws Exception {
        mvc.perform(formLogin("/login").user("admin").password("admin-test-password"))
                .andExpect(status().isFound())
                .andExpect(header().string("Location", "/"));
    }

    @Test
    void failedFormLoginReturnsToTheLoginPageWithAnError() throws Exception {
        mvc.perform(post("/login").with(csrf()).param("username", "admin").param("password", "wrong"))
                .andExpect(status().isFound())
                .andExpect(header().string("Location", "/login?error"));
    }

    @Test
    void passwordsAreStoredAsBcryptHashes() {
        var user = accounts.loadUserByUsername("admin");
        assertThat(user.getPassword()).startsWith("{bcrypt}").doesNotContain("admin-test-password");
        assertThat(passwordEncoder.matches("admin-test-password", user.getPassword())).isTrue();
    }

    @Test
    void healthIsOpenAndUp() throws Exception {
        mvc.perform(get("/actuator/health")).andExpect(status().isOk()).andExpect(jsonPath("$.status").value("UP"));
    }

    @Test
    void apiDocumentIsServed() throws Exception {
        mvc.perform(get("/v3/api-docs")).andExpect(status().isOk())
                .andExpect(jsonPath("$.paths['/api/v1/users']").exists());
    }
}
