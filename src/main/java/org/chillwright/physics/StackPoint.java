package org.chillwright.physics;

/** Result of a two-stage stack solve against a cooling case: {@link StackSolved} or {@link Infeasible}. */
public sealed interface StackPoint permits StackSolved, Infeasible {

    /** Whether a steady point within the limits exists. */
    default boolean feasible() {
        return this instanceof StackSolved;
    }
}
