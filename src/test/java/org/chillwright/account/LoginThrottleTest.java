package org.chillwright.account;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneId;
import java.time.ZoneOffset;
import org.junit.jupiter.api.Test;

class LoginThrottleTest {

    private static final Duration WINDOW = Duration.ofMinutes(15);

    private final SteppingClock clock = new SteppingClock();
    private final LoginThrottle throttle = new LoginThrottle(3, 5, WINDOW, clock);

    private void fail(String username, String address, int times) {
        for (int i = 0; i < times; i++) {
            throttle.recordFailure(username, address);
        }
    }

    @Test
    void allowsFailuresBelowTheLimit() {
        fail("ana", "10.0.0.1", 2);
        assertThat(throttle.lockedFor("ana", "10.0.0.1")).isEmpty();
    }

    @Test
    void locksTheNameWhenItsLimitIsReached() {
        fail("ana", "10.0.0.1", 3);
        assertThat(throttle.lockedFor("ana", "10.0.0.2")).hasValue(WINDOW);
    }

    @Test
    void nameIsComparedWithoutCase() {
        fail("Ana", "10.0.0.1", 3);
        assertThat(throttle.lockedFor("ana", "10.0.0.9")).isPresent();
    }

    @Test
    void locksTheAddressForEveryNameWhenItsLimitIsReached() {
        for (int i = 0; i < 5; i++) {
            throttle.recordFailure("guess-" + i, "10.0.0.7");
        }
        assertThat(throttle.lockedFor("someone-else", "10.0.0.7")).isPresent();
    }

    @Test
    void lockEndsAfterTheWindow() {
        fail("ana", "10.0.0.1", 3);
        clock.advance(WINDOW);
        assertThat(throttle.lockedFor("ana", "10.0.0.1")).isEmpty();
    }

    @Test
    void failuresOlderThanTheWindowAreForgotten() {
        fail("ana", "10.0.0.1", 2);
        clock.advance(WINDOW.plusSeconds(1));
        fail("ana", "10.0.0.1", 2);
        assertThat(throttle.lockedFor("ana", "10.0.0.1")).isEmpty();
    }

    @Test
    void successClearsTheNameButNotTheAddress() {
        fail("ana", "10.0.0.1", 2);
        throttle.recordSuccess("ana");
        fail("ana", "10.0.0.1", 2);
        assertThat(throttle.lockedFor("ana", "10.0.0.2")).isEmpty();
        throttle.recordFailure("ben", "10.0.0.1");
        assertThat(throttle.lockedFor("carl", "10.0.0.1")).isPresent();
    }

    /** A clock that moves only when told to. */
    static final class SteppingClock extends Clock {

        private Instant now = Instant.parse("2026-03-02T09:00:00Z");

        void advance(Duration step) {
            now = now.plus(step);
        }

        @Override
        public ZoneId getZone() {
            return ZoneOffset.UTC;
        }

        @Override
        public Clock withZone(ZoneId zone) {
            return this;
        }

        @Override
        public Instant instant() {
            return now;
        }
    }
}
