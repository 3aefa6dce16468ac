package org.chillwright.physics;

/**
 * A material property as a function of temperature, for the detailed leg model
 * ({@link DetailedSolver}). Besides the value it gives its slope (for the Newton iterations and the
 * Thomson coefficient τ = T·dα/dT) and an antiderivative (so that the Seebeck voltage ∫α dT of a
 * grid cell is exact, which keeps the discrete energy balance exact).
 *
 * <p>Implementations: {@link PolynomialCurve} (published fits) and {@link TableCurve} (measured
 * points, piecewise linear). Units are the caller's: the curve of a Seebeck coefficient gives V/K,
 * of a resistivity Ω·m, of a thermal conductivity W/(m·K).
 */
public interface PropertyCurve {

    /** Value at a temperature, in the property's unit. */
    double valueAt(double temperatureK);

    /** Slope d(value)/dT at a temperature, property unit per K. */
    double slopeAt(double temperatureK);

    /**
     * An antiderivative of the curve, property unit × K: F with dF/dT = value. Only differences
     * F(b) − F(a) = ∫ₐᵇ value dT are meaningful.
     */
    double antiderivativeAt(double temperatureK);

    /** The curve multiplied by a positive constant, used by the ratings fit. */
    PropertyCurve scaled(double factor);

    /** A constant curve. */
    static PropertyCurve constant(double value) {
        return new PolynomialCurve(0.0, new double[] {value});
    }
}
