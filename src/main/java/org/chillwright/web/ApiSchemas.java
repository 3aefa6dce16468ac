package org.chillwright.web;

import com.fasterxml.jackson.annotation.JsonUnwrapped;
import io.swagger.v3.core.converter.AnnotatedType;
import io.swagger.v3.core.converter.ModelConverter;
import io.swagger.v3.core.converter.ModelConverterContext;
import io.swagger.v3.core.util.Json;
import io.swagger.v3.oas.models.OpenAPI;
import io.swagger.v3.oas.models.media.Schema;
import jakarta.annotation.Nullable;
import java.lang.reflect.RecordComponent;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

/**
 * How the API's records become the document's schemas, in one place.
 * <ul>
 * <li><b>Names.</b> A record nested in another is named after both ({@code RankingResponse.Candidate} is
 * {@code RankingResponseCandidate}; a trailing {@code ApiController} is dropped, so {@code ModuleApiController
 * .ImportResponse} is {@code ModuleImportResponse}). By simple name alone the rankings' and the harvest's
 * {@code Candidate} were one schema, and one of them was described wrongly.</li>
 * <li><b>Nulls.</b> A record component that may be null carries {@link Nullable}; its property then admits
 * {@code null} (OpenAPI 3.1: {@code "null"} in the type, in an enum's values, or beside a reference as
 * {@code anyOf}). Properties of a component marked {@link JsonUnwrapped} are found in the unwrapped record.</li>
 * </ul>
 * Schema names are a function of the class, so the register of which class a name stands for holds the same
 * entries whichever application context filled it (springdoc keeps converters in one registry per JVM).
 */
class ApiSchemas implements ModelConverter {

    private static final String PROJECT_PACKAGE = "org.chillwright.";
    private static final String NULL = "null";
    private static final Map<String, Class<?>> CLASSES_BY_NAME = new ConcurrentHashMap<>();

    @Override
    public Schema<?> resolve(AnnotatedType type, ModelConverterContext context, Iterator<ModelConverter> chain) {
        Class<?> raw = Json.mapper().constructType(type.getType()).getRawClass();
        if (raw.getName().startsWith(PROJECT_PACKAGE) && raw.isRecord()) {
            String name = nameOf(raw);
            Class<?> before = CLASSES_BY_NAME.putIfAbsent(name, raw);
            if (before != null && before != raw) {
                throw new IllegalStateException("Two API records would share the schema name " + name + ": "
                        + before.getName() + " and " + raw.getName());
            }
            if (raw.getEnclosingClass() != null && (type.getName() == null || type.getName().isBlank())) {
                type.name(name);
            }
        }
        return chain.hasNext() ? chain.next().resolve(type, context, chain) : null;
    }

    /** The schema name of an API record. */
    static String nameOf(Class<?> type) {
        Class<?> outer = type.getEnclosingClass();
        if (outer == null) {
            return type.getSimpleName();
        }
        String prefix = outer.getSimpleName();
        if (prefix.endsWith("ApiController")) {
            prefix = prefix.substring(0, prefix.length() - "ApiController".length());
        }
        return prefix + type.getSimpleName();
    }

    /** Makes every property whose record component is {@link Nullable} admit {@code null}. */
    @SuppressWarnings("rawtypes")
    static void admitNulls(OpenAPI document) {
        if (document.getComponents() == null || document.getComponents().getSchemas() == null) {
            return;
        }
        Map<String, Schema> schemas = document.getComponents().getSchemas();
        schemas.forEach((name, schema) -> {
            Class<?> type = CLASSES_BY_NAME.get(name);
            Map<String, Schema> properties = schema.getProperties();
            if (type == null || properties == null) {
                return;
            }
            // swagger-core marks the referenced record itself when a property of its type is @Nullable; the record
            // is an object, and the property (below) is what may be null
            schema.setTypes(new LinkedHashSet<>(List.of("object")));
            for (String property : List.copyOf(properties.keySet())) {
                if (component(type, property).map(c -> c.isAnnotationPresent(Nullable.class)).orElse(false)) {
                    properties.put(property, admitNull(properties.get(property)));
                }
            }
        });
    }

    /** The record component behind a JSON property, looking into unwrapped components too. */
    private static Optional<RecordComponent> component(Class<?> type, String property) {
        if (!type.isRecord()) {
            return Optional.empty();
        }
        for (RecordComponent component : type.getRecordComponents()) {
            if (component.getName().equals(property) && !unwrapped(component)) {
                return Optional.of(component);
            }
        }
        for (RecordComponent component : type.getRecordComponents()) {
            if (unwrapped(component)) {
                var inner = component(component.getType(), property);
                if (inner.isPresent()) {
                    return inner;
                }
            }
        }
        return Optional.empty();
    }

    /** {@link JsonUnwrapped} does not target record components, so it lands on the accessor. */
    private static boolean unwrapped(RecordComponent component) {
        return component.getAccessor().isAnnotationPresent(JsonUnwrapped.class);
    }

    @SuppressWarnings({"rawtypes", "unchecked"})
    private static Schema<?> admitNull(Schema property) {
        if (property.get$ref() != null) {
            var either = new Schema<>();
            either.setAnyOf(new ArrayList<>(List.of(new Schema<>().$ref(property.get$ref()), nullSchema())));
            either.setDescription(property.getDescription());
            return either;
        }
        Set<String> types = property.getTypes();
        if (types != null && !types.contains(NULL)) {
            property.addType(NULL);
        }
        if (property.getEnum() != null && !property.getEnum().contains(null)) {
            property.getEnum().add(null);
        }
        return property;
    }

    private static Schema<?> nullSchema() {
        var schema = new Schema<>();
        schema.addType(NULL);
        return schema;
    }
}
