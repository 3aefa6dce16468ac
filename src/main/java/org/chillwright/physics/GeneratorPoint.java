package org.chillwright.physics;

/**
 * Steady point of a thermoelectric generator on an electrical load (ideal equations, see {@link GeneratorSolver}).
 *
 * @param loadOhm       external load RL, Ω
 * @param currentA      current through the load, A
 * @param voltageV      voltage across the load I·RL, V
 * @param powerW        power delivered to the load I²·RL, W
 * @param efficiency    P/Qh,in (0.03 = 3 %)
 * @param hotJunctionK  hot-face temperature, K
 * @param coldJunctionK cold-face temperature, K
 * @param heatInW       heat drawn from the hot side Qh,in = S·I·Th − ½I²R + K(Th − Tc), W
 */
public record GeneratorPoint(double loadOhm, double currentA, double voltageV, double powerW, double efficiency,
                             double hotJunctionK, double coldJunctionK, double heatInW) {

    /** Heat released to the cold side Qc,out = Qh,in − P, W. */
    public double heatOutW() {
        return heatInW - powerW;
    }
}
