package org.chillwright.physics;

/** The detailed operating point of a cooler: {@link DetailedPoint} or {@link Infeasible}. */
public sealed interface DetailedResult permits DetailedPoint, Infeasible {

    /** Whether a steady point within the limits exists. */
    default boolean feasible() {
        return this instanceof DetailedPoint;
    }
}
