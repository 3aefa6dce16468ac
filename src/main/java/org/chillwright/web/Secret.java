package org.chillwright.web;

import java.lang.annotation.Documented;
import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;

/**
 * Marks a request or form field whose value must never be echoed: not in an error body, not in a log
 * line, not in a page shown again after a refusal, not in an audit record. Errors about it say what is
 * wrong without the value. Fields named like a password, token or secret are treated the same way
 * without the marker ({@link SecretFields}); the marker is for secrets with other names, and says so
 * to the reader.
 */
@Documented
@Retention(RetentionPolicy.RUNTIME)
@Target({ElementType.RECORD_COMPONENT, ElementType.FIELD, ElementType.PARAMETER, ElementType.METHOD})
public @interface Secret {
}
