package org.chillwright.web;

import java.lang.reflect.AnnotatedElement;
import java.util.Locale;
import java.util.Set;

/**
 * Decides whether a bound field holds a secret, so that no error, log line or re-rendered form repeats
 * its value. A field is secret when it carries {@link Secret} or when its name contains one of the
 * words people use for secrets (password, token, secret, ...), so a new {@code confirmPassword} is
 * covered before anyone remembers the marker.
 */
public final class SecretFields {

    private static final Set<String> SECRET_WORDS = Set.of("password", "passwd", "passphrase", "secret", "token",
            "credential", "apikey", "api_key", "privatekey");

    /** What stands in for a secret's value wherever a value would be shown. */
    public static final String HIDDEN = "[hidden]";

    private SecretFields() {
    }

    /** Whether a field name reads like a secret, whatever type it is on. */
    public static boolean namedLikeSecret(String name) {
        if (name == null) {
            return false;
        }
        String lower = name.toLowerCase(Locale.ROOT);
        return SECRET_WORDS.stream().anyMatch(lower::contains);
    }

    /**
     * Whether the field at {@code path} ({@code password}, {@code account.password}, {@code keys[0].token})
     * of {@code type} is secret. Any secret segment makes the whole path secret.
     *
     * @param type the bound object's class, or null when unknown (then only the names count)
     */
    public static boolean isSecret(Class<?> type, String path) {
        if (path == null || path.isEmpty()) {
            return false;
        }
        Class<?> current = type;
        for (String segment : path.split("\\.")) {
            String name = segment.replaceAll("\\[.*?]", "");
            if (namedLikeSecret(name)) {
                return true;
            }
            var member = current == null ? null : member(current, name);
            if (member != null && member.isAnnotationPresent(Secret.class)) {
                return true;
            }
            current = member == null ? null : typeOf(member);
        }
        return false;
    }

    /**
     * A record as its generated {@code toString} would show it, but with every secret component shown as
     * {@code [hidden]}. A record that holds a secret overrides {@code toString} with this, because Spring
     * logs request bodies and form objects through {@code toString} at DEBUG.
     */
    public static String toString(Record record) {
        var type = record.getClass();
        var text = new StringBuilder(type.getSimpleName()).append('[');
        var components = type.getRecordComponents();
        for (int i = 0; i < components.length; i++) {
            var component = components[i];
            text.append(i == 0 ? "" : ", ").append(component.getName()).append('=');
            if (namedLikeSecret(component.getName()) || component.isAnnotationPresent(Secret.class)) {
                text.append(HIDDEN);
            } else {
                text.append(valueOf(record, component));
            }
        }
        return text.append(']').toString();
    }

    private static Object valueOf(Record record, java.lang.reflect.RecordComponent component) {
        try {
            var accessor = component.getAccessor();
            accessor.setAccessible(true); // form records are often package-private
            return accessor.invoke(record);
        } catch (ReflectiveOperationException | RuntimeException unreadable) {
            return "?";
        }
    }

    /** The record component, or failing that the field, of this name; null when there is none. */
    private static AnnotatedElement member(Class<?> type, String name) {
        if (type.isRecord()) {
            for (var component : type.getRecordComponents()) {
                if (component.getName().equals(name)) {
                    return component;
                }
            }
        }
        for (Class<?> c = type; c != null && c != Object.class; c = c.getSuperclass()) {
            try {
                return c.getDeclaredField(name);
            } catch (NoSuchFieldException notHere) {
                // look in the superclass
            }
        }
        return null;
    }

    private static Class<?> typeOf(AnnotatedElement member) {
        if (member instanceof java.lang.reflect.RecordComponent component) {
            return component.getType();
        }
        return member instanceof java.lang.reflect.Field field ? field.getType() : null;
    }
}
