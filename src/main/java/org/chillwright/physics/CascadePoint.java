package org.chillwright.physics;

/** Result of a two-stage cascade solve: {@link CascadeSolved} or {@link Infeasible}. */
public sealed interface CascadePoint permits CascadeSolved, Infeasible {

    /** Whether a valid steady point exists. */
    default boolean feasible() {
        return this instanceof CascadeSolved;
    }
}
