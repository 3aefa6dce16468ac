package org.chillwright.selection;

import org.chillwright.catalog.ModuleSpec;
import org.chillwright.physics.HeatingCheck;
import org.chillwright.physics.Infeasible;
import org.chillwright.physics.OperatingPoint;
import org.chillwright.physics.Solved;

/**
 * One design in full: the module, its operating point against the case, its curves, and how much better
 * a heat sink would have to be for 5 K more margin.
 *
 * @param sinkForMoreMarginKPerW heat-sink resistance that gives {@link #MORE_MARGIN_K} more margin, K/W;
 *                               NaN when no heat sink can (or in sizing mode, where the sink is an output)
 * @param heating                the heating check on the coldest day, or null when none was asked for
 */
public record CandidateDetail(ModuleSpec module, int seriesCount, int parallelCount, OperatingPoint point,
                              CaseCurves curves, double sinkForMoreMarginKPerW, HeatingCheck.Result heating) {

    /** The extra margin the heat-sink hint aims for, K (the ask; a common design step). */
    public static final double MORE_MARGIN_K = 5;

    /** The solved point, or null when the design cannot work. */
    public Solved solved() {
        return point instanceof Solved s ? s : null;
    }

    /** Why the design cannot work, or null when it can. */
    public Infeasible infeasible() {
        return point instanceof Infeasible i ? i : null;
    }

    public double moreMarginK() {
        return MORE_MARGIN_K;
    }

    public int moduleCount() {
        return seriesCount * parallelCount;
    }
}
