package org.chillwright.web;

import com.fasterxml.jackson.databind.JsonNode;
import io.swagger.v3.core.util.Json;
import io.swagger.v3.oas.models.OpenAPI;
import io.swagger.v3.oas.models.Operation;
import io.swagger.v3.oas.models.PathItem;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Map;

/**
 * An example request for every route, kept in {@value #RESOURCE} under the route's method and path
 * ({@code "POST /api/v1/rankings"}): {@code body} is the request body (JSON, or the text of a CSV file) and
 * {@code parameters} gives a value for each path or query parameter named. Every example is invented data.
 * {@code OpenApiDocumentTest} checks that each route has one and that it fits the route's schemas, and runs the
 * computations' examples against the server.
 */
final class ApiExamples {

    static final String RESOURCE = "openapi/examples.json";

    private final JsonNode examples;

    private ApiExamples(JsonNode examples) {
        this.examples = examples;
    }

    static ApiExamples load() {
        try (InputStream in = ApiExamples.class.getClassLoader().getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException(RESOURCE + " is missing from the class path");
            }
            return new ApiExamples(Json.mapper().readTree(in));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + RESOURCE, e);
        }
    }

    void applyTo(OpenAPI document) {
        if (document.getPaths() == null) {
            return;
        }
        document.getPaths().forEach((path, item) -> {
            for (Map.Entry<PathItem.HttpMethod, Operation> entry : item.readOperationsMap().entrySet()) {
                JsonNode example = examples.get(entry.getKey() + " " + path);
                if (example != null) {
                    apply(entry.getValue(), example);
                }
            }
        });
    }

    private static void apply(Operation operation, JsonNode example) {
        JsonNode body = example.get("body");
        if (body != null && operation.getRequestBody() != null && operation.getRequestBody().getContent() != null) {
            operation.getRequestBody().getContent().values()
                    .forEach(media -> media.setExample(body.isTextual() ? body.textValue() : body));
        }
        JsonNode parameters = example.get("parameters");
        if (parameters != null && operation.getParameters() != null) {
            operation.getParameters().forEach(parameter -> {
                JsonNode value = parameters.get(parameter.getName());
                if (value != null) {
                    parameter.setExample(value.isTextual() ? value.textValue() : value);
                }
            });
        }
    }
}
