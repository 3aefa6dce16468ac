package org.chillwright.physics;

/**
 * Argument checks that throw {@link InvalidQuantityException} with a message of the form
 * "sinkResistanceKPerW must be >= 0, was -1.0". NaN never passes a check.
 */
public final class Check {

    private Check() {
    }

    /** Requires a finite value; returns it. */
    public static double finite(String field, double value) {
        if (!Double.isFinite(value)) {
            throw new InvalidQuantityException(field, value, field + " must be a finite number, was " + value);
        }
        return value;
    }

    /** Requires a finite value {@code > 0}; returns it. */
    public static double positive(String field, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new InvalidQuantityException(field, value, field + " must be > 0, was " + value);
        }
        return value;
    }

    /** Requires a value {@code > 0}, where +infinity is allowed (for example "no leak"); returns it. */
    public static double positiveOrInfinite(String field, double value) {
        if (!(value > 0)) {
            throw new InvalidQuantityException(field, value, field + " must be > 0, was " + value);
        }
        return value;
    }

    /** Requires a finite value {@code >= 0}; returns it. */
    public static double nonNegative(String field, double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new InvalidQuantityException(field, value, field + " must be >= 0, was " + value);
        }
        return value;
    }

    /** Requires a finite value {@code < limit}; {@code limitName} says what the limit is. */
    public static double below(String field, double value, double limit, String limitName) {
        finite(field, value);
        if (!(value < limit)) {
            throw new InvalidQuantityException(field, value,
                    field + " must be < " + limitName + " (" + limit + "), was " + value);
        }
        return value;
    }

    /** Requires a finite value {@code > limit}; {@code limitName} says what the limit is. */
    public static double above(String field, double value, double limit, String limitName) {
        finite(field, value);
        if (!(value > limit)) {
            throw new InvalidQuantityException(field, value,
                    field + " must be > " + limitName + " (" + limit + "), was " + value);
        }
        return value;
    }

    /** Requires a finite value with {@code low <= value <= high}; returns it. */
    public static double within(String field, double value, double low, double high) {
        if (!(value >= low && value <= high)) {
            throw new InvalidQuantityException(field, value,
                    field + " must be within [" + low + ", " + high + "], was " + value);
        }
        return value;
    }

    /** Requires {@code 0 < value <= 1}; returns it. */
    public static double fraction(String field, double value) {
        if (!(value > 0 && value <= 1)) {
            throw new InvalidQuantityException(field, value, field + " must be > 0 and <= 1, was " + value);
        }
        return value;
    }

    /** Requires a count {@code >= 1}; returns it. */
    public static int atLeastOne(String field, int count) {
        if (count < 1) {
            throw new InvalidQuantityException(field, count, field + " must be >= 1, was " + count);
        }
        return count;
    }

    /** Requires a value that is either NaN (meaning "absent") or finite and {@code > 0}; returns it. */
    public static double positiveOrAbsent(String field, double value) {
        return Double.isNaN(value) ? value : positive(field, value);
    }
}
