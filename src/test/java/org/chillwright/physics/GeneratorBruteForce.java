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
 * S(Tsrc − Tsnk)/R (evenly in I and in log I), drops the points that are not physical (Tc below the sink, Th above the source,
 * Tc ≥ Th, RL &lt; 0), and refines the best grid point by finer scans between its neighbours.
 */
public final class GeneratorBruteForce {

    private static final int SCAN_POINTS = 3000;
    private static final int REFINE_POINTS = 200;
    /** Decades below topA that the logarithmic part of the first scan covers. */
    private static final double LOG_DECADES = 10;
    /** Grid points closer than this fraction of the current bound count as one. */
    private static final double NEIGHBOUR_GAP = 1e-12;

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
        // The bound topA ignores the exchangers: with a large K and large resistances the useful currents are a
        // tiny fraction of it, so the first scan is evenly spaced in both I and log I, and each refinement
        // searches between the neighbours of the best point found so far.
        double[] grid = new double[2 * SCAN_POINTS + 2];
        for (int n = 0; n <= SCAN_POINTS; n++) {
            grid[n] = topA * n / SCAN_POINTS;
            grid[SCAN_POINTS + 1 + n] = topA * Math.pow(10, LOG_DECADES * ((double) n / SCAN_POINTS - 1));
        }
        java.util.Arrays.sort(grid);
        double bestW = 0;
        for (int round = 0; round < 4; round++) {
            int best = -1;
            for (int n = 0; n < grid.length; n++) {
                double powerW = powerAtCurrentW(m, c, grid[n]);
                if (powerW > bestW) {
                    bestW = powerW;
                    best = n;
                }
            }
            if (best < 0) {
                return bestW;
            }
            // the neighbours that differ from the best point: the two spacings nearly share I = topA/10^k
            int below = best;
            while (below > 0 && grid[best] - grid[below] <= NEIGHBOUR_GAP * topA) {
                below--;
            }
            int above = best;
            while (above < grid.length - 1 && grid[above] - grid[best] <= NEIGHBOUR_GAP * topA) {
                above++;
            }
            double lowA = grid[below];
            double highA = grid[above];
            grid = new double[REFINE_POINTS + 1];
            for (int n = 0; n <= REFINE_POINTS; n++) {
                grid[n] = lowA + (highA - lowA) * n / REFINE_POINTS;
            }
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
        // the same round-off slack as assertPhysical: with a zero exchanger resistance a face sits on its
        // reservoir, and the Newton step lands it an ulp either side
        double slackK = 1e-9 * c.hotSourceK();
        boolean physical = tc >= c.coldSinkK() - slackK && tc < th && th <= c.hotSourceK() + slackK && loadOhm >= 0;
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
