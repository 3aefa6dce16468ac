package org.chillwright.physics;

/**
 * What one module of an array carries (circuit algebra, derived here): identical modules on common plates share
 * current per string, voltage per series position and heat equally.
 *
 * @param currentA       current through one module, A
 * @param voltageV       voltage across one module, V
 * @param heatLoadW      heat one module pumps from the cold plate, W
 * @param heatRejectedW  heat one module releases to the hot plate, W
 * @param powerW         electrical power of one module, W
 */
public record ModuleShare(double currentA, double voltageV, double heatLoadW, double heatRejectedW, double powerW) {
}
