package org.chillwright.web;

import org.springframework.http.HttpStatus;
import org.springframework.web.bind.annotation.ResponseStatus;

/** An edit made against an older version than the stored one: refused with 409, nothing overwritten. */
@ResponseStatus(HttpStatus.CONFLICT)
public class StaleEditException extends RuntimeException {

    private final long sentVersion;
    private final long currentVersion;

    public StaleEditException(String what, Object id, long sentVersion, long currentVersion) {
        super(what + " " + id + " was changed by someone else (you edited version " + sentVersion
                + ", the stored one is " + currentVersion + "); reload it and apply your change again");
        this.sentVersion = sentVersion;
        this.currentVersion = currentVersion;
    }

    public long sentVersion() {
        return sentVersion;
    }

    public long currentVersion() {
        return currentVersion;
    }
}
