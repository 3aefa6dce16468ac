package org.chillwright.web;

import org.springframework.http.HttpStatus;
import org.springframework.web.bind.annotation.ResponseStatus;

/** The request is well formed but clashes with what is stored (a taken name, a state that may not move): 409. */
@ResponseStatus(HttpStatus.CONFLICT)
public class ConflictException extends RuntimeException {

    private final String field;

    public ConflictException(String field, String message) {
        super(message);
        this.field = field;
    }

    /** The request field the clash is about, or null. */
    public String field() {
        return field;
    }

    /** The problem body's title: a short name for the kind of clash. */
    public String title() {
        return "Conflict";
    }
}
