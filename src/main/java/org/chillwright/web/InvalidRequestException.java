package org.chillwright.web;

import java.util.List;

/** Bad input found after binding (cross-field rules, physics limits): answered with 400 naming each field. */
@org.springframework.web.bind.annotation.ResponseStatus(org.springframework.http.HttpStatus.BAD_REQUEST)
public class InvalidRequestException extends RuntimeException {

    private final transient List<FieldProblem> problems;

    public InvalidRequestException(List<FieldProblem> problems) {
        super(problems.stream().map(p -> p.field() + ": " + p.message()).reduce((a, b) -> a + "; " + b).orElse(""));
        this.problems = List.copyOf(problems);
    }

    public InvalidRequestException(String field, String message) {
        this(List.of(new FieldProblem(field, message)));
    }

    public List<FieldProblem> problems() {
        return problems;
    }
}
