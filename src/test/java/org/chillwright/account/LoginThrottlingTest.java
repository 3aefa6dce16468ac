package org.chillwright.account;

import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.EnumSet;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.RequestPostProcessor;

/** After too many wrong passwords even the right one is refused for a while, by form and by Basic alike. */
@SpringBootTest(properties = {"chillwright.login.max-failures-per-user=3", "chillwright.login.max-failures-per-address=6"})
@AutoConfigureMockMvc
class LoginThrottlingTest {

    private static final String PASSWORD = "throttle-test-password";

    @Autowired
    MockMvc mvc;
    @Autowired
    AccountService accounts;

    /** Each test signs in from its own made-up client address so their tallies stay apart. */
    private static RequestPostProcessor from(String address) {
        return request -> {
            request.setRemoteAddr(address);
            return request;
        };
    }

    private void failFormLogins(String username, String address, int times) throws Exception {
        for (int i = 0; i < times; i++) {
            mvc.perform(post("/login").with(csrf()).with(from(address)).param("username", username)
                    .param("password", "wrong-" + i)).andExpect(header().string("Location", "/login?error"));
        }
    }

    @Test
    void formLoginIsPausedAfterTooManyFailures() throws Exception {
        accounts.create("throttle-a", PASSWORD, EnumSet.of(Role.ENGINEER), "test-setup");
        failFormLogins("throttle-a", "192.0.2.1", 3);
        mvc.perform(post("/login").with(csrf()).with(from("192.0.2.1")).param("username", "throttle-a")
                        .param("password", PASSWORD))
                .andExpect(status().isFound())
                .andExpect(header().string("Location", "/login?locked"));
    }

    @Test
    void basicAuthIsAnsweredWith429AndRetryAfterOnceTheNameIsLocked() throws Exception {
        accounts.create("throttle-b", PASSWORD, EnumSet.of(Role.ENGINEER), "test-setup");
        failFormLogins("throttle-b", "192.0.2.2", 3);
        mvc.perform(get("/api/v1/lists").with(from("192.0.2.3")).with(httpBasic("throttle-b", PASSWORD)))
                .andExpect(status().isTooManyRequests())
                .andExpect(header().exists("Retry-After"))
                .andExpect(jsonPath("$.title").value("Too many failed sign-ins"));
    }

    @Test
    void anAddressThatGuessesManyNamesIsPaused() throws Exception {
        accounts.create("throttle-c", PASSWORD, EnumSet.of(Role.ENGINEER), "test-setup");
        for (int i = 0; i < 6; i++) {
            failFormLogins("nobody-" + i, "192.0.2.4", 1);
        }
        mvc.perform(post("/login").with(csrf()).with(from("192.0.2.4")).param("username", "throttle-c")
                        .param("password", PASSWORD))
                .andExpect(header().string("Location", "/login?locked"));
    }

    @Test
    void failuresBelowTheLimitStillLetTheRightPasswordIn() throws Exception {
        accounts.create("throttle-d", PASSWORD, EnumSet.of(Role.ENGINEER), "test-setup");
        failFormLogins("throttle-d", "192.0.2.5", 2);
        mvc.perform(post("/login").with(csrf()).with(from("192.0.2.5")).param("username", "throttle-d")
                        .param("password", PASSWORD))
                .andExpect(header().string("Location", "/"));
    }
}
