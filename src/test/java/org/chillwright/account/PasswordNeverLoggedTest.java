package org.chillwright.account;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestBuilders.formLogin;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.DefaultApplicationArguments;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.system.CapturedOutput;
import org.springframework.boot.test.system.OutputCaptureExtension;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.MockMvc;

/**
 * A configured admin password never reaches the log: not at start, not on later starts, not on
 * sign-ins (good or bad, by form or Basic) and not on a reset, even with security and request
 * logging turned up to DEBUG.
 */
@SpringBootTest(properties = {"chillwright.admin.password=" + PasswordNeverLoggedTest.SECRET,
    "logging.level.org.springframework.security=DEBUG", "logging.level.org.chillwright=DEBUG"})
@AutoConfigureMockMvc
@ExtendWith(OutputCaptureExtension.class)
class PasswordNeverLoggedTest {

    static final String SECRET = "Distinctive-Admin-Secret-4711";

    @Autowired
    MockMvc mvc;
    @Autowired
    AdminBootstrap bootstrap;
    @Autowired
    AccountService accounts;

    @Test
    void configuredAdminPasswordAppearsNowhereInTheLog(CapturedOutput output) throws Exception {
        bootstrap.run(new DefaultApplicationArguments());
        mvc.perform(formLogin("/login").user("admin").password(SECRET));
        mvc.perform(formLogin("/login").user("admin").password(SECRET + "-typo"));
        mvc.perform(get("/api/v1/lists").with(httpBasic("admin", SECRET)));
        long someone = accounts.create("log-check", "log-check-password", java.util.Set.of(Role.ENGINEER), "test-setup")
                .id();
        mvc.perform(post("/admin/users/{id}/password", someone).with(user("admin").roles("ADMIN")).with(csrf())
                .param("password", SECRET + "-reset"));
        assertThat(output.getAll()).contains("Created account 'admin'").doesNotContain(SECRET);
    }
}
