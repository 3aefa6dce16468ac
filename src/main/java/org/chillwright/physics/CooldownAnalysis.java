package org.chillwright.physics;

/**
 * Cool-down of a design from ambient: at its design current and at the most current its limits allow.
 *
 * @param designPoint      the steady design point the design current comes from
 * @param atDesignCurrent  the cool-down at the design current; null when the design point is infeasible
 * @param atCurrentLimit   the cool-down at the current limit (rated Imax, supply); null when no limit is given
 */
public record CooldownAnalysis(OperatingPoint designPoint, CooldownRun atDesignCurrent, CooldownRun atCurrentLimit) {

    /** The thermal time constant at the design current, s; NaN without a feasible design. */
    public double timeConstantS() {
        return atDesignCurrent == null ? Double.NaN : atDesignCurrent.timeConstantS();
    }
}
