package org.chillwright.web;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.request;

import java.util.Arrays;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.beans.factory.annotation.Qualifier;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.HttpMethod;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.servlet.mvc.method.annotation.RequestMappingHandlerMapping;

/**
 * Every JSON route of the API, found from the application's own handler mappings so that a new route
 * is covered without editing this test: a malformed body and a body of the wrong shape are each a 400
 * problem body, never a 500.
 */
@SpringBootTest
@AutoConfigureMockMvc
class EveryApiRouteRefusesBadBodiesTest {

    private static final String[] BAD_BODIES = {"{\"broken\": ", "[1, 2, 3]", "\"text\""};

    @Autowired
    MockMvc mvc;
    @Autowired
    @Qualifier("requestMappingHandlerMapping")
    RequestMappingHandlerMapping mapping;

    /** (method, path) of every API route that reads a JSON body; path variables set to 1. */
    private Stream<String[]> jsonBodyRoutes() {
        return mapping.getHandlerMethods().entrySet().stream()
                .filter(e -> Arrays.stream(e.getValue().getMethodParameters())
                        .anyMatch(p -> p.hasParameterAnnotation(RequestBody.class)))
                .flatMap(e -> e.getKey().getPathPatternsCondition().getPatternValues().stream()
                        .filter(path -> path.startsWith("/api/") && !path.endsWith("/import")) // text/csv
                        .flatMap(path -> e.getKey().getMethodsCondition().getMethods().stream()
                                .map(m -> new String[] {m.name(), path.replaceAll("\\{[^}]+}", "1")})));
    }

    @TestFactory
    Stream<DynamicTest> badBodiesAreA400ProblemOnEveryRoute() {
        var routes = jsonBodyRoutes().toList();
        assertThat(routes).as("the API's JSON routes").hasSizeGreaterThan(10);
        return routes.stream().flatMap(route -> Arrays.stream(BAD_BODIES).map(body -> DynamicTest.dynamicTest(
                route[0] + " " + route[1] + " with " + body, () -> {
                    var response = mvc.perform(request(HttpMethod.valueOf(route[0]), route[1])
                            .with(httpBasic("admin", "admin-test-password"))
                            .contentType(MediaType.APPLICATION_JSON).content(body)).andReturn().getResponse();
                    assertThat(response.getStatus()).as("status").isEqualTo(400);
                    assertThat(response.getContentType()).startsWith(MediaType.APPLICATION_PROBLEM_JSON_VALUE);
                    assertThat(response.getContentAsString()).contains("\"errors\"").doesNotContain("Exception");
                })));
    }
}
