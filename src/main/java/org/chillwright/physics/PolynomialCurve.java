package org.chillwright.physics;

import java.util.Arrays;

/**
 * A property as a polynomial in (T − referenceK): value = c0 + c1·x + c2·x² + …, x = T − T0.
 * Evaluated by Horner's scheme; the antiderivative is exact.
 *
 * @param referenceK   T0, K, finite (0 for fits written in T itself)
 * @param coefficients c0, c1, … in the property's unit per K^i; at least one, all finite
 */
public record PolynomialCurve(double referenceK, double[] coefficients) implements PropertyCurve {

    public PolynomialCurve {
        Check.finite("referenceK", referenceK);
        if (coefficients == null || coefficients.length == 0) {
            throw new InvalidQuantityException("coefficients", Double.NaN,
                    "coefficients must hold at least one number, was empty");
        }
        coefficients = coefficients.clone();
        for (int i = 0; i < coefficients.length; i++) {
            Check.finite("coefficients[" + i + "]", coefficients[i]);
        }
    }

    /** A polynomial in T itself (T0 = 0). */
    public static PolynomialCurve inKelvin(double... coefficients) {
        return new PolynomialCurve(0.0, coefficients);
    }

    @Override
    public double[] coefficients() {
        return coefficients.clone();
    }

    @Override
    public double valueAt(double temperatureK) {
        double x = temperatureK - referenceK;
        double sum = 0;
        for (int i = coefficients.length - 1; i >= 0; i--) {
            sum = sum * x + coefficients[i];
        }
        return sum;
    }

    @Override
    public double slopeAt(double temperatureK) {
        double x = temperatureK - referenceK;
        double sum = 0;
        for (int i = coefficients.length - 1; i >= 1; i--) {
            sum = sum * x + i * coefficients[i];
        }
        return sum;
    }

    @Override
    public double antiderivativeAt(double temperatureK) {
        double x = temperatureK - referenceK;
        double sum = 0;
        for (int i = coefficients.length - 1; i >= 0; i--) {
            sum = sum * x + coefficients[i] / (i + 1);
        }
        return sum * x;
    }

    @Override
    public PolynomialCurve scaled(double factor) {
        Check.positive("factor", factor);
        double[] c = coefficients.clone();
        for (int i = 0; i < c.length; i++) {
            c[i] *= factor;
        }
        return new PolynomialCurve(referenceK, c);
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof PolynomialCurve p && p.referenceK == referenceK
                && Arrays.equals(p.coefficients, coefficients);
    }

    @Override
    public int hashCode() {
        return 31 * Double.hashCode(referenceK) + Arrays.hashCode(coefficients);
    }

    @Override
    public String toString() {
        return "PolynomialCurve[referenceK=" + referenceK + ", coefficients=" + Arrays.toString(coefficients) + "]";
    }
}
