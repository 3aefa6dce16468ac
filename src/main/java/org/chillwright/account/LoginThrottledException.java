package org.chillwright.account;

import java.time.Duration;
import org.springframework.security.core.AuthenticationException;

/** Sign-in refused because too many recent attempts for this name or from this address failed. */
class LoginThrottledException extends AuthenticationException {

    private final transient Duration retryAfter;

    LoginThrottledException(Duration retryAfter) {
        super("Too many failed sign-ins; try again in " + minutes(retryAfter) + " minute(s)");
        this.retryAfter = retryAfter;
    }

    Duration retryAfter() {
        return retryAfter;
    }

    static long minutes(Duration duration) {
        return Math.max(1, (duration.toSeconds() + 59) / 60);
    }
}
