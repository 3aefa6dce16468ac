package org.chillwright.account;

import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.stereotype.Component;

/**
 * Counts failed sign-ins per user name and per client address. When either reaches its limit
 * within the window, sign-ins for that name or from that address are refused until the lock-out
 * ends, even with the right password, so guessing costs the guesser time. The tallies live in
 * this instance's memory: with several instances an attacker gets each instance's budget, which
 * still bounds guessing to a few tries a minute.
 */
@Component
class LoginThrottle {

    /** Above this many tracked keys, expired ones are dropped so that a flood of names cannot fill memory. */
    private static final int PRUNE_ABOVE_KEYS = 10_000;

    private final int maxFailuresPerUser;
    private final int maxFailuresPerAddress;
    private final Duration window;
    private final Clock clock;
    private final Map<String, Tally> tallies = new ConcurrentHashMap<>();

    LoginThrottle(@Value("${chillwright.login.max-failures-per-user:5}") int maxFailuresPerUser,
            @Value("${chillwright.login.max-failures-per-address:20}") int maxFailuresPerAddress,
            @Value("${chillwright.login.lockout:15m}") Duration window, Clock clock) {
        this.maxFailuresPerUser = maxFailuresPerUser;
        this.maxFailuresPerAddress = maxFailuresPerAddress;
        this.window = window;
        this.clock = clock;
    }

    /** How long sign-ins for this name or from this address stay refused, or empty when they are allowed. */
    Optional<Duration> lockedFor(String username, String address) {
        Instant now = clock.instant();
        Instant until = later(lockedUntil(userKey(username), now), lockedUntil(addressKey(address), now));
        return until == null ? Optional.empty() : Optional.of(Duration.between(now, until));
    }

    void recordFailure(String username, String address) {
        Instant now = clock.instant();
        count(userKey(username), maxFailuresPerUser, now);
        count(addressKey(address), maxFailuresPerAddress, now);
        if (tallies.size() > PRUNE_ABOVE_KEYS) {
            tallies.values().removeIf(t -> t.expired(now, window));
        }
    }

    /** A good password clears the name's tally; the address keeps its own, so one known password cannot reset it. */
    void recordSuccess(String username) {
        tallies.remove(userKey(username));
    }

    private void count(String key, int max, Instant now) {
        tallies.compute(key, (k, tally) -> {
            int failures = tally == null || tally.expired(now, window) ? 1 : tally.failures() + 1;
            Instant firstAt = failures == 1 ? now : tally.firstAt();
            return new Tally(failures, firstAt, failures >= max ? now.plus(window) : null);
        });
    }

    private Instant lockedUntil(String key, Instant now) {
        var tally = tallies.get(key);
        return tally != null && tally.lockedUntil() != null && now.isBefore(tally.lockedUntil()) ? tally.lockedUntil() : null;
    }

    private static Instant later(Instant a, Instant b) {
        if (a == null) {
            return b;
        }
        return b == null || a.isAfter(b) ? a : b;
    }

    private static String userKey(String username) {
        return "user:" + (username == null ? "" : username.toLowerCase(Locale.ROOT));
    }

    private static String addressKey(String address) {
        return "address:" + (address == null ? "unknown" : address);
    }

    private record Tally(int failures, Instant firstAt, Instant lockedUntil) {

        /** A lock that has run out, or failures older than the window, start again from zero. */
        boolean expired(Instant now, Duration window) {
            return lockedUntil != null ? !now.isBefore(lockedUntil) : !now.isBefore(firstAt.plus(window));
        }
    }
}
