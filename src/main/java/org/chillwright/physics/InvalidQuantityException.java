package org.chillwright.physics;

/**
 * A physical input outside its valid range. Carries the Java parameter name of the offending
 * quantity (for example {@code sinkResistanceKPerW}) and the value that came in, so an edge layer
 * can point at the field.
 */
public final class InvalidQuantityException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    private final String field;
    private final double value;

    /**
     * @param field   Java parameter name of the quantity, for example {@code sinkResistanceKPerW}
     * @param value   the rejected value, in the unit named by the field's suffix
     * @param message sentence naming the field, what was expected and what came in
     */
    public InvalidQuantityException(String field, double value, String message) {
        super(message);
        this.field = field;
        this.value = value;
    }

    /** Java parameter name of the rejected quantity. */
    public String field() {
        return field;
    }

    /** The rejected value, in the unit named by the field's suffix (NaN if it was not a number). */
    public double value() {
        return value;
    }
}
