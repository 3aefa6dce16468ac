package org.chillwright.web;

import static org.assertj.core.api.Assertions.assertThat;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import org.junit.jupiter.api.Test;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;

/** The container's error dispatch (which MockMvc does not run) renders our page, never a stack trace. */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class ErrorPageTest {

    @LocalServerPort
    int port;

    private HttpResponse<String> get(String path, String accept, String... headers) throws Exception {
        var builder = HttpRequest.newBuilder(URI.create("http://localhost:" + port + path)).header("Accept", accept);
        if (headers.length > 0) {
            builder.headers(headers);
        }
        var request = builder.build();
        return HttpClient.newHttpClient().send(request, HttpResponse.BodyHandlers.ofString());
    }

    @Test
    void unknownPageShowsOurNotFoundPage() throws Exception {
        var response = get("/no-such-page", "text/html");
        assertThat(response.statusCode()).isEqualTo(404);
        assertThat(response.body()).contains("We could not find that page").contains("Back to the home page")
                .doesNotContain("Exception").doesNotContain("Whitelabel");
    }

    @Test
    void unknownApiRouteIsA404WithoutATrace() throws Exception {
        String basic = java.util.Base64.getEncoder().encodeToString("admin:admin-test-password".getBytes());
        var response = get("/api/v1/no-such-thing", "application/json", "Authorization", "Basic " + basic);
        assertThat(response.statusCode()).isEqualTo(404);
        assertThat(response.body()).doesNotContain("Exception").doesNotContain("trace");
    }
}
