package org.chillwright.web;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import org.chillwright.physics.InvalidQuantityException;
import org.springframework.dao.OptimisticLockingFailureException;
import org.springframework.http.HttpHeaders;
import org.springframework.http.HttpStatus;
import org.springframework.http.HttpStatusCode;
import org.springframework.http.ProblemDetail;
import org.springframework.http.ResponseEntity;
import org.springframework.http.converter.HttpMessageNotReadableException;
import org.springframework.beans.TypeMismatchException;
import org.springframework.validation.FieldError;
import org.springframework.web.bind.MethodArgumentNotValidException;
import org.springframework.web.bind.MissingServletRequestParameterException;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.bind.annotation.RestController;
import org.springframework.web.bind.annotation.RestControllerAdvice;
import org.springframework.web.context.request.WebRequest;
import org.springframework.web.method.annotation.HandlerMethodValidationException;
import org.springframework.web.method.annotation.MethodArgumentTypeMismatchException;
import org.springframework.web.servlet.mvc.method.annotation.ResponseEntityExceptionHandler;
import tools.jackson.core.JacksonException;
import tools.jackson.core.exc.StreamReadException;
import tools.jackson.databind.exc.InvalidFormatException;
import tools.jackson.databind.exc.MismatchedInputException;
import tools.jackson.databind.exc.UnrecognizedPropertyException;

/**
 * Turns bad input on the API into 400 {@code application/problem+json} with an {@code errors} array
 * naming each bad field, unknown ids into 404 and stale or clashing edits into 409. Input never
 * reaches the user as a 500. A message may say what came in, except for a secret field
 * ({@link SecretFields}): a password or token is never echoed.
 */
@RestControllerAdvice(annotations = RestController.class)
public class ApiErrorAdvice extends ResponseEntityExceptionHandler {

    static final String ERRORS = "errors";

    @Override
    protected ResponseEntity<Object> handleMethodArgumentNotValid(MethodArgumentNotValidException ex,
            HttpHeaders headers, HttpStatusCode status, WebRequest request) {
        var problems = new ArrayList<FieldProblem>();
        Object target = ex.getBindingResult().getTarget();
        Class<?> type = target != null ? target.getClass() : ex.getParameter().getParameterType();
        for (FieldError error : ex.getBindingResult().getFieldErrors()) {
            problems.add(new FieldProblem(error.getField(), describe(error, type)));
        }
        ex.getBindingResult().getGlobalErrors()
                .forEach(e -> problems.add(new FieldProblem(e.getObjectName(), e.getDefaultMessage())));
        return badRequest(problems);
    }

    @Override
    protected ResponseEntity<Object> handleHandlerMethodValidationException(HandlerMethodValidationException ex,
            HttpHeaders headers, HttpStatusCode status, WebRequest request) {
        var problems = ex.getParameterValidationResults().stream()
                .flatMap(result -> result.getResolvableErrors().stream().map(error -> new FieldProblem(
                        result.getMethodParameter().getParameterName(), error.getDefaultMessage())))
                .toList();
        return badRequest(problems);
    }

    @Override
    protected ResponseEntity<Object> handleHttpMessageNotReadable(HttpMessageNotReadableException ex,
            HttpHeaders headers, HttpStatusCode status, WebRequest request) {
        Throwable cause = ex.getMostSpecificCause();
        if (cause instanceof JacksonException jackson && !jackson.getPath().isEmpty()) {
            String field = jsonPath(jackson.getPath());
            return badRequest(List.of(new FieldProblem(field, describe(jackson, secret(jackson.getPath())))));
        }
        String message;
        if (cause instanceof StreamReadException syntax) {
            // the parser's own message quotes the broken text, which may be a password typed without quotes
            message = "the body is not valid JSON" + where(syntax);
        } else if (cause instanceof MismatchedInputException mismatch && mismatch.getTargetType() != null) {
            message = "expected " + expectation(mismatch.getTargetType());
        } else {
            message = cause instanceof JacksonException ? "the body is not valid JSON for this request"
                    : "a JSON body is required";
        }
        return badRequest(List.of(new FieldProblem("body", message)));
    }

    @Override
    protected ResponseEntity<Object> handleTypeMismatch(TypeMismatchException ex, HttpHeaders headers,
            HttpStatusCode status, WebRequest request) {
        String field = ex instanceof MethodArgumentTypeMismatchException m ? m.getName() : ex.getPropertyName();
        String expected = ex.getRequiredType() == null ? "another type" : ex.getRequiredType().getSimpleName();
        String got = SecretFields.namedLikeSecret(field) ? "" : ", got '" + ex.getValue() + "'";
        return badRequest(List.of(new FieldProblem(field,
                "expected " + article(expected) + " " + expected.toLowerCase() + got)));
    }

    @Override
    protected ResponseEntity<Object> handleMissingServletRequestParameter(MissingServletRequestParameterException ex,
            HttpHeaders headers, HttpStatusCode status, WebRequest request) {
        return badRequest(List.of(new FieldProblem(ex.getParameterName(), "is required")));
    }

    @ExceptionHandler(InvalidQuantityException.class)
    ResponseEntity<Object> invalidQuantity(InvalidQuantityException ex) {
        return badRequest(List.of(new FieldProblem(JsonFieldNames.of(ex.field()), "is out of range: " + ex.getMessage())));
    }

    @ExceptionHandler(InvalidRequestException.class)
    ResponseEntity<Object> invalid(InvalidRequestException ex) {
        return badRequest(ex.problems());
    }

    @ExceptionHandler(NotFoundException.class)
    ProblemDetail notFound(NotFoundException ex) {
        var problem = ProblemDetail.forStatusAndDetail(HttpStatus.NOT_FOUND, ex.getMessage());
        problem.setTitle("Not found");
        return problem;
    }

    @ExceptionHandler(StaleEditException.class)
    ProblemDetail stale(StaleEditException ex) {
        var problem = ProblemDetail.forStatusAndDetail(HttpStatus.CONFLICT, ex.getMessage());
        problem.setTitle("Stale edit");
        problem.setProperty("sentVersion", ex.sentVersion());
        problem.setProperty("currentVersion", ex.currentVersion());
        return problem;
    }

    @ExceptionHandler(OptimisticLockingFailureException.class)
    ProblemDetail staleAtCommit(OptimisticLockingFailureException ex) {
        var problem = ProblemDetail.forStatusAndDetail(HttpStatus.CONFLICT,
                "Someone else changed this record while you were editing it; reload it and apply your change again");
        problem.setTitle("Stale edit");
        return problem;
    }

    @ExceptionHandler(ConflictException.class)
    ProblemDetail conflict(ConflictException ex) {
        var problem = ProblemDetail.forStatusAndDetail(HttpStatus.CONFLICT, ex.getMessage());
        problem.setTitle(ex.title());
        if (ex.field() != null) {
            problem.setProperty(ERRORS, List.of(new FieldProblem(ex.field(), ex.getMessage())));
        }
        return problem;
    }

    /** The 400 body every bad-input path shares. */
    public static ResponseEntity<Object> badRequest(List<FieldProblem> problems) {
        var problem = ProblemDetail.forStatusAndDetail(HttpStatus.BAD_REQUEST, problems.stream()
                .map(p -> p.field() + " " + p.message()).collect(Collectors.joining("; ")));
        problem.setTitle("Invalid request");
        problem.setProperty(ERRORS, problems);
        return ResponseEntity.badRequest().contentType(org.springframework.http.MediaType.APPLICATION_PROBLEM_JSON)
                .body(problem);
    }

    /** The message, and what came in unless the field is secret ({@link SecretFields}): a secret is never echoed. */
    private static String describe(FieldError error, Class<?> type) {
        boolean secret = SecretFields.isSecret(type, error.getField());
        if (error.isBindingFailure()) {
            return secret ? "could not be read" : "could not be read from '" + error.getRejectedValue() + "'";
        }
        return error.getDefaultMessage()
                + (secret || error.getRejectedValue() == null ? "" : ", was " + error.getRejectedValue());
    }

    /** Whether the JSON value at this path belongs to a secret field of the object being read. */
    private static boolean secret(List<JacksonException.Reference> path) {
        for (var reference : path) {
            Object from = reference.from();
            Class<?> type = from instanceof Class<?> c ? c : from == null ? null : from.getClass();
            if (reference.getPropertyName() != null && SecretFields.isSecret(type, reference.getPropertyName())) {
                return true;
            }
        }
        return false;
    }

    private static String jsonPath(List<JacksonException.Reference> path) {
        var field = new StringBuilder();
        for (var reference : path) {
            if (reference.getPropertyName() != null) {
                if (!field.isEmpty()) {
                    field.append('.');
                }
                field.append(reference.getPropertyName());
            } else if (reference.getIndex() >= 0) {
                field.append('[').append(reference.getIndex()).append(']');
            }
        }
        return field.isEmpty() ? "body" : field.toString();
    }

    /** What was wrong with one JSON value, in words that name the expectation and what came in. */
    private static String describe(JacksonException ex, boolean secret) {
        if (ex instanceof StreamReadException syntax) {
            return "is not valid JSON" + where(syntax);
        }
        if (ex instanceof UnrecognizedPropertyException unknown) {
            return "is not a field of this request (known fields: " + unknown.getKnownPropertyIds().stream()
                    .map(String::valueOf).sorted().collect(Collectors.joining(", ")) + ")";
        }
        if (ex instanceof InvalidFormatException format) {
            return "expected " + expectation(format.getTargetType()) + (secret ? "" : ", got '" + format.getValue() + "'");
        }
        if (ex instanceof MismatchedInputException mismatch && mismatch.getTargetType() != null) {
            return "expected " + expectation(mismatch.getTargetType());
        }
        return secret ? "could not be read" : plainJacksonMessage(ex);
    }

    /** Where in the body the parser stopped, without quoting what it found there. */
    private static String where(JacksonException ex) {
        var location = ex.getLocation();
        return location == null || location.getLineNr() < 1 ? ""
                : " (line " + location.getLineNr() + ", column " + location.getColumnNr() + ")";
    }

    private static String expectation(Class<?> type) {
        if (type == null) {
            return "another value";
        }
        if (type.isEnum()) {
            return "one of " + java.util.Arrays.stream(type.getEnumConstants()).map(String::valueOf)
                    .collect(Collectors.joining(", "));
        }
        if (Number.class.isAssignableFrom(type) || type == double.class || type == int.class || type == long.class) {
            return "a number";
        }
        if (type == Boolean.class || type == boolean.class) {
            return "true or false";
        }
        if (type == String.class) {
            return "a text value";
        }
        if (java.util.Collection.class.isAssignableFrom(type) || type.isArray()) {
            return "a list";
        }
        return "a JSON object";
    }

    /** Jackson's message without its source-location tail, which means nothing to an API user. */
    private static String plainJacksonMessage(JacksonException ex) {
        String message = ex.getOriginalMessage();
        if (message == null) {
            return "unreadable value";
        }
        int cut = message.indexOf('\n');
        message = cut > 0 ? message.substring(0, cut) : message;
        return message.replaceAll("\\(class [^)]*\\)", "").replaceAll("`[a-z]+(\\.[a-zA-Z0-9_$]+)+`", "").trim();
    }

    private static String article(String noun) {
        return "AEIOUaeiou".indexOf(noun.charAt(0)) >= 0 ? "an" : "a";
    }
}
