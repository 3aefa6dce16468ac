package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;

/**
 * Random modules and cases through a converter: the fixed-fraction point holds k·Voc, is physically possible
 * (junctions between source and sink, first law), gives no more power than a brute-force scan of the same
 * I–V curve finds, and never throws.
 */
class PowerConditioningProperties {

    private final PowerConditioning conditioning = new PowerConditioning();
    /** Used for the open circuit only: I = 0 is always on the valid branch. */
    private final GeneratorSolver solver = new GeneratorSolver();

    @Property(tries = 300)
    void aFixedFractionHoldsItsVoltageAndNeverBeatsTracking(
            @ForAll @DoubleRange(min = 0.005, max = 0.2) @Scale(4) double s,
            @ForAll @DoubleRange(min = 0.05, max = 20) double r,
            @ForAll @DoubleRange(min = 0.02, max = 3) double k,
            @ForAll @DoubleRange(min = 1, max = 200) double differenceK,
            @ForAll @DoubleRange(min = 0, max = 5) double hotKPerW,
            @ForAll @DoubleRange(min = 0, max = 5) double coldKPerW,
            @ForAll @DoubleRange(min = 0.05, max = 0.95) double fraction) {
        var module = new ModuleParameters(s, r, k);
        var c = new GeneratorCase(300 + differenceK, 300, hotKPerW, coldKPerW);
        GeneratorPoint p = conditioning.atFractionOfOpenCircuit(module, c, fraction);
        double vocV = solver.openCircuitV(module, c);
        assertThat(p.voltageV()).isCloseTo(fraction * vocV, within(1e-9 * vocV));
        assertThat(p.coldJunctionK()).isGreaterThanOrEqualTo(c.coldSinkK() - 1e-9);
        assertThat(p.hotJunctionK()).isGreaterThan(p.coldJunctionK());
        assertThat(p.hotJunctionK()).isLessThanOrEqualTo(c.hotSourceK() + 1e-9);
        assertThat(p.hotJunctionK()).isCloseTo(c.hotSourceK() - hotKPerW * p.heatInW(), within(1e-7));
        assertThat(p.coldJunctionK()).isCloseTo(c.coldSinkK() + coldKPerW * p.heatOutW(), within(1e-7));
        assertThat(p.powerW()).isLessThanOrEqualTo(bestScannedPowerW(module, c) * (1 + 1e-7));
        var delivered = conditioning.condition(module, c, Converter.demo().withInput(
                InputStrategy.fractionOfOpenCircuit(fraction)));
        assertThat(delivered.deliveredW()).isBetween(0.0, p.powerW());
    }

    /** Brute force: the most of I·V(I) on 2,000 currents over the physical branch, then 2,000 around the best. */
    private static double bestScannedPowerW(ModuleParameters module, GeneratorCase c) {
        double highA = PowerConditioning.physicalCurrentLimitA(module, c);
        double cellA = highA / 2000;
        double bestA = 0;
        double bestW = 0;
        for (int n = 1; n < 2000; n++) {
            double powerW = n * cellA * PowerConditioning.terminalVoltageV(module, c, n * cellA);
            if (powerW > bestW) {
                bestW = powerW;
                bestA = n * cellA;
            }
        }
        for (int n = -1000; n <= 1000; n++) {
            double i = bestA + n * cellA / 1000;
            if (i > 0 && i < highA) {
                bestW = Math.max(bestW, i * PowerConditioning.terminalVoltageV(module, c, i));
            }
        }
        return bestW;
    }
}
