package org.chillwright.web;

import io.swagger.v3.oas.models.Operation;
import io.swagger.v3.oas.models.headers.Header;
import io.swagger.v3.oas.models.media.Content;
import io.swagger.v3.oas.models.media.IntegerSchema;
import io.swagger.v3.oas.models.media.MediaType;
import io.swagger.v3.oas.models.media.Schema;
import io.swagger.v3.oas.models.media.StringSchema;
import io.swagger.v3.oas.models.parameters.RequestBody;
import io.swagger.v3.oas.models.responses.ApiResponse;
import io.swagger.v3.oas.models.responses.ApiResponses;
import java.lang.reflect.RecordComponent;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.springdoc.core.customizers.OperationCustomizer;
import org.springframework.core.DefaultParameterNameDiscoverer;
import org.springframework.core.MethodParameter;
import org.springframework.core.annotation.AnnotatedElementUtils;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestMethod;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.method.HandlerMethod;

/**
 * What every operation of the document says beside its success answer, derived from the handler itself so that
 * no route can forget it: each error status it can answer, with the RFC 9457 problem body
 * ({@code application/problem+json}, schema {@value #PROBLEM}); and CSV where the route reads or writes CSV.
 * <ul>
 * <li>400 where it reads a body or a parameter (bad input, named field by field in {@code errors});</li>
 * <li>401 and 429 everywhere: any request may carry credentials, and wrong ones are refused, and throttled; 406
 * everywhere: an Accept header may allow none of the route's media types;</li>
 * <li>403 and 409 where an account's role is checked ({@code @PreAuthorize}) and the request changes something
 * (a role that may not; a stale version, a name taken, a state the workflow refuses); 403 alone on a read;</li>
 * <li>404 where the request names a record: in its address, or by an id in its body ({@code moduleId},
 * {@code listId}, at any depth); 415 where it reads a body.</li>
 * </ul>
 */
class ApiOperations implements OperationCustomizer {

    static final String PROBLEM = "Problem";
    static final String PROBLEM_JSON = "application/problem+json";
    static final String TEXT_CSV = "text/csv";

    @Override
    public Operation customize(Operation operation, HandlerMethod handler) {
        var mapping = AnnotatedElementUtils.findMergedAnnotation(handler.getMethod(), RequestMapping.class);
        List<String> consumes = mapping == null ? List.of() : Arrays.asList(mapping.consumes());
        List<String> produces = mapping == null ? List.of() : Arrays.asList(mapping.produces());
        boolean write = mapping != null && Arrays.stream(mapping.method()).anyMatch(m -> m != RequestMethod.GET);
        boolean readsBody = operation.getRequestBody() != null || !consumes.isEmpty();
        boolean readsParameters = Arrays.stream(handler.getMethodParameters()).anyMatch(ApiOperations::isParameter);
        boolean addressNamesRecord = Arrays.stream(handler.getMethodParameters())
                .anyMatch(p -> p.hasParameterAnnotation(PathVariable.class));
        boolean bodyNamesRecord = Arrays.stream(handler.getMethodParameters())
                .filter(p -> p.hasParameterAnnotation(org.springframework.web.bind.annotation.RequestBody.class))
                .anyMatch(p -> namesRecord(p.getParameterType(), new HashSet<>()));
        boolean roleChecked = AnnotatedElementUtils.hasAnnotation(handler.getMethod(), PreAuthorize.class)
                || AnnotatedElementUtils.hasAnnotation(handler.getBeanType(), PreAuthorize.class);

        if (operation.getParameters() != null) {
            for (MethodParameter parameter : handler.getMethodParameters()) {
                parameter.initParameterNameDiscovery(new DefaultParameterNameDiscoverer());
                operation.getParameters().stream().filter(p -> p.getName().equals(parameter.getParameterName()))
                        .forEach(p -> ApiSchemas.bounds(parameter::getParameterAnnotation, p.getSchema()));
            }
        }
        if (consumes.contains(TEXT_CSV) && operation.getRequestBody() == null) {
            operation.setRequestBody(new RequestBody().required(true)
                    .description("The CSV file, UTF-8, header row first")
                    .content(new Content().addMediaType(TEXT_CSV, new MediaType().schema(new StringSchema()))));
        }
        if (produces.contains(TEXT_CSV)) {
            csvAnswer(operation.getResponses());
        }
        var responses = operation.getResponses();
        if (readsBody || readsParameters || addressNamesRecord) {
            problem(responses, "400", "Bad input: the body, a parameter or the address could not be read or breaks a "
                    + "rule; errors names each field and what was expected");
        }
        problem(responses, "401", "Sign-in required: no credentials where this server needs them, or wrong ones");
        if (roleChecked) {
            problem(responses, "403", "The account's roles do not allow this request");
        }
        if (addressNamesRecord || bodyNamesRecord) {
            problem(responses, "404", "The request names a record (in its address or by an id in its body) that "
                    + "does not exist");
        }
        problem(responses, "406", "The Accept header allows none of the media types this route answers in");
        if (roleChecked && write) {
            problem(responses, "409", "Refused as it stands: a stale version (reload and apply again), a name already "
                    + "taken, or a change the workflow does not allow; the detail says which");
        }
        if (readsBody) {
            problem(responses, "415", "The body's Content-Type is not one this route reads");
        }
        problem(responses, "429", "Too many failed sign-ins for this user name or from this address: try again after "
                + "Retry-After seconds");
        responses.get("429").addHeaderObject("Retry-After", new Header()
                .description("Seconds until sign-ins are accepted again").schema(new IntegerSchema()));
        return operation;
    }

    /** Whether a request body of this type can carry the id of a stored record ({@code moduleId}, {@code listId}). */
    private static boolean namesRecord(Class<?> type, Set<Class<?>> seen) {
        if (!type.isRecord() || !seen.add(type)) {
            return false;
        }
        for (RecordComponent component : type.getRecordComponents()) {
            boolean id = component.getName().endsWith("Id")
                    && (component.getType() == Long.class || component.getType() == long.class);
            if (id || namesRecord(component.getType(), seen)) {
                return true;
            }
        }
        return false;
    }

    private static boolean isParameter(MethodParameter parameter) {
        return parameter.hasParameterAnnotation(RequestParam.class)
                || parameter.hasParameterAnnotation(PathVariable.class);
    }

    /** The CSV download: text, whichever status springdoc put first. */
    private static void csvAnswer(ApiResponses responses) {
        var ok = responses.entrySet().stream().filter(e -> e.getKey().startsWith("2")).findFirst()
                .map(java.util.Map.Entry::getValue).orElseGet(() -> {
                    var created = new ApiResponse().description("OK");
                    responses.addApiResponse("200", created);
                    return created;
                });
        var content = ok.getContent() == null ? new Content() : ok.getContent();
        content.remove("*/*");
        content.addMediaType(TEXT_CSV, new MediaType().schema(new StringSchema()));
        ok.setContent(content);
    }

    private static void problem(ApiResponses responses, String status, String description) {
        if (responses.containsKey(status)) {
            return;
        }
        responses.addApiResponse(status, new ApiResponse().description(description).content(new Content()
                .addMediaType(PROBLEM_JSON, new MediaType()
                        .schema(new Schema<>().$ref("#/components/schemas/" + PROBLEM)))));
    }
}
