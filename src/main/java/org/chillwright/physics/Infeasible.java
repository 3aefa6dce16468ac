package org.chillwright.physics;

/**
 * No operating point: a result, not an error, so a ranking can explain it.
 *
 * @param reason what rules the point out
 * @param detail a plain-English sentence with the numbers, e.g. "needs 25.00 W of cooling …"
 */
public record Infeasible(Reason reason, String detail) implements OperatingPoint, CascadePoint, StackPoint {

    @Override
    public boolean feasible() {
        return false;
    }
}
