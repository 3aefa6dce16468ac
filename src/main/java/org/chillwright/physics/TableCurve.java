package org.chillwright.physics;

import java.util.Arrays;

/**
 * A property given as measured points, linear between them and held at the end values outside
 * (no extrapolation of a trend beyond the data; the detailed result says when a leg left the
 * material's range, see {@link MaterialSet#lowestK()}).
 *
 * @param temperaturesK at least two temperatures, K, finite, &gt; 0 and strictly increasing
 * @param values        the property at each temperature, finite, same length
 */
public record TableCurve(double[] temperaturesK, double[] values) implements PropertyCurve {

    public TableCurve {
        if (temperaturesK == null || values == null || temperaturesK.length < 2) {
            throw new InvalidQuantityException("temperaturesK", Double.NaN,
                    "temperaturesK must hold at least two temperatures");
        }
        if (values.length != temperaturesK.length) {
            throw new InvalidQuantityException("values", values.length,
                    "values must have one entry per temperature (" + temperaturesK.length + "), had " + values.length);
        }
        temperaturesK = temperaturesK.clone();
        values = values.clone();
        for (int i = 0; i < temperaturesK.length; i++) {
            Check.positive("temperaturesK[" + i + "]", temperaturesK[i]);
            Check.finite("values[" + i + "]", values[i]);
            if (i > 0) {
                Check.above("temperaturesK[" + i + "]", temperaturesK[i], temperaturesK[i - 1],
                        "temperaturesK[" + (i - 1) + "]");
            }
        }
    }

    @Override
    public double[] temperaturesK() {
        return temperaturesK.clone();
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    /** Index i of the segment [T_i, T_i+1] holding t, clamped to the first and last segment. */
    private int segment(double t) {
        int i = Arrays.binarySearch(temperaturesK, t);
        if (i < 0) {
            i = -i - 2;
        }
        return Math.max(0, Math.min(temperaturesK.length - 2, i));
    }

    @Override
    public double valueAt(double temperatureK) {
        int last = temperaturesK.length - 1;
        if (temperatureK <= temperaturesK[0]) {
            return values[0];
        }
        if (temperatureK >= temperaturesK[last]) {
            return values[last];
        }
        int i = segment(temperatureK);
        double w = (temperatureK - temperaturesK[i]) / (temperaturesK[i + 1] - temperaturesK[i]);
        return values[i] + w * (values[i + 1] - values[i]);
    }

    @Override
    public double slopeAt(double temperatureK) {
        if (temperatureK < temperaturesK[0] || temperatureK > temperaturesK[temperaturesK.length - 1]) {
            return 0.0;
        }
        int i = segment(temperatureK);
        return (values[i + 1] - values[i]) / (temperaturesK[i + 1] - temperaturesK[i]);
    }

    @Override
    public double antiderivativeAt(double temperatureK) {
        int last = temperaturesK.length - 1;
        if (temperatureK <= temperaturesK[0]) {
            return values[0] * (temperatureK - temperaturesK[0]);
        }
        double sum = 0;
        int i = 0;
        while (i < last && temperatureK >= temperaturesK[i + 1]) {
            sum += 0.5 * (values[i] + values[i + 1]) * (temperaturesK[i + 1] - temperaturesK[i]);
            i++;
        }
        if (i == last) {
            return sum + values[last] * (temperatureK - temperaturesK[last]);
        }
        double v = valueAt(temperatureK);
        return sum + 0.5 * (values[i] + v) * (temperatureK - temperaturesK[i]);
    }

    @Override
    public TableCurve scaled(double factor) {
        Check.positive("factor", factor);
        double[] v = values.clone();
        for (int i = 0; i < v.length; i++) {
            v[i] *= factor;
        }
        return new TableCurve(temperaturesK, v);
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof TableCurve t && Arrays.equals(t.temperaturesK, temperaturesK)
                && Arrays.equals(t.values, values);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(temperaturesK) + Arrays.hashCode(values);
    }

    @Override
    public String toString() {
        return "TableCurve[temperaturesK=" + Arrays.toString(temperaturesK) + ", values=" + Arrays.toString(values) + "]";
    }
}
