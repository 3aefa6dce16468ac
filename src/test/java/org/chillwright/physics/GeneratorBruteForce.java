package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * An independent check of generator points, for tests. Nothing here calls {@link GeneratorSolver}.
 *
 * <p>For a current I the two node equations of a generator between its heat exchangers (A.F. Ioffe,
 * Semiconductor Thermoelements and Thermoelectric Cooling, 1957, ideal equations with half the Joule heat
 * to each face, from memory),
 * <pre>
 *   Th = Tsrc − Rh·Qh,  Qh = S·I·Th − ½I²R + K(Th − Tc)
 *   Tc = Tsnk + Rc·Qc,  Qc = S·I·Tc + ½I²R + K(Th − Tc)
 * </pre>
 * are affine in (Th, Tc), so one Newton step with a finite-difference Jacobian solves them exactly up to
 * round-off. The load that carries that current is RL = S(Th − Tc)/I − R, and its power I·(S(Th − Tc) − I·R).
 * {@link #scanMaxPowerW} scans every current from 0 to the largest possible short-circuit current
 * S(Tsrc − Tsnk)/R, drops the points that are not physical (Tc below the sink, Th above the source,
 * Tc ≥ Th, RL &lt; 0), and refines the best grid point by two finer scans around it.
 */
public final class GeneratorBruteForce {

    private static final int SCAN_POINTS = 3000;
    private static final int REFINE_POINTS = 200;

    private GeneratorBruteForce() {
    }

    /** Tsink ≤ Tc &lt; Th ≤ Tsource, V = I·RL, Qh − Qc = P, with Qc from its own node equation. */
    public static void assertPhysical(ModuleParameters m, GeneratorCase c, GeneratorPoint p) {
        double slackK = 1e-9 * c.hotSourceK();
        assertThat(p.coldJunctionK()).as("Tc ≥ Tsink").isGreaterThanOrEqualTo(c.coldSinkK() - slackK);
        assertThat(p.coldJunctionK()).as("Tc < Th").isLessThan(p.hotJunctionK());
        assertThat(p.hotJunctionK()).as("Th ≤ Tsource").isLessThanOrEqualTo(c.hotSourceK() + slackK);
        assertThat(p.voltageV()).as("V = I·RL").isCloseTo(p.currentA() * p.loadOhm(), within(1e-12 * p.voltageV()));
        double emfV = m.seebeckVPerK() * (p.hotJunctionK() - p.coldJunctionK());
        assertThat(p.currentA() * (m.resistanceOhm() + p.loadOhm())).as("I(R + RL) = S(Th − Tc)")
                .isCloseTo(emfV, within(1e-8 * emfV + 1e-9));
        double i = p.currentA();
        double heatOutW = m.seebeckVPerK() * i * p.coldJunctionK() + 0.5 * i * i * m.resistanceOhm()
                + m.conductanceWPerK() * (p.hotJunctionK() - p.coldJunctionK());
        assertThat(p.heatInW() - heatOutW).as("Qh − Qc = P").isCloseTo(p.powerW(), within(1e-8 * p.heatInW()));
        // the exchanger lines: the heat reaches the faces through Rh and Rc
        assertThat(p.hotJunctionK()).isCloseTo(c.hotSourceK() - c.hotResistanceKPerW() * p.heatInW(),
                within(1e-9 * c.hotSourceK()));
        assertThat(p.coldJunctionK()).isCloseTo(c.coldSinkK() + c.coldResistanceKPerW() * heatOutW,
                within(1e-9 * c.hotSourceK()));
    }

    /** The most power over every physical point, by scanning the current (see the class comment). */
    public static double scanMaxPowerW(ModuleParameters m, GeneratorCase c) {
        double topA = m.seebeckVPerK() * (c.hotSourceK() - c.coldSinkK()) / m.resistanceOhm();
        double lowA = 0;
        double highA = topA;
        double bestW = 0;
        double bestA = Double.NaN;
        int points = SCAN_POINTS;
        for (int round = 0; round < 3; round++) {
            double stepA = (highA - lowA) / points;
            for (int n = 0; n <= points; n++) {
                double i = lowA + n * stepA;
                double powerW = powerAtCurrentW(m, c, i);
                if (powerW > bestW) {
                    bestW = powerW;
                    bestA = i;
                }
            }
            if (Double.isNaN(bestA)) {
                return 0;
            }
            lowA = Math.max(0, bestA - stepA);
            highA = Math.min(topA, bestA + stepA);
            points = REFINE_POINTS;
        }
        return bestW;
    }

    /** Power on the load that carries current I, or −∞ when that point is not physical. */
    static double powerAtCurrentW(ModuleParameters m, GeneratorCase c, double i) {
        double[] junctionK = nodeTemperaturesK(m, c, i);
        double th = junctionK[0];
        double tc = junctionK[1];
        double emfV = m.seebeckVPerK() * (th - tc);
        double loadOhm = i > 0 ? emfV / i - m.resistanceOhm() : Double.POSITIVE_INFINITY;
        boolean physical = tc >= c.coldSinkK() && tc < th && th <= c.hotSourceK() && loadOhm >= 0;
        return physical ? i * (emfV - i * m.resistanceOhm()) : Double.NEGATIVE_INFINITY;
    }

    /** {Th, Tc} solving the raw node equations at current I: one Newton step on the affine residuals. */
    static double[] nodeTemperaturesK(ModuleParameters m, GeneratorCase c, double i) {
        double th = c.hotSourceK();
        double tc = c.coldSinkK();
        double h = 1.0; // K: the residuals are affine, so any step gives the exact Jacobian up to round-off
        double[] g = residualsK(m, c, i, th, tc);
        double[] gTh = residualsK(m, c, i, th + h, tc);
        double[] gTc = residualsK(m, c, i, th, tc + h);
        double j11 = (gTh[0] - g[0]) / h;
        double j21 = (gTh[1] - g[1]) / h;
        double j12 = (gTc[0] - g[0]) / h;
        double j22 = (gTc[1] - g[1]) / h;
        double det = j11 * j22 - j12 * j21;
        return new double[] {th - (g[0] * j22 - j12 * g[1]) / det, tc - (j11 * g[1] - j21 * g[0]) / det};
    }

    private static double[] residualsK(ModuleParameters m, GeneratorCase c, double i, double th, double tc) {
        double s = m.seebeckVPerK();
        double r = m.resistanceOhm();
        double k = m.conductanceWPerK();
        double heatInW = s * i * th - 0.5 * i * i * r + k * (th - tc);
        double heatOutW = s * i * tc + 0.5 * i * i * r + k * (th - tc);
        return new double[] {th - (c.hotSourceK() - c.hotResistanceKPerW() * heatInW),
                tc - (c.coldSinkK() + c.coldResistanceKPerW() * heatOutW)};
    }
}
