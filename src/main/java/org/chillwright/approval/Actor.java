package org.chillwright.approval;

import java.util.Arrays;
import java.util.Collection;
import java.util.EnumSet;
import java.util.Set;
import org.chillwright.account.Role;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.GrantedAuthority;

/** Who is acting, as the audit trail records them, and the roles their account holds. */
public record Actor(String username, Set<Role> roles) {

    public Actor {
        roles = roles.isEmpty() ? EnumSet.noneOf(Role.class) : EnumSet.copyOf(roles);
    }

    /** The signed-in user behind a request. */
    public static Actor of(Authentication authentication) {
        var roles = EnumSet.noneOf(Role.class);
        for (GrantedAuthority authority : authentication.getAuthorities()) {
            Arrays.stream(Role.values()).filter(r -> r.authority().equals(authority.getAuthority())).forEach(roles::add);
        }
        return new Actor(authentication.getName(), roles);
    }

    boolean holdsAny(Collection<Role> wanted) {
        return wanted.stream().anyMatch(roles::contains);
    }
}
