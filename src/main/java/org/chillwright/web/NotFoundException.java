package org.chillwright.web;

import org.springframework.http.HttpStatus;
import org.springframework.web.bind.annotation.ResponseStatus;

/** An id that names nothing: 404 on the API and on pages. */
@ResponseStatus(HttpStatus.NOT_FOUND)
public class NotFoundException extends RuntimeException {

    public NotFoundException(String what, Object id) {
        super("No " + what + " with id " + id);
    }
}
