package org.chillwright.physics;

/**
 * A generator seen through its converter: whether the converter starts, the generator's operating point at
 * the converter input, the efficiency used there and the power delivered after the converter.
 *
 * @param openCircuitV the generator's open-circuit voltage (load disconnected), V: what the converter sees at start-up
 * @param coldStartV   the converter's cold-start voltage, V
 * @param starts       {@code openCircuitV ≥ coldStartV}
 * @param input        the generator's operating point at the converter input (the point the input strategy
 *                     would hold, also when the converter cannot start)
 * @param efficiency   the converter's efficiency at that input voltage and power, in (0, 1]
 * @param deliveredW   power after the converter, W: efficiency × input power, 0 when the converter cannot start
 */
public record ConditionedPoint(double openCircuitV, double coldStartV, boolean starts, GeneratorPoint input,
                               double efficiency, double deliveredW) {

    /** Power lost in the converter, W: input power − delivered power; 0 when it cannot start (no current flows). */
    public double converterLossW() {
        return starts ? input.powerW() - deliveredW : 0;
    }

    /** Power the generator gives the converter, W; 0 when the converter cannot start. */
    public double generatorW() {
        return starts ? input.powerW() : 0;
    }
}
