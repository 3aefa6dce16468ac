package org.chillwright.physics;

import java.util.Arrays;

/**
 * A converter's efficiency as the user enters it: a table over input power at a few input voltages,
 * interpolated bilinearly (linear in voltage, linear in power) and held at the edge values outside the
 * table, never extrapolated. Enter more points where the curve bends: between points a decade apart,
 * linear interpolation in power lies below the curve a datasheet draws on a logarithmic axis.
 *
 * @param inputVoltagesV the input voltages of the rows, V: at least one, finite, ≥ 0, strictly increasing
 * @param inputPowersW   the input powers of the columns, W: at least one, finite, ≥ 0, strictly increasing
 * @param efficiencies   {@code efficiencies[i][j]} at {@code inputVoltagesV[i]} and {@code inputPowersW[j]},
 *                       output power over input power, each in (0, 1]
 */
public record ConverterEfficiencyTable(double[] inputVoltagesV, double[] inputPowersW, double[][] efficiencies) {

    public ConverterEfficiencyTable {
        inputVoltagesV = increasingAxis("inputVoltagesV", inputVoltagesV);
        inputPowersW = increasingAxis("inputPowersW", inputPowersW);
        if (efficiencies == null || efficiencies.length != inputVoltagesV.length) {
            throw new InvalidQuantityException("efficiencies", efficiencies == null ? Double.NaN : efficiencies.length,
                    "efficiencies must have one row per input voltage (" + inputVoltagesV.length + "), had "
                            + (efficiencies == null ? "none" : efficiencies.length));
        }
        double[][] rows = new double[efficiencies.length][];
        for (int i = 0; i < rows.length; i++) {
            if (efficiencies[i] == null || efficiencies[i].length != inputPowersW.length) {
                throw new InvalidQuantityException("efficiencies[" + i + "]", Double.NaN,
                        "efficiencies[" + i + "] must have one entry per input power (" + inputPowersW.length + ")");
            }
            rows[i] = efficiencies[i].clone();
            for (int j = 0; j < rows[i].length; j++) {
                Check.fraction("efficiencies[" + i + "][" + j + "]", rows[i][j]);
            }
        }
        efficiencies = rows;
    }

    /** One efficiency at every input (a 1 × 1 table): 1 gives an ideal converter. */
    public static ConverterEfficiencyTable constant(double efficiency) {
        return new ConverterEfficiencyTable(new double[] {0}, new double[] {0}, new double[][] {{efficiency}});
    }

    private static double[] increasingAxis(String field, double[] axis) {
        if (axis == null || axis.length == 0) {
            throw new InvalidQuantityException(field, Double.NaN, field + " must hold at least one value");
        }
        double[] copy = axis.clone();
        for (int i = 0; i < copy.length; i++) {
            Check.nonNegative(field + "[" + i + "]", copy[i]);
            if (i > 0) {
                Check.above(field + "[" + i + "]", copy[i], copy[i - 1], field + "[" + (i - 1) + "]");
            }
        }
        return copy;
    }

    /**
     * Efficiency at an input point, bilinear inside the table and held at the nearest edge outside it.
     *
     * @param inputVoltageV converter input voltage, V
     * @param inputPowerW   converter input power, W
     * @return output power over input power, in (0, 1]
     */
    public double at(double inputVoltageV, double inputPowerW) {
        int i = lowerIndex(inputVoltagesV, inputVoltageV);
        int j = lowerIndex(inputPowersW, inputPowerW);
        double u = weight(inputVoltagesV, i, inputVoltageV);
        double w = weight(inputPowersW, j, inputPowerW);
        int i1 = Math.min(i + 1, inputVoltagesV.length - 1);
        int j1 = Math.min(j + 1, inputPowersW.length - 1);
        double low = efficiencies[i][j] + w * (efficiencies[i][j1] - efficiencies[i][j]);
        double high = efficiencies[i1][j] + w * (efficiencies[i1][j1] - efficiencies[i1][j]);
        return low + u * (high - low);
    }

    /** Index of the grid point at or below x, clamped to the axis. */
    private static int lowerIndex(double[] axis, double x) {
        int i = Arrays.binarySearch(axis, x);
        if (i < 0) {
            i = -i - 2;
        }
        return Math.max(0, Math.min(axis.length - 1, i));
    }

    /** Weight of the upper neighbour in [axis[i], axis[i+1]]; 0 outside the axis (held at the edge). */
    private static double weight(double[] axis, int i, double x) {
        if (i == axis.length - 1 || !(x > axis[i])) {
            return 0;
        }
        return Math.min(1, (x - axis[i]) / (axis[i + 1] - axis[i]));
    }

    @Override
    public double[] inputVoltagesV() {
        return inputVoltagesV.clone();
    }

    @Override
    public double[] inputPowersW() {
        return inputPowersW.clone();
    }

    @Override
    public double[][] efficiencies() {
        double[][] copy = new double[efficiencies.length][];
        for (int i = 0; i < copy.length; i++) {
            copy[i] = efficiencies[i].clone();
        }
        return copy;
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof ConverterEfficiencyTable t && Arrays.equals(t.inputVoltagesV, inputVoltagesV)
                && Arrays.equals(t.inputPowersW, inputPowersW) && Arrays.deepEquals(t.efficiencies, efficiencies);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * Arrays.hashCode(inputVoltagesV) + Arrays.hashCode(inputPowersW))
                + Arrays.deepHashCode(efficiencies);
    }

    @Override
    public String toString() {
        return "ConverterEfficiencyTable[inputVoltagesV=" + Arrays.toString(inputVoltagesV) + ", inputPowersW="
                + Arrays.toString(inputPowersW) + ", efficiencies=" + Arrays.deepToString(efficiencies) + "]";
    }
}
