package org.chillwright.account;

import java.security.SecureRandom;
import java.util.Base64;
import java.util.EnumSet;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.boot.ApplicationArguments;
import org.springframework.boot.ApplicationRunner;
import org.springframework.core.annotation.Order;
import org.springframework.stereotype.Component;
import org.chillwright.web.ConflictException;

/**
 * On the first start (no account named admin yet) creates {@code admin} with the password from
 * {@code CHILLWRIGHT_ADMIN_PASSWORD}, or a generated one that is printed to the log this once.
 */
@Component
@Order(0)
class AdminBootstrap implements ApplicationRunner {

    static final String ADMIN_USERNAME = "admin";
    private static final Logger log = LoggerFactory.getLogger(AdminBootstrap.class);

    private final AccountService accounts;
    private final String configuredPassword;

    AdminBootstrap(AccountService accounts, @Value("${chillwright.admin.password:}") String configuredPassword) {
        this.accounts = accounts;
        this.configuredPassword = configuredPassword;
    }

    @Override
    public void run(ApplicationArguments args) {
        if (accounts.exists(ADMIN_USERNAME)) {
            return;
        }
        boolean generated = configuredPassword.isBlank();
        String password = generated ? generatePassword() : configuredPassword;
        try {
            accounts.create(ADMIN_USERNAME, password, EnumSet.allOf(Role.class), AccountAudit.SYSTEM);
        } catch (ConflictException anotherInstanceWasFirst) {
            return;
        }
        if (generated) {
            log.warn("Created account 'admin' with generated password: {}  (shown once; set "
                    + "CHILLWRIGHT_ADMIN_PASSWORD to choose it, and change it after signing in)", password);
        } else {
            log.info("Created account 'admin' with the password from CHILLWRIGHT_ADMIN_PASSWORD");
        }
    }

    private static String generatePassword() {
        byte[] bytes = new byte[18];
        new SecureRandom().nextBytes(bytes);
        return Base64.getUrlEncoder().withoutPadding().encodeToString(bytes);
    }
}
