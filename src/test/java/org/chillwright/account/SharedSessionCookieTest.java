package org.chillwright.account;

import static org.assertj.core.api.Assertions.assertThat;
import static org.chillwright.account.SessionCookieTest.loginPage;
import static org.chillwright.account.SessionCookieTest.sessionCookie;

import org.junit.jupiter.api.Test;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.test.context.ActiveProfiles;

/**
 * The team deployment's session cookie (Spring Session's SESSION, kept in the database): the postgres
 * profile as deployed, with its forwarded-header trust, but on an in-memory database so that this runs
 * with the unit tests. HttpOnly and SameSite=Lax always; Secure when the balancer received HTTPS.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT, properties = {
    "spring.datasource.url=jdbc:h2:mem:shared-session-${random.uuid};DB_CLOSE_DELAY=-1",
    "spring.datasource.username=sa", "spring.datasource.password="})
@ActiveProfiles("postgres")
class SharedSessionCookieTest {

    @LocalServerPort
    int port;

    @Test
    void sessionCookieIsHttpOnlyAndSameSiteLaxButNotSecureOverPlainHttp() throws Exception {
        String cookie = sessionCookie(loginPage(port), "SESSION");
        assertThat(cookie).contains("HttpOnly", "SameSite=Lax").doesNotContain("Secure");
    }

    @Test
    void behindABalancerThatReceivedHttpsTheCookieIsSecure() throws Exception {
        var response = loginPage(port, "X-Forwarded-Proto", "https");
        assertThat(sessionCookie(response, "SESSION")).contains("Secure", "HttpOnly", "SameSite=Lax");
        assertThat(response.headers().firstValue("Strict-Transport-Security")).isPresent();
    }
}
