package org.chillwright.account;

import static org.assertj.core.api.Assertions.assertThat;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import org.junit.jupiter.api.Test;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;

/**
 * The embedded default's session cookie (the servlet container's JSESSIONID), over real HTTP since the
 * container writes it: HttpOnly and SameSite=Lax always; Secure and HSTS when the request arrived over
 * HTTPS, here as a balancer on the loopback address reports it with X-Forwarded-Proto (trusted with
 * {@code server.forward-headers-strategy=native}, as the postgres profile sets it).
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT,
        properties = "server.forward-headers-strategy=native")
class SessionCookieTest {

    @LocalServerPort
    int port;

    static HttpResponse<String> loginPage(int port, String... headers) throws Exception {
        var request = HttpRequest.newBuilder(URI.create("http://localhost:" + port + "/login"));
        if (headers.length > 0) {
            request.headers(headers);
        }
        return HttpClient.newHttpClient().send(request.build(), HttpResponse.BodyHandlers.ofString());
    }

    static String sessionCookie(HttpResponse<?> response, String name) {
        return response.headers().allValues("Set-Cookie").stream().filter(c -> c.startsWith(name + "=")).findFirst()
                .orElseThrow(() -> new AssertionError("no " + name + " cookie in " + response.headers().map()));
    }

    @Test
    void sessionCookieIsHttpOnlyAndSameSiteLaxButNotSecureOverPlainHttp() throws Exception {
        var response = loginPage(port);
        String cookie = sessionCookie(response, "JSESSIONID");
        assertThat(cookie).contains("HttpOnly", "SameSite=Lax").doesNotContain("Secure");
        assertThat(response.headers().firstValue("Strict-Transport-Security")).isEmpty();
    }

    @Test
    void behindABalancerThatReceivedHttpsTheCookieIsSecureAndHstsIsSent() throws Exception {
        var response = loginPage(port, "X-Forwarded-Proto", "https", "X-Forwarded-For", "203.0.113.7");
        assertThat(sessionCookie(response, "JSESSIONID")).contains("Secure", "HttpOnly", "SameSite=Lax");
        assertThat(response.headers().firstValue("Strict-Transport-Security"))
                .hasValue("max-age=31536000 ; includeSubDomains");
    }
}
