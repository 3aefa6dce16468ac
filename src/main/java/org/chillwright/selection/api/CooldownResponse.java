package org.chillwright.selection.api;

import jakarta.annotation.Nullable;
import java.util.List;

/**
 * The object's temperature after {@code timeS}, where it settles, how fast, and a curve to plot.
 *
 * @param timeToTargetS null when no target was given or it is never reached
 */
public record CooldownResponse(double temperatureC, double finalC, double timeConstantS, @Nullable Double timeToTargetS,
                               List<Sample> curve) {

    /** One point of the cool-down curve. */
    public record Sample(double timeS, double temperatureC) {
    }
}
