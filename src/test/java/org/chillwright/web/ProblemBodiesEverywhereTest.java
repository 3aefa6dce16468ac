package org.chillwright.web;

import static org.assertj.core.api.Assertions.assertThat;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.util.Base64;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.context.TestConfiguration;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.context.annotation.Import;
import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.RestController;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;

/**
 * Over real HTTP, so that the servlet container's error dispatch runs as in production: every 4xx and 5xx
 * under /api/ is an RFC 9457 problem body (application/problem+json with type, title, status and detail),
 * also when no controller was reached, and pages get the friendly error page instead.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@Import(ProblemBodiesEverywhereTest.Failing.class)
class ProblemBodiesEverywhereTest {

    private static final String ADMIN = "Basic " + Base64.getEncoder()
            .encodeToString("admin:admin-test-password".getBytes(StandardCharsets.UTF_8));
    private static final String INTERNALS = "database password is hunter2 at line 42";

    /** Routes that fail as a bug would, to see what the client gets. */
    @TestConfiguration
    static class Failing {

        @RestController
        static class FailingApi {
            @GetMapping("/api/v1/test-failure")
            String fail() {
                throw new IllegalStateException(INTERNALS);
            }
        }

        @Controller
        static class FailingPage {
            @GetMapping("/test-failure")
            String fail() {
                throw new IllegalStateException(INTERNALS);
            }
        }
    }

    @LocalServerPort
    int port;
    @Autowired
    ObjectMapper json;

    private final HttpClient http = HttpClient.newBuilder().followRedirects(HttpClient.Redirect.NEVER).build();

    private HttpResponse<String> send(String method, String path, String contentType, String body, String... headers)
            throws Exception {
        var request = HttpRequest.newBuilder(URI.create("http://localhost:" + port + path))
                .method(method, body == null ? HttpRequest.BodyPublishers.noBody() : HttpRequest.BodyPublishers.ofString(body));
        if (contentType != null) {
            request.header("Content-Type", contentType);
        }
        if (headers.length > 0) {
            request.headers(headers);
        }
        return http.send(request.build(), HttpResponse.BodyHandlers.ofString());
    }

    /** Asserts an RFC 9457 body with this status and returns it. */
    private JsonNode problem(HttpResponse<String> response, int status) throws Exception {
        assertThat(response.statusCode()).as(response.body()).isEqualTo(status);
        assertThat(response.headers().firstValue("Content-Type")).hasValueSatisfying(
                type -> assertThat(type).startsWith("application/problem+json"));
        var body = json.readTree(response.body());
        assertThat(body.get("status").asInt()).isEqualTo(status);
        assertThat(body.get("title").asString()).isNotBlank();
        assertThat(body.get("detail").asString()).isNotBlank();
        assertThat(response.body()).doesNotContain("Exception", "trace", "timestamp");
        return body;
    }

    private static String[] accepting(String accept) {
        return new String[] {"Authorization", ADMIN, "Accept", accept};
    }

    @Test
    void unknownApiRouteIsANotFoundProblem() throws Exception {
        var body = problem(send("GET", "/api/v1/no-such-thing", null, null, accepting("application/json")), 404);
        assertThat(body.get("detail").asString()).contains("no API route");
    }

    @Test
    void wrongMethodIsAMethodNotAllowedProblemNamingTheAllowedOnes() throws Exception {
        var response = send("DELETE", "/api/v1/lists", null, null, accepting("application/json"));
        var body = problem(response, 405);
        assertThat(response.headers().firstValue("Allow")).hasValueSatisfying(allow -> assertThat(allow).contains("GET", "POST"));
        // the order of the allowed methods is the container's, not ours
        assertThat(body.get("detail").asString()).contains("it takes ").contains("GET").contains("POST");
    }

    @Test
    void unsupportedMediaTypeIsAProblemWhetherTheRouteDeclaresItOrNot() throws Exception {
        // /api/v1/modules declares that it consumes JSON; /api/v1/lists finds out when reading the body
        problem(send("POST", "/api/v1/modules", "text/plain", "hello", accepting("application/json")), 415);
        problem(send("POST", "/api/v1/lists", "text/plain", "hello", accepting("application/json")), 415);
    }

    @Test
    void unacceptableMediaTypeIsAProblem() throws Exception {
        problem(send("GET", "/api/v1/lists", null, null, accepting("application/pdf")), 406);
    }

    @Test
    void missingSignInAndMissingRoleAreProblems() throws Exception {
        problem(send("GET", "/api/v1/lists", null, null, "Accept", "application/json"), 401);
        problem(send("GET", "/api/v1/lists", null, null, "Accept", "application/json", "Authorization",
                "Basic " + Base64.getEncoder().encodeToString("admin:wrong-password".getBytes(StandardCharsets.UTF_8))),
                401);
        problem(send("GET", "/api/v1/no-such-thing", null, null, "Accept", "application/json"), 401);
    }

    @Test
    void firewallRejectionsOfMalformedAddressesAreBadRequestProblems() throws Exception {
        for (String path : new String[] {"/api/v1/lists;param=1", "/api/v1/lists/%25", "/api/v1/lists/%2e%2e/users"}) {
            var body = problem(send("GET", path, null, null, accepting("application/json")), 400);
            assertThat(body.get("title").asString()).as(path).isEqualTo("Malformed request");
        }
    }

    @Test
    void anUnexpectedFailureIsAServerErrorProblemThatHidesItsCause() throws Exception {
        var response = send("GET", "/api/v1/test-failure", null, null, accepting("application/json"));
        problem(response, 500);
        assertThat(response.body()).doesNotContain(INTERNALS).doesNotContain("IllegalState");
    }

    @Test
    void problemsAnswerEvenAClientThatAcceptsOnlyHtml() throws Exception {
        problem(send("GET", "/api/v1/no-such-thing", null, null, accepting("text/html")), 404);
    }

    private static void assertFriendlyPage(HttpResponse<String> response, int status, String heading) {
        assertThat(response.statusCode()).isEqualTo(status);
        assertThat(response.headers().firstValue("Content-Type")).hasValueSatisfying(
                type -> assertThat(type).startsWith("text/html"));
        assertThat(response.body()).contains(heading, "Back to the home page")
                .doesNotContain("Exception", "Whitelabel", INTERNALS);
    }

    @Test
    void pagesGetTheFriendlyPageForEveryError() throws Exception {
        assertFriendlyPage(send("GET", "/no-such-page", null, null, "Accept", "application/json"), 404,
                "We could not find that page");
        // a form address typed into the browser: the route takes only POST
        assertFriendlyPage(send("GET", "/lists/1/entries", null, null, "Accept", "text/html"), 405,
                "That page does not take this kind of request");
        assertFriendlyPage(send("GET", "/lists;param=1", null, null, "Accept", "text/html"), 400,
                "That request could not be understood");
        assertFriendlyPage(send("GET", "/test-failure", null, null, "Accept", "text/html"), 500,
                "Something went wrong on our side");
    }
}
