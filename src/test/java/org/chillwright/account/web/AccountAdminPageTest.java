package org.chillwright.account.web;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestBuilders.formLogin;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.flash;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.EnumSet;
import org.chillwright.account.AccountService;
import org.chillwright.account.AccountView;
import org.chillwright.account.Role;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.RequestPostProcessor;

/** The accounts page: only administrators, every change by form with CSRF, refusals shown beside the row or field. */
@SpringBootTest
@AutoConfigureMockMvc
class AccountAdminPageTest {

    private static final String PASSWORD = "page-test-password";

    @Autowired
    MockMvc mvc;
    @Autowired
    AccountService accounts;

    private static RequestPostProcessor admin() {
        return user("admin").roles("ADMIN");
    }

    private AccountView someone(String name) {
        return accounts.create(name, PASSWORD, EnumSet.of(Role.ENGINEER), "test-setup");
    }

    private void assertSignInWorks(String name, String password, boolean works) throws Exception {
        mvc.perform(formLogin("/login").user(name).password(password))
                .andExpect(header().string("Location", works ? "/" : "/login?error"));
    }

    @Test
    void listsAccountsWithoutPasswords() throws Exception {
        someone("listed-user");
        mvc.perform(get("/admin/users").with(admin()))
                .andExpect(status().isOk())
                .andExpect(content().string(containsString("listed-user")))
                .andExpect(content().string(org.hamcrest.Matchers.not(containsString("{bcrypt}"))));
    }

    @Test
    void nonAdminIsForbidden() throws Exception {
        mvc.perform(get("/admin/users").with(user("eng").roles("ENGINEER"))).andExpect(status().isForbidden());
    }

    @Test
    void createsAnAccountThatCanSignIn() throws Exception {
        mvc.perform(post("/admin/users").with(admin()).with(csrf()).param("username", "made-by-page")
                        .param("password", PASSWORD).param("roles", "PURCHASING"))
                .andExpect(status().isFound())
                .andExpect(flash().attribute("done", containsString("made-by-page")));
        assertSignInWorks("made-by-page", PASSWORD, true);
    }

    @Test
    void shortPasswordIsShownBesideTheField() throws Exception {
        mvc.perform(post("/admin/users").with(admin()).with(csrf()).param("username", "short-pw")
                        .param("password", "short").param("roles", "ENGINEER"))
                .andExpect(status().isOk())
                .andExpect(content().string(containsString("id=\"password-error\"")))
                .andExpect(content().string(containsString("must be 12 to 128 characters long")));
    }

    @Test
    void takenNameIsShownBesideTheField() throws Exception {
        someone("taken-name");
        mvc.perform(post("/admin/users").with(admin()).with(csrf()).param("username", "taken-name")
                        .param("password", PASSWORD).param("roles", "ENGINEER"))
                .andExpect(status().isOk())
                .andExpect(content().string(containsString("already exists")));
    }

    @Test
    void formWithoutCsrfTokenIsRefused() throws Exception {
        mvc.perform(post("/admin/users").with(admin()).param("username", "no-token")
                        .param("password", PASSWORD).param("roles", "ENGINEER"))
                .andExpect(status().isForbidden());
        assertThat(accounts.exists("no-token")).isFalse();
    }

    @Test
    void disabledAccountCannotSignIn() throws Exception {
        var account = someone("to-disable");
        mvc.perform(post("/admin/users/{id}/enabled", account.id()).with(admin()).with(csrf()).param("enabled", "false"))
                .andExpect(status().isFound());
        assertSignInWorks("to-disable", PASSWORD, false);
    }

    @Test
    void adminCannotDisableThemselves() throws Exception {
        long adminId = accounts.list().stream().filter(a -> a.username().equals("admin")).findFirst().orElseThrow().id();
        mvc.perform(post("/admin/users/{id}/enabled", adminId).with(admin()).with(csrf()).param("enabled", "false"))
                .andExpect(flash().attribute("problem", containsString("cannot disable your own account")));
    }

    @Test
    void changesRoles() throws Exception {
        var account = someone("re-roled");
        mvc.perform(post("/admin/users/{id}/roles", account.id()).with(admin()).with(csrf())
                        .param("roles", "APPROVER").param("roles", "PURCHASING"))
                .andExpect(status().isFound());
        assertThat(accounts.loadUserByUsername("re-roled").getAuthorities()).extracting(Object::toString)
                .containsExactlyInAnyOrder("ROLE_APPROVER", "ROLE_PURCHASING");
    }

    @Test
    void noRoleAtAllIsRefused() throws Exception {
        var account = someone("role-less");
        mvc.perform(post("/admin/users/{id}/roles", account.id()).with(admin()).with(csrf()))
                .andExpect(flash().attribute("problem", containsString("at least one role")));
    }

    @Test
    void resetPasswordReplacesTheOldOne() throws Exception {
        var account = someone("forgetful");
        mvc.perform(post("/admin/users/{id}/password", account.id()).with(admin()).with(csrf())
                        .param("password", "a-brand-new-password"))
                .andExpect(status().isFound());
        assertSignInWorks("forgetful", "a-brand-new-password", true);
    }

    @Test
    void ownPasswordChangeNeedsTheCurrentOne() throws Exception {
        someone("changer-a");
        mvc.perform(post("/account/password").with(user("changer-a")).with(csrf())
                        .param("currentPassword", "not-it").param("newPassword", "another-long-password")
                        .param("confirmPassword", "another-long-password"))
                .andExpect(status().isOk())
                .andExpect(content().string(containsString("does not match your current password")));
    }

    @Test
    void ownPasswordChangeLetsTheNewOneIn() throws Exception {
        someone("changer-b");
        mvc.perform(post("/account/password").with(user("changer-b")).with(csrf())
                        .param("currentPassword", PASSWORD).param("newPassword", "another-long-password")
                        .param("confirmPassword", "another-long-password"))
                .andExpect(status().isFound());
        assertSignInWorks("changer-b", "another-long-password", true);
    }

    @Test
    void ownPasswordPageNeedsSignIn() throws Exception {
        mvc.perform(get("/account/password").accept(org.springframework.http.MediaType.TEXT_HTML)).andExpect(status().isFound())
                .andExpect(header().string("Location", org.hamcrest.Matchers.endsWith("/login")));
    }
}
