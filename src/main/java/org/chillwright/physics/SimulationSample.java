package org.chillwright.physics;

/**
 * The state of a harvesting system at one time of a simulation: a point of the state-of-charge chart.
 *
 * @param timeS         time, s
 * @param hotSourceK    source temperature at that time, K
 * @param coldSinkK     sink temperature at that time, K
 * @param generatorW    generator power into the converter over the step that ends here (the first sample: the
 *                      step that starts here), W
 * @param deliveredW    converter output over the same step, W
 * @param storedJ       stored energy, J
 * @param voltageV      storage voltage, V
 * @param stateOfCharge fraction of the usable window filled, 0 at the floor to 1 full
 * @param deviceOn      whether the device is connected
 */
public record SimulationSample(double timeS, double hotSourceK, double coldSinkK, double generatorW, double deliveredW,
                               double storedJ, double voltageV, double stateOfCharge, boolean deviceOn) {
}
