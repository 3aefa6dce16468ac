package org.chillwright.account;

import java.time.Instant;
import java.util.Set;

/** An account as the rest of the application sees it: never the password hash. */
public record AccountView(long id, String username, Set<Role> roles, boolean enabled, Instant createdAt) {

    static AccountView of(UserAccount account) {
        return new AccountView(account.getId(), account.getUsername(), account.getRoles(),
                account.isEnabled(), account.getCreatedAt());
    }
}
