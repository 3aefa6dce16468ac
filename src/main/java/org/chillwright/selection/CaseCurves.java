package org.chillwright.selection;

import java.util.ArrayList;
import java.util.List;
import org.chillwright.physics.CoolingCase;
import org.chillwright.physics.ModuleParameters;
import org.chillwright.physics.OperatingPointSolver;

/**
 * Curves of a design against current, for plotting with the operating point marked: cooling, COP and
 * voltage with this case's heat sink, and cooling at fixed temperature differences. Values that do not
 * exist (past the heat-sink runaway current) are NaN.
 *
 * @param currentA        the current grid, A (terminal current of the array)
 * @param coolingW        Qc at the case's cold face with the case's heat sink, W
 * @param cop             COP there (NaN where no power is drawn or no cooling is done)
 * @param voltageV        terminal voltage there, V
 * @param fixedDeltaTK    the fixed temperature differences, K
 * @param coolingAtDeltaW Qc at each fixed difference with the hot face at the design's hot side, W
 */
public record CaseCurves(double[] currentA, double[] coolingW, double[] cop, double[] voltageV,
                                double[] fixedDeltaTK, double[][] coolingAtDeltaW) {

    static final int POINTS = 61;
    /** Fixed ΔT curves drawn, K: a family that spans a single stage's useful range. */
    static final double[] DELTA_T_FAMILY_K = {0, 20, 40, 60};

    /**
     * @param equivalent  the array as one module ({@link org.chillwright.physics.ModuleArray#equivalent})
     * @param c           the case the solvers saw
     * @param hotSideK    the hot face for the fixed-ΔT family, K (the design's solved hot side)
     * @param maxCurrentA the right end of the grid, A (e.g. the rated Imax of the array)
     */
    static CaseCurves of(ModuleParameters equivalent, CoolingCase c, double hotSideK, double maxCurrentA) {
        double s = equivalent.seebeckVPerK();
        double r = equivalent.resistanceOhm();
        double k = equivalent.conductanceWPerK();
        double coldK = c.coldSideAtLoadK();
        double[] current = new double[POINTS];
        double[] cooling = new double[POINTS];
        double[] cop = new double[POINTS];
        double[] voltage = new double[POINTS];
        double[][] family = new double[DELTA_T_FAMILY_K.length][POINTS];
        for (int n = 0; n < POINTS; n++) {
            double i = maxCurrentA * n / (POINTS - 1);
            current[n] = i;
            double denominator = 1 + c.hotPathKPerW() * (k - s * i); // Th(I) exists while this is > 0
            if (denominator > 0) {
                double th = OperatingPointSolver.hotSideK(s, r, k, coldK, c.ambientK(), c.hotPathKPerW(), i);
                cooling[n] = equivalent.coldSideHeatW(i, coldK, th);
                voltage[n] = equivalent.voltageV(i, coldK, th);
                double power = equivalent.powerW(i, coldK, th);
                cop[n] = power > 0 && cooling[n] > 0 ? cooling[n] / power : Double.NaN;
            } else {
                cooling[n] = Double.NaN;
                voltage[n] = Double.NaN;
                cop[n] = Double.NaN;
            }
            for (int f = 0; f < DELTA_T_FAMILY_K.length; f++) {
                family[f][n] = equivalent.coldSideHeatW(i, hotSideK - DELTA_T_FAMILY_K[f], hotSideK);
            }
        }
        return new CaseCurves(current, cooling, cop, voltage, DELTA_T_FAMILY_K.clone(), family);
    }

    /** The curves as lists with nulls for missing values, for JSON. */
    public List<List<Double>> series() {
        var out = new ArrayList<List<Double>>();
        out.add(boxed(currentA));
        out.add(boxed(coolingW));
        out.add(boxed(cop));
        out.add(boxed(voltageV));
        for (double[] curve : coolingAtDeltaW) {
            out.add(boxed(curve));
        }
        return out;
    }

    private static List<Double> boxed(double[] values) {
        var list = new ArrayList<Double>(values.length);
        for (double v : values) {
            list.add(Double.isFinite(v) ? v : null);
        }
        return list;
    }
}
