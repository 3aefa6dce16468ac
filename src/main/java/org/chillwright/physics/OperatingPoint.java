package org.chillwright.physics;

/**
 * The steady operating point of a cooler against a {@link CoolingCase}: either {@link Solved} or
 * {@link Infeasible}.
 */
public sealed interface OperatingPoint permits Solved, Infeasible {

    /** Whether a steady point within the limits exists. */
    default boolean feasible() {
        return this instanceof Solved;
    }
}
