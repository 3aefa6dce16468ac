package org.chillwright.physics;

/**
 * One point of a cool-down curve.
 *
 * @param timeS     time since the current was switched on, s
 * @param partK     temperature of the cooled part, K
 * @param hotSideK  the module's hot face, K
 */
public record CooldownSample(double timeS, double partK, double hotSideK) {
}
