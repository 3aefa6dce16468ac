package org.chillwright.web;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonUnwrapped;
import io.swagger.v3.core.converter.AnnotatedType;
import io.swagger.v3.core.converter.ModelConverter;
import io.swagger.v3.core.converter.ModelConverterContext;
import io.swagger.v3.core.util.Json;
import io.swagger.v3.oas.models.OpenAPI;
import io.swagger.v3.oas.models.media.Schema;
import jakarta.annotation.Nullable;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.PositiveOrZero;
import java.lang.annotation.Annotation;
import java.lang.reflect.RecordComponent;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Function;

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
 * <li><b>Presence.</b> In a record that only answers carry (no request body reaches it), every property that is
 * not left out when null ({@link JsonInclude}) is always there, if only as {@code null}, so it is required.</li>
 * <li><b>Bounds.</b> Bean Validation's exclusive bounds ({@code @DecimalMin(inclusive = false)},
 * {@code @Positive}, ...) become {@code exclusiveMinimum}/{@code exclusiveMaximum}; springdoc wrote them as
 * inclusive or not at all.</li>
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

    /** Completes the schema of every API record from its components: nulls, presence and exclusive bounds. */
    @SuppressWarnings("rawtypes")
    static void complete(OpenAPI document) {
        if (document.getComponents() == null || document.getComponents().getSchemas() == null) {
            return;
        }
        Map<String, Schema> schemas = document.getComponents().getSchemas();
        Set<String> requested = requestSide(document);
        schemas.forEach((name, schema) -> {
            Class<?> type = CLASSES_BY_NAME.get(name);
            Map<String, Schema> properties = schema.getProperties();
            if (type == null || properties == null) {
                return;
            }
            // swagger-core marks the referenced record itself when a property of its type is @Nullable; the record
            // is an object, and the property (below) is what may be null
            schema.setTypes(new LinkedHashSet<>(List.of("object")));
            var required = new ArrayList<String>(schema.getRequired() == null ? List.of() : schema.getRequired());
            for (String property : List.copyOf(properties.keySet())) {
                var component = component(type, property);
                if (component.isEmpty()) {
                    continue;
                }
                var accessor = component.get().getAccessor();
                bounds(accessor::getAnnotation, properties.get(property));
                boolean nullable = component.get().isAnnotationPresent(Nullable.class);
                if (nullable) {
                    properties.put(property, admitNull(properties.get(property)));
                }
                // Jackson writes every component, null or not, unless told to leave nulls out
                boolean alwaysThere = component.get().getType().isPrimitive() || !leftOutWhenNull(component.get());
                if (!requested.contains(name) && alwaysThere && !required.contains(property)) {
                    required.add(property);
                }
            }
            schema.setRequired(required.isEmpty() ? null : required);
        });
    }

    /** The exclusive (and the sign) bounds of a field or parameter, which springdoc does not carry over. */
    static void bounds(Function<Class<? extends Annotation>, Annotation> annotation, Schema<?> schema) {
        if (annotation.apply(DecimalMin.class) instanceof DecimalMin min && !min.inclusive()) {
            schema.setMinimum(null);
            schema.setExclusiveMinimumValue(new BigDecimal(min.value()));
        }
        if (annotation.apply(DecimalMax.class) instanceof DecimalMax max && !max.inclusive()) {
            schema.setMaximum(null);
            schema.setExclusiveMaximumValue(new BigDecimal(max.value()));
        }
        if (annotation.apply(Positive.class) != null && schema.getExclusiveMinimumValue() == null) {
            schema.setMinimum(null);
            schema.setExclusiveMinimumValue(BigDecimal.ZERO);
        }
        if (annotation.apply(PositiveOrZero.class) != null && schema.getMinimum() == null) {
            schema.setMinimum(BigDecimal.ZERO);
        }
    }

    /** Whether Jackson leaves the component out of the JSON when it is null. */
    private static boolean leftOutWhenNull(RecordComponent component) {
        JsonInclude own = component.getAccessor().getAnnotation(JsonInclude.class);
        JsonInclude record = component.getDeclaringRecord().getAnnotation(JsonInclude.class);
        JsonInclude rule = own != null ? own : record;
        return rule != null && rule.value() != JsonInclude.Include.ALWAYS
                && rule.value() != JsonInclude.Include.USE_DEFAULTS;
    }

    /** The schemas a request body or parameter can reach: their properties are the client's choice to send. */
    @SuppressWarnings("rawtypes")
    private static Set<String> requestSide(OpenAPI document) {
        var reached = new HashSet<String>();
        if (document.getPaths() != null) {
            document.getPaths().values().forEach(item -> item.readOperations().forEach(operation -> {
                if (operation.getRequestBody() != null && operation.getRequestBody().getContent() != null) {
                    operation.getRequestBody().getContent().values()
                            .forEach(media -> reach(media.getSchema(), document, reached));
                }
                if (operation.getParameters() != null) {
                    operation.getParameters().forEach(parameter -> reach(parameter.getSchema(), document, reached));
                }
            }));
        }
        return reached;
    }

    @SuppressWarnings({"rawtypes", "unchecked"})
    private static void reach(Schema schema, OpenAPI document, Set<String> reached) {
        if (schema == null) {
            return;
        }
        if (schema.get$ref() != null) {
            String name = schema.get$ref().substring(schema.get$ref().lastIndexOf('/') + 1);
            if (reached.add(name)) {
                reach(document.getComponents().getSchemas().get(name), document, reached);
            }
            return;
        }
        if (schema.getProperties() != null) {
            ((Map<String, Schema>) schema.getProperties()).values().forEach(p -> reach(p, document, reached));
        }
        reach(schema.getItems(), document, reached);
        for (List<Schema> branches : java.util.Arrays.asList(schema.getAnyOf(), schema.getOneOf(), schema.getAllOf())) {
            if (branches != null) {
                branches.forEach(b -> reach(b, document, reached));
            }
        }
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
