package org.chillwright.approval;

import org.chillwright.web.ConflictException;

/** An approval refused by the four-eyes rule ({@link Workflow#fourEyesRefusal}): a 409 whose title names the rule. */
public class FourEyesRefusedException extends ConflictException {

    FourEyesRefusedException(String message) {
        super("to", message);
    }

    @Override
    public String title() {
        return "Approval needs a second person";
    }
}
