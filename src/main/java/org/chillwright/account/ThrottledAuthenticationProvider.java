package org.chillwright.account;

import org.springframework.security.authentication.AuthenticationProvider;
import org.springframework.security.authentication.BadCredentialsException;
import org.springframework.security.core.Authentication;
import org.springframework.security.web.authentication.WebAuthenticationDetails;

/**
 * Checks the {@link LoginThrottle} before the password, and tells it about every wrong one. Both
 * the form login and HTTP Basic pass through here, so the API is no way around the limit.
 */
class ThrottledAuthenticationProvider implements AuthenticationProvider {

    private final AuthenticationProvider passwords;
    private final LoginThrottle throttle;

    ThrottledAuthenticationProvider(AuthenticationProvider passwords, LoginThrottle throttle) {
        this.passwords = passwords;
        this.throttle = throttle;
    }

    @Override
    public Authentication authenticate(Authentication attempt) {
        String username = attempt.getName();
        String address = attempt.getDetails() instanceof WebAuthenticationDetails web ? web.getRemoteAddress() : null;
        var locked = throttle.lockedFor(username, address);
        if (locked.isPresent()) {
            throw new LoginThrottledException(locked.get());
        }
        try {
            var signedIn = passwords.authenticate(attempt);
            throttle.recordSuccess(username);
            return signedIn;
        } catch (BadCredentialsException wrong) {
            throttle.recordFailure(username, address);
            throw wrong;
        }
    }

    @Override
    public boolean supports(Class<?> authentication) {
        return passwords.supports(authentication);
    }
}
