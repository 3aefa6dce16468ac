package org.chillwright.openapi;

import com.networknt.schema.Schema;
import com.networknt.schema.SchemaLocation;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SchemaRegistryConfig;
import com.networknt.schema.dialect.Dialects;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.regex.Pattern;
import tools.jackson.core.JacksonException;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;

/**
 * The committed OpenAPI document as a contract that answers can be held to: for a request's method and path it
 * finds the operation and checks the answer's status (documented for that operation), its content type (one the
 * status documents) and its body (valid against that content's schema, JSON Schema 2020-12 with the OpenAPI 3.1
 * dialect, by com.networknt:json-schema-validator), and no field of the body may be one the schema does not name
 * (unless it says {@code additionalProperties}, as the problem body does). A path no operation matches must be
 * answered with an error problem body.
 */
public final class ApiContract {

    /** The committed copy of the document, which the build also generates the Java client from. */
    public static final Path COMMITTED = Path.of("docs/api/openapi.json");
    /** Where the document is said to live for its {@code $ref}s; mapped in memory, never fetched. */
    static final String BASE = "https://chillwright.invalid/openapi.json";
    static final ObjectMapper JSON = JsonMapper.builder().build();

    private static volatile ApiContract committed;

    private final JsonNode document;
    private final SchemaRegistry registry;
    private final List<Route> routes = new ArrayList<>();
    private final Map<String, Schema> schemas = new ConcurrentHashMap<>();
    private final AtomicInteger adHoc = new AtomicInteger();

    /** One operation: its method, path template and the regular expression a request path must match. */
    record Route(String method, String template, Pattern path, JsonNode operation) {
    }

    ApiContract(String documentText) {
        this.document = JSON.readTree(documentText);
        var config = SchemaRegistryConfig.builder().formatAssertionsEnabled(true).build();
        this.registry = SchemaRegistry.withDefaultDialect(Dialects.getOpenApi31(), builder -> builder
                .schemaRegistryConfig(config).schemas(Map.of(BASE, documentText)));
        document.path("paths").properties().forEach(path -> path.getValue().properties().forEach(operation -> {
            String regex = Pattern.quote(path.getKey()).replaceAll("\\{[^}/]+}", "\\\\E[^/]+\\\\Q");
            routes.add(new Route(operation.getKey().toUpperCase(Locale.ROOT), path.getKey(), Pattern.compile(regex),
                    operation.getValue()));
        }));
    }

    /** The committed document, read once per JVM. */
    public static ApiContract committed() {
        if (committed == null) {
            synchronized (ApiContract.class) {
                if (committed == null) {
                    try {
                        committed = new ApiContract(Files.readString(COMMITTED, StandardCharsets.UTF_8));
                    } catch (IOException e) {
                        throw new UncheckedIOException("cannot read " + COMMITTED, e);
                    }
                }
            }
        }
        return committed;
    }

    JsonNode document() {
        return document;
    }

    List<Route> routes() {
        return routes;
    }

    Optional<Route> route(String method, String path) {
        return routes.stream().filter(r -> r.method().equals(method) && r.path().matcher(path).matches()).findFirst();
    }

    /**
     * What is wrong with an answer, as sentences; empty when the document describes it.
     *
     * @param bodyFollows the body is written later (an error the servlet container answers on its own dispatch),
     *                    so only the status can be checked now
     */
    public List<String> violations(String method, String path, int status, String contentType, byte[] body,
                                   boolean bodyFollows) {
        var found = route(method, path);
        String what = method + " " + path + " answered " + status;
        if (found.isEmpty()) {
            if (status < 400) {
                return List.of(what + ", but the document has no such operation");
            }
            return bodyFollows || body.length == 0 ? List.of() : checkBody(what, "#/components/schemas/Problem",
                    "application/problem+json", contentType, body);
        }
        var route = found.get();
        JsonNode response = route.operation().path("responses").get(String.valueOf(status));
        if (response == null) {
            response = route.operation().path("responses").get("default");
        }
        if (response == null) {
            return List.of(what + ", a status the document does not give for " + route.method() + " "
                    + route.template());
        }
        JsonNode content = response.get("content");
        if (bodyFollows) {
            return List.of();
        }
        if (body.length == 0) {
            return content == null || content.isEmpty() ? List.of()
                    : List.of(what + " without a body, but the document gives one");
        }
        if (content == null || content.isEmpty()) {
            return List.of(what + " with a body, but the document gives none");
        }
        String mediaType = mediaType(contentType);
        JsonNode media = content.get(mediaType);
        if (media == null) {
            return List.of(what + " as " + contentType + ", but the document gives " + names(content));
        }
        if (!mediaType.equals("application/json") && !mediaType.endsWith("+json")) {
            return List.of();
        }
        String pointer = "#/paths/" + escape(route.template()) + "/" + route.method().toLowerCase(Locale.ROOT)
                + "/responses/" + status + "/content/" + escape(mediaType) + "/schema";
        return checkBody(what, pointer, mediaType, contentType, body);
    }

    private List<String> checkBody(String what, String pointer, String expectedMediaType, String contentType,
                                   byte[] body) {
        if (!expectedMediaType.equals(mediaType(contentType))) {
            return List.of(what + " as " + contentType + ", expected " + expectedMediaType);
        }
        JsonNode value;
        try {
            value = JSON.readTree(body);
        } catch (JacksonException e) {
            return List.of(what + " with a body that is not JSON");
        }
        var found = new ArrayList<String>();
        schemaAt(pointer).validate(value).forEach(e -> found.add(what + ": " + e.getInstanceLocation() + " "
                + e.getMessage() + " (schema " + e.getSchemaLocation() + ")"));
        if (found.isEmpty()) {
            undocumentedFields(document.at(pointer.substring(1)), value, "$", what, found);
        }
        return found;
    }

    /** Fields of an answer that its (valid) schema does not name: the document would not tell a client of them. */
    private void undocumentedFields(JsonNode schema, JsonNode value, String at, String what, List<String> found) {
        schema = resolve(schema);
        if (schema.has("anyOf")) {
            for (JsonNode branch : schema.get("anyOf")) {
                JsonNode resolved = resolve(branch);
                if (value.isNull() == resolved.path("type").asString("").equals("null")) {
                    undocumentedFields(resolved, value, at, what, found);
                    return;
                }
            }
            return;
        }
        if (value.isObject() && schema.has("properties")) {
            JsonNode properties = schema.get("properties");
            boolean open = schema.has("additionalProperties") && !schema.get("additionalProperties").equals(
                    JSON.getNodeFactory().booleanNode(false));
            value.properties().forEach(field -> {
                if (properties.has(field.getKey())) {
                    undocumentedFields(properties.get(field.getKey()), field.getValue(), at + "." + field.getKey(),
                            what, found);
                } else if (!open) {
                    found.add(what + ": " + at + "." + field.getKey() + " is a field the document does not name");
                }
            });
        } else if (value.isArray() && schema.has("items")) {
            for (int i = 0; i < value.size(); i++) {
                undocumentedFields(schema.get("items"), value.get(i), at + "[" + i + "]", what, found);
            }
        }
    }

    private JsonNode resolve(JsonNode schema) {
        while (schema.has("$ref") && schema.get("$ref").asString().startsWith("#/")) {
            schema = document.at(schema.get("$ref").asString().substring(1));
        }
        return schema;
    }

    /** The schema at a JSON pointer into the document, its references resolved in the document. */
    Schema schemaAt(String pointer) {
        return schemas.computeIfAbsent(pointer, p -> {
            JsonNode node = document.at(p.substring(1));
            if (node.isMissingNode()) {
                throw new IllegalArgumentException("the document has nothing at " + p);
            }
            return registry.getSchema(SchemaLocation.of("https://chillwright.invalid/part-" + adHoc.incrementAndGet()),
                    absoluteRefs(node.deepCopy()));
        });
    }

    /** Points every local {@code $ref} of a copied part at the document, where the part came from. */
    private static JsonNode absoluteRefs(JsonNode node) {
        if (node instanceof ObjectNode object) {
            JsonNode ref = object.get("$ref");
            if (ref != null && ref.isString() && ref.asString().startsWith("#")) {
                object.put("$ref", BASE + ref.asString());
            }
            object.properties().forEach(e -> absoluteRefs(e.getValue()));
        } else if (node.isArray()) {
            node.forEach(ApiContract::absoluteRefs);
        }
        return node;
    }

    static String mediaType(String contentType) {
        if (contentType == null) {
            return "";
        }
        int semicolon = contentType.indexOf(';');
        return (semicolon < 0 ? contentType : contentType.substring(0, semicolon)).trim().toLowerCase(Locale.ROOT);
    }

    static String escape(String pointerToken) {
        return pointerToken.replace("~", "~0").replace("/", "~1");
    }

    private static String names(JsonNode content) {
        var names = new ArrayList<String>();
        content.propertyNames().forEach(names::add);
        return String.join(", ", names);
    }
}
