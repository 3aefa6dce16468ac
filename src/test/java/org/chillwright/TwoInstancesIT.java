package org.chillwright;

import static org.assertj.core.api.Assertions.assertThat;

import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.regex.Pattern;
import org.chillwright.approval.ApprovalFixtures;
import org.chillwright.approval.TestModuleDirectory;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.springframework.boot.builder.SpringApplicationBuilder;
import org.springframework.context.ConfigurableApplicationContext;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;

/**
 * Two application instances on one PostgreSQL database, as the team runs them behind a load
 * balancer: each sees the other's writes and sign-ins, and a stale edit through either is refused.
 */
class TwoInstancesIT {

    private static final String ADMIN_BASIC = basic("admin", "admin-test-password");
    private static final Pattern CSRF = Pattern.compile("name=\"_csrf\"\\s+value=\"([^\"]+)\"");
    private static final Pattern SESSION = Pattern.compile("SESSION=([^;]+)");

    private static ConfigurableApplicationContext first;
    private static ConfigurableApplicationContext second;
    private static String one;
    private static String two;

    private final HttpClient http = HttpClient.newBuilder().followRedirects(HttpClient.Redirect.NEVER).build();
    private final ObjectMapper json = new ObjectMapper();

    @BeforeAll
    static void startBoth() {
        var database = PostgresTestServer.newDatabase();
        first = start(database);
        second = start(database);
        one = "http://localhost:" + first.getEnvironment().getProperty("local.server.port");
        two = "http://localhost:" + second.getEnvironment().getProperty("local.server.port");
    }

    private static ConfigurableApplicationContext start(PostgresTestServer.Database database) {
        // command-line arguments outrank application-postgres.properties
        var arguments = new ArrayList<>(database.asArguments());
        arguments.addAll(List.of("--server.port=0", "--" + TestModuleDirectory.ENABLED));
        return new SpringApplicationBuilder(ChillwrightApplication.class).profiles("postgres")
                .run(arguments.toArray(String[]::new));
    }

    @AfterAll
    static void stopBoth() {
        second.close();
        first.close();
    }

    private static String basic(String username, String password) {
        return "Basic " + Base64.getEncoder().encodeToString((username + ":" + password).getBytes(StandardCharsets.UTF_8));
    }

    private HttpResponse<String> api(String base, String method, String path, String body) throws Exception {
        return api(base, method, path, body, ADMIN_BASIC);
    }

    private HttpResponse<String> api(String base, String method, String path, String body, String authorization)
            throws Exception {
        var request = HttpRequest.newBuilder(URI.create(base + path)).header("Authorization", authorization)
                .header("Content-Type", "application/json").header("Accept", "application/json")
                .method(method, body == null ? HttpRequest.BodyPublishers.noBody() : HttpRequest.BodyPublishers.ofString(body))
                .build();
        return http.send(request, HttpResponse.BodyHandlers.ofString());
    }

    private JsonNode created(String base, String path, String body) throws Exception {
        var response = api(base, "POST", path, body);
        assertThat(response.statusCode()).as(response.body()).isEqualTo(201);
        return json.readTree(response.body());
    }

    private JsonNode newList() throws Exception {
        return created(one, "/api/v1/lists", "{\"name\":\"" + ApprovalFixtures.unique("Shared line") + "\"}");
    }

    private static String sessionCookie(HttpResponse<?> response, String previous) {
        return response.headers().allValues("Set-Cookie").stream().map(SESSION::matcher).filter(m -> m.find())
                .map(m -> "SESSION=" + m.group(1)).findFirst().orElse(previous);
    }

    /** Signs in through the login form of one instance and returns the session cookie it hands out. */
    private String signInOn(String base) throws Exception {
        var page = http.send(HttpRequest.newBuilder(URI.create(base + "/login")).build(),
                HttpResponse.BodyHandlers.ofString());
        var token = CSRF.matcher(page.body());
        assertThat(token.find()).as("CSRF field on the login page").isTrue();
        String cookie = sessionCookie(page, null);
        String form = "username=admin&password=admin-test-password&_csrf="
                + URLEncoder.encode(token.group(1), StandardCharsets.UTF_8);
        var signIn = http.send(HttpRequest.newBuilder(URI.create(base + "/login")).header("Cookie", cookie)
                .header("Content-Type", "application/x-www-form-urlencoded")
                .POST(HttpRequest.BodyPublishers.ofString(form)).build(), HttpResponse.BodyHandlers.ofString());
        assertThat(signIn.headers().firstValue("Location")).as("signed in").hasValueSatisfying(
                location -> assertThat(location).doesNotContain("error"));
        return sessionCookie(signIn, cookie);
    }

    @Test
    void listCreatedOnOneInstanceIsReadOnTheOther() throws Exception {
        var list = newList();
        var read = api(two, "GET", "/api/v1/lists/" + list.get("id").asLong(), null);
        assertThat(json.readTree(read.body()).get("name").asString()).isEqualTo(list.get("name").asString());
    }

    @Test
    void signInOnOneInstanceIsHonouredByTheOther() throws Exception {
        String cookie = signInOn(one);
        var page = http.send(HttpRequest.newBuilder(URI.create(two + "/lists")).header("Cookie", cookie).build(),
                HttpResponse.BodyHandlers.ofString());
        assertThat(page.statusCode()).isEqualTo(200);
        assertThat(page.body()).contains("Approved part lists").contains("Sign out");
    }

    @Test
    void withoutTheSessionTheOtherInstanceAsksForSignIn() throws Exception {
        var page = http.send(HttpRequest.newBuilder(URI.create(two + "/lists")).header("Accept", "text/html").build(),
                HttpResponse.BodyHandlers.ofString());
        assertThat(page.statusCode()).isEqualTo(302);
    }

    @Test
    void staleEditSentToTheOtherInstanceIsRefused() throws Exception {
        var list = newList();
        long id = list.get("id").asLong();
        long version = list.get("version").asLong();
        var fresh = api(one, "PUT", "/api/v1/lists/" + id, "{\"name\":\"" + list.get("name").asString()
                + " A\",\"version\":" + version + "}");
        assertThat(fresh.statusCode()).isEqualTo(200);
        var stale = api(two, "PUT", "/api/v1/lists/" + id, "{\"name\":\"" + list.get("name").asString()
                + " B\",\"version\":" + version + "}");
        assertThat(stale.statusCode()).isEqualTo(409);
    }

    @Test
    void simultaneousApprovalsOnBothInstancesLetExactlyOneWin() throws Exception {
        var list = newList();
        long listId = list.get("id").asLong();
        var entry = created(one, "/api/v1/lists/" + listId + "/entries", "{\"moduleId\":" + TestModuleDirectory.ACTIVE + "}");
        String entryPath = "/api/v1/lists/" + listId + "/entries/" + entry.get("id").asLong() + "/transitions";
        var qualifying = json.readTree(api(one, "POST", entryPath, "{\"to\":\"QUALIFYING\",\"reason\":\"in test\"}").body());
        long version = qualifying.get("version").asLong();
        // the admin proposed and qualified it, so a second person approves (four eyes)
        String approver = ApprovalFixtures.unique("shared-approver");
        created(one, "/api/v1/users", "{\"username\":\"" + approver + "\",\"password\":\"" + ApprovalFixtures.PASSWORD
                + "\",\"roles\":[\"APPROVER\"]}");
        String approverBasic = basic(approver, ApprovalFixtures.PASSWORD);

        var statuses = Together.run(List.of(one, two).stream().<Callable<Integer>>map(
                base -> () -> api(base, "POST", entryPath, "{\"to\":\"APPROVED\",\"reason\":\"signed on " + base
                        + "\",\"version\":" + version + "}", approverBasic).statusCode()).toList());
        assertThat(statuses).containsExactlyInAnyOrder(200, 409);
    }
}
