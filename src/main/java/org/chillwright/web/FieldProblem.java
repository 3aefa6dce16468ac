package org.chillwright.web;

/** One bad input: the request field (JSON name or form field) and what is wrong with it. */
public record FieldProblem(String field, String message) {
}
