package org.chillwright.openapi;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.fail;

import com.networknt.schema.InputFormat;
import com.networknt.schema.SchemaLocation;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SchemaRegistryConfig;
import com.networknt.schema.SpecificationVersion;
import io.swagger.v3.parser.OpenAPIV3Parser;
import io.swagger.v3.parser.core.models.ParseOptions;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockMvcRequestBuilders;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.SerializationFeature;
import tools.jackson.databind.json.JsonMapper;

/**
 * The OpenAPI document at {@code /v3/api-docs}: a valid OpenAPI 3.1 document by the reference parser and by the
 * official OpenAPI 3.1 JSON Schema, complete for every route (an id, JSON or CSV answers, a problem body for each
 * error status, an example request that fits), and the same as the committed copy {@value #COMMITTED_NAME}
 * that the build generates its Java client from.
 */
@SpringBootTest
@AutoConfigureMockMvc
class OpenApiDocumentTest {

    static final String COMMITTED_NAME = "docs/api/openapi.json";
    /** Where the served document is written, to review and copy over the committed one when they differ. */
    static final Path SERVED = Path.of("target/openapi.json");
    /**
     * The official schema of OpenAPI 3.1 documents, with the OpenAPI dialect for the schemas inside (OpenAPI
     * Initiative, spec.openapis.org/oas/3.1/schema-base/2022-10-07), as io.vertx:vertx-openapi carries it.
     */
    static final String OAS_31_SCHEMA = "https://spec.openapis.org/oas/3.1/schema-base/2022-10-07";
    /**
     * The regular-expression tokens JSON Schema asks schema authors to keep to, because ECMA-262 and other engines
     * read them alike (JSON Schema Core 2020-12, section 6.4 "Regular Expressions"): characters, simple and
     * complemented classes with ranges, the quantifiers, the anchors, groups and alternation. Escapes are allowed
     * for syntax characters, \r \n \t and \xHH; non-capturing groups (?:...) are ECMA-262 too.
     */
    static final Pattern INTEROPERABLE_REGEX = Pattern.compile(
            "(?:\\\\[\\\\^$.|?*+()\\[\\]{}/-]|\\\\[rnt]|\\\\x[0-9A-Fa-f]{2}|\\(\\?:|\\((?!\\?)|[^\\\\(])*");

    private static final JsonMapper PRETTY = JsonMapper.builder().enable(SerializationFeature.INDENT_OUTPUT).build();

    private static String served;
    private static JsonNode document;

    @Autowired
    MockMvc mvc;

    private String served() throws Exception {
        if (served == null) {
            String text = mvc.perform(MockMvcRequestBuilders.get("/v3/api-docs")).andReturn().getResponse()
                    .getContentAsString(StandardCharsets.UTF_8);
            document = ApiContract.JSON.readTree(text);
            served = PRETTY.writeValueAsString(document) + "\n";
            Files.createDirectories(SERVED.getParent());
            Files.writeString(SERVED, served, StandardCharsets.UTF_8);
        }
        return served;
    }

    @Test
    void theServedDocumentIsTheCommittedOne() throws Exception {
        String now = served();
        String committed = Files.readString(ApiContract.COMMITTED, StandardCharsets.UTF_8);
        assertThat(ApiContract.JSON.readTree(committed))
                .as("%s is not what the server serves. The served document is in %s: review the difference, then "
                        + "cp %s %s (the build generates its Java client from the committed copy)", COMMITTED_NAME,
                        SERVED, SERVED, COMMITTED_NAME)
                .isEqualTo(ApiContract.JSON.readTree(now));
    }

    @Test
    void isValidOpenApi31ForTheReferenceParser() throws Exception {
        var options = new ParseOptions();
        options.setResolve(true);
        var result = new OpenAPIV3Parser().readContents(served(), null, options);
        assertThat(result.getMessages()).isEmpty();
        assertThat(result.getOpenAPI().getOpenapi()).startsWith("3.1.");
    }

    @Test
    void isValidAgainstTheOfficialOpenApi31Schema() throws Exception {
        var schema = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12, builder -> builder
                        .schemaRegistryConfig(SchemaRegistryConfig.builder().formatAssertionsEnabled(true).build())
                        .schemaIdResolvers(ids -> ids.mapPrefix("https://spec.openapis.org/oas/3.1",
                                "classpath:spec.openapis.org/oas/3.1")))
                .getSchema(SchemaLocation.of(OAS_31_SCHEMA));
        assertThat(schema.validate(served(), InputFormat.JSON)).isEmpty();
    }

    @Test
    void patternsKeepToWhatEcma262AndJavaReadAlike() throws Exception {
        served();
        var patterns = new ArrayList<String>();
        collect(document, "pattern", patterns);
        assertThat(patterns).isNotEmpty().allSatisfy(p -> {
            assertThat(p).matches(INTEROPERABLE_REGEX);
            assertThat(p).as("anchored, since a JSON Schema pattern matches anywhere").startsWith("^").endsWith("$");
            Pattern.compile(p);
        });
    }

    @Test
    void everyOperationHasAStableIdJsonOrCsvAnswersAndProblemBodiesForItsErrors() throws Exception {
        served();
        var ids = new HashSet<String>();
        for (var route : new ApiContract(served).routes()) {
            String name = route.method() + " " + route.template();
            JsonNode operation = route.operation();
            assertThat(operation.path("operationId").asString()).as(name).matches("[a-z][A-Za-z]+");
            assertThat(ids.add(operation.path("operationId").asString())).as("unique id of " + name).isTrue();
            assertThat(operation.path("summary").asString()).as(name).isNotBlank();
            assertThat(operation.path("tags")).as(name).hasSize(1);
            operation.path("responses").properties().forEach(response -> {
                var content = response.getValue().path("content");
                if (response.getKey().startsWith("2")) {
                    assertThat(content.propertyNames()).as(name + " " + response.getKey())
                            .isSubsetOf("application/json", "text/csv", "application/pdf");
                } else {
                    assertThat(content.propertyNames()).as(name + " " + response.getKey())
                            .containsExactly("application/problem+json");
                    assertThat(content.path("application/problem+json").path("schema").path("$ref").asString())
                            .isEqualTo("#/components/schemas/Problem");
                }
            });
            assertThat(operation.path("responses").propertyNames()).as(name).contains("401", "429");
        }
    }

    @Test
    void everyOperationHasAnExampleRequestThatFitsItsSchemas() throws Exception {
        var contract = new ApiContract(served());
        for (var route : contract.routes()) {
            String name = route.method() + " " + route.template();
            String at = "#/paths/" + ApiContract.escape(route.template()) + "/" + route.method().toLowerCase();
            route.operation().path("requestBody").path("content").properties().forEach(media -> {
                JsonNode example = media.getValue().get("example");
                assertThat(example).as("example body of " + name).isNotNull();
                if (media.getKey().equals("application/json")) {
                    assertThat(contract.schemaAt(at + "/requestBody/content/application~1json/schema").validate(example))
                            .as("example body of " + name).isEmpty();
                }
            });
            var parameters = route.operation().path("parameters");
            for (int i = 0; i < parameters.size(); i++) {
                JsonNode parameter = parameters.get(i);
                JsonNode example = parameter.get("example");
                if (parameter.path("required").asBoolean(false)) {
                    assertThat(example).as("example of " + name + " " + parameter.path("name").asString()).isNotNull();
                }
                if (example != null) {
                    assertThat(contract.schemaAt(at + "/parameters/" + i + "/schema").validate(example))
                            .as("example of " + name + " " + parameter.path("name").asString()).isEmpty();
                }
            }
        }
    }

    /** The computations store nothing, so their examples can run here; their answers are held to the document. */
    @Test
    void theComputationExamplesRunAsDocumented() throws Exception {
        var contract = new ApiContract(served());
        int ran = 0;
        for (var route : contract.routes()) {
            boolean open = route.operation().path("security").toString().contains("{}");
            JsonNode example = route.operation().path("requestBody").path("content").path("application/json")
                    .get("example");
            if (!open || !route.method().equals("POST") || example == null) {
                continue;
            }
            int status = mvc.perform(MockMvcRequestBuilders.post(route.template()).contentType(MediaType.APPLICATION_JSON)
                    .content(example.toString())).andReturn().getResponse().getStatus();
            assertThat(status).as(route.template()).isEqualTo(200);
            ran++;
        }
        assertThat(ran).as("computations with an example").isGreaterThanOrEqualTo(7);
    }

    @Test
    void fieldsThatCanBeNullSayNull() throws Exception {
        served();
        JsonNode schemas = document.path("components").path("schemas");
        for (var property : List.of(Map.entry("OperatingPointResponse", "dewPointC"),
                Map.entry("RankingResponseCandidate", "dewPointC"), Map.entry("ConstructionInputs", "legAreaNMm2"),
                Map.entry("OperatingPointResponse", "frostPointC"), Map.entry("AuditView", "from"))) {
            JsonNode schema = schemas.path(property.getKey()).path("properties").path(property.getValue());
            assertThat(schema.path("type").toString()).as(property.toString()).contains("\"null\"");
        }
        assertThat(schemas.path("RankingResponseCandidate").path("properties").path("reason").path("anyOf").toString())
                .contains("#/components/schemas/OperatingPointResponseReasonJson", "\"null\"");
        assertThat(schemas.path("RankingResponseCandidate").path("properties").path("partNumber").path("type")
                .toString()).doesNotContain("null");
    }

    @Test
    void answersRequireWhatIsAlwaysThereAndBoundsStayExclusive() throws Exception {
        served();
        JsonNode schemas = document.path("components").path("schemas");
        assertThat(schemas.path("OperatingPointResponse").path("required").toString())
                .contains("\"feasible\"", "\"warnings\"", "\"seriesCount\"", "\"dewPointC\"");
        assertThat(schemas.path("ModuleResponse").path("required").toString())
                .contains("\"id\"", "\"version\"", "\"archived\"").doesNotContain("\"description\"");
        assertThat(schemas.path("RankingRequest").path("required").toString())
                .as("a request requires only what its record requires").doesNotContain("\"limit\"");
        JsonNode ambient = schemas.path("OperatingPointRequest").path("properties").path("ambientC");
        assertThat(ambient.path("exclusiveMinimum").asDouble()).isEqualTo(-273.15);
        assertThat(ambient.has("minimum")).isFalse();
        assertThat(schemas.path("ModuleInput").path("properties").path("imaxA").path("exclusiveMinimum").asDouble())
                .isZero();
    }

    private static void collect(JsonNode node, String key, List<String> into) {
        if (node.isObject()) {
            node.properties().forEach(e -> {
                if (e.getKey().equals(key) && e.getValue().isString()) {
                    into.add(e.getValue().asString());
                } else {
                    collect(e.getValue(), key, into);
                }
            });
        } else if (node.isArray()) {
            node.forEach(child -> collect(child, key, into));
        } else if (!node.isValueNode() && !node.isMissingNode()) {
            fail("unexpected node " + node);
        }
    }
}
