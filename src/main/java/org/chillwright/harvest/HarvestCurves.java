package org.chillwright.harvest;

import java.util.Arrays;
import org.chillwright.physics.GeneratorCase;
import org.chillwright.physics.GeneratorPoint;
import org.chillwright.physics.GeneratorSolver;
import org.chillwright.physics.ModuleParameters;

/**
 * A design's generator curves against load resistance: the points on a logarithmic grid of loads around
 * the array's internal resistance, with the best-power and best-efficiency loads in the grid itself so
 * that the marked points lie exactly on the curves.
 *
 * @param points           the solved points, ascending load
 * @param maxPowerIndex    index of the best-power point (the operating point)
 * @param maxEfficiencyIndex index of the best-efficiency point
 */
public record HarvestCurves(GeneratorPoint[] points, int maxPowerIndex, int maxEfficiencyIndex) {

    /** Grid points on each side of the internal resistance, per decade. */
    static final int POINTS_PER_DECADE = 24;
    /** The grid spans this many decades either side of R: the optima lie within a factor of a few of R. */
    static final double DECADES_EACH_SIDE = 1.0;

    static HarvestCurves of(ModuleParameters array, GeneratorCase c, GeneratorPoint maxPower,
                            GeneratorPoint maxEfficiency) {
        var solver = new GeneratorSolver();
        int steps = (int) Math.round(2 * DECADES_EACH_SIDE * POINTS_PER_DECADE);
        double[] loadsOhm = new double[steps + 3];
        for (int n = 0; n <= steps; n++) {
            double decades = -DECADES_EACH_SIDE + n / (double) POINTS_PER_DECADE;
            loadsOhm[n] = array.resistanceOhm() * Math.pow(10, decades);
        }
        loadsOhm[steps + 1] = maxPower.loadOhm();
        loadsOhm[steps + 2] = maxEfficiency.loadOhm();
        Arrays.sort(loadsOhm);
        var points = new GeneratorPoint[loadsOhm.length];
        for (int n = 0; n < loadsOhm.length; n++) {
            points[n] = loadsOhm[n] == maxPower.loadOhm() ? maxPower
                    : loadsOhm[n] == maxEfficiency.loadOhm() ? maxEfficiency : solver.atLoad(array, c, loadsOhm[n]);
        }
        return new HarvestCurves(points, Arrays.binarySearch(loadsOhm, maxPower.loadOhm()),
                Arrays.binarySearch(loadsOhm, maxEfficiency.loadOhm()));
    }
}
