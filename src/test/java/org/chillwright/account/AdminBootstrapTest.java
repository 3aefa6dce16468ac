package org.chillwright.account;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.DefaultApplicationArguments;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.system.CapturedOutput;
import org.springframework.boot.test.system.OutputCaptureExtension;

/** Without a configured password the first start prints a generated one, once, and never again. */
@SpringBootTest(properties = "chillwright.admin.password=")
@ExtendWith(OutputCaptureExtension.class)
class AdminBootstrapTest {

    @Autowired
    AdminBootstrap bootstrap;
    @Autowired
    AccountService accounts;

    @Test
    void generatedPasswordIsPrintedOnlyOnTheFirstStart(CapturedOutput output) {
        // output capture starts before the context (and so the first start) is made
        bootstrap.run(new DefaultApplicationArguments());
        bootstrap.run(new DefaultApplicationArguments());
        assertThat(accounts.exists("admin")).isTrue();
        assertThat(output.getAll().split("generated password", -1)).hasSize(2);
    }

    @Test
    void generatedAdminHoldsEveryRoleAndAHashedPassword() {
        var admin = accounts.loadUserByUsername("admin");
        assertThat(admin.getPassword()).startsWith("{bcrypt}");
        assertThat(admin.getAuthorities()).extracting(Object::toString)
                .contains("ROLE_ADMIN", "ROLE_ENGINEER", "ROLE_PURCHASING", "ROLE_APPROVER");
    }
}
