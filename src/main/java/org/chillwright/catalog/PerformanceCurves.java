package org.chillwright.catalog;

import java.util.ArrayList;
import java.util.List;
import org.chillwright.physics.ModuleParameters;

/**
 * Cooling and COP against current at a few temperature differences, with the hot side held at the
 * module's rating temperature: the points behind a module's performance charts, from the physics
 * engine's ideal equations.
 *
 * @param hotSideK  hot-side temperature of every curve, K
 * @param currentA  the current of each point, from 0 to the rated Imax
 * @param deltaTK   the temperature difference of each curve
 * @param coldSideHeatW Qc per curve and point, W
 * @param cop       COP per curve and point; NaN where the module pumps no heat or takes no power
 */
public record PerformanceCurves(double hotSideK, double[] currentA, double[] deltaTK, double[][] coldSideHeatW,
                                double[][] cop) {

    static final int POINTS = 41;
    /** Curves every this many kelvin, from 0 to below ΔTmax. */
    static final double STEP_K = 10.0;

    public static PerformanceCurves of(ModuleSpec module) {
        ModuleParameters parameters = module.parameters();
        double hotSideK = module.ratings().hotSideK();
        double imaxA = module.ratedImaxA();
        var deltas = new ArrayList<Double>();
        for (double dt = 0; dt < module.ratings().dtmaxK(); dt += STEP_K) {
            deltas.add(dt);
        }
        double[] currents = new double[POINTS];
        for (int i = 0; i < POINTS; i++) {
            currents[i] = imaxA * i / (POINTS - 1);
        }
        double[][] heat = new double[deltas.size()][POINTS];
        double[][] cop = new double[deltas.size()][POINTS];
        for (int c = 0; c < deltas.size(); c++) {
            double coldSideK = hotSideK - deltas.get(c);
            for (int i = 0; i < POINTS; i++) {
                heat[c][i] = parameters.coldSideHeatW(currents[i], coldSideK, hotSideK);
                double powerW = parameters.powerW(currents[i], coldSideK, hotSideK);
                cop[c][i] = heat[c][i] > 0 && powerW > 0 ? heat[c][i] / powerW : Double.NaN;
            }
        }
        return new PerformanceCurves(hotSideK, currents, deltas.stream().mapToDouble(Double::doubleValue).toArray(),
                heat, cop);
    }

    public List<Double> deltaTList() {
        return java.util.Arrays.stream(deltaTK).boxed().toList();
    }
}
