package org.chillwright.physics;

/**
 * No operating point: a result, not an error, so a ranking can explain it.
 *
 * @param reason                what rules the point out
 * @param detail                a plain-English sentence with the numbers, e.g. "needs 25.00 W of cooling …"
 * @param maxHeatLoadW          for a cooler, the most heat the module or array can remove while holding the object
 *                              at the case's temperature with this heat sink (as {@link Solved#maxHeatLoadW}), W, so
 *                              a script sees how far off the design is; NaN when it does not apply (a cascade)
 * @param currentAtMaxHeatLoadA current at that most heat, A; NaN when it does not apply
 */
public record Infeasible(Reason reason, String detail, double maxHeatLoadW, double currentAtMaxHeatLoadA)
        implements OperatingPoint, CascadePoint, DetailedResult, StackPoint {

    /** An infeasible point without a capacity figure (a cascade). */
    public Infeasible(Reason reason, String detail) {
        this(reason, detail, Double.NaN, Double.NaN);
    }

    @Override
    public boolean feasible() {
        return false;
    }
}
