package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/**
 * Heating with the current reversed, module TM-A of the check cases (S 0.04 V/K, R 2.4 Ω, K 0.25 W/K).
 * The same ideal equations as cooling with the faces' roles swapped (Ioffe 1957; Goldsmid 2016, from memory).
 */
class HeatingCheckTest {

    private static final ModuleParameters TM_A = new ModuleParameters(0.04, 2.4, 0.25);
    private final HeatingCheck check = new HeatingCheck();

    @Test
    void idealSinkMatchesTheQuadraticOfTheHotSideEquation() {
        // Rh = 0 and no interface: Th = Tobj, Tc = Tamb, so Q = S·I·Th + ½·I²·R − K·ΔT is a quadratic in I
        // whose positive root is I = [−S·Th + √(S²Th² + 2R(Q + K·ΔT))]/R (hand algebra on the ideal equations)
        double th = 298.15;
        double tc = 263.15;
        double q = 6;
        double s = 0.04;
        double r = 2.4;
        double k = 0.25;
        double expected = (-s * th + Math.sqrt(s * s * th * th + 2 * r * (q + k * (th - tc)))) / r;
        var result = check.check(TM_A, th, tc, q, 0, 0, Double.NaN);
        assertThat(result.currentA()).isCloseTo(expected, within(1e-6));
        assertThat(result.sinkSideK()).isCloseTo(tc, within(1e-9));
    }

    @Test
    void energyBalancesWithAHeatSink() {
        // heat drawn from the sink side (Tamb − Tc)/Rh plus the electrical input is the heat delivered
        double rh = 0.35;
        double ambientK = 253.15;
        var result = check.check(TM_A, 293.15, ambientK, 8, 0.1, rh, Double.NaN);
        double drawnW = (ambientK - result.sinkSideK()) / rh;
        assertThat(drawnW + result.powerW()).isCloseTo(8, within(1e-6));
        assertThat(result.copHeating()).isGreaterThan(1); // heat pumped from outside adds to the Joule heat
    }

    @Test
    void noHeatingNeededWhileTheIdleModuleDrainsLessThanTheCooledPartDissipates() {
        // 2 W dissipated; at 5 K below the set-point the idle module conducts about 1.1 W away (K·ΔT across it)
        var result = check.check(TM_A, 293.15, 288.15, -2, 0.1, 0.3, 3.8);
        assertThat(result.needsHeating()).isFalse();
        assertThat(result.reachable()).isTrue();
        assertThat(result.currentA()).isZero();
    }

    @Test
    void heatingIsNeededWhenTheIdleModuleDrainsMoreThanTheCooledPartDissipates() {
        // same 2 W, 25 K below the set-point: conduction through K = 0.25 W/K drains about 5 W
        var result = check.check(TM_A, 293.15, 268.15, -2, 0.1, 0.3, 3.8);
        assertThat(result.needsHeating()).isTrue();
        assertThat(result.currentA()).isPositive();
        assertThat(result.withinLimits()).isTrue();
    }

    @Test
    void currentAboveTheLimitIsFlagged() {
        var result = check.check(TM_A, 303.15, 233.15, 80, 0.1, 0.3, 3.8);
        assertThat(result.currentA()).isGreaterThan(3.8);
        assertThat(result.withinLimits()).isFalse();
    }

    @Test
    void rejectsANegativeInterfaceResistance() {
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> check.check(TM_A, 293.15, 263.15, 5, -0.1, 0.3, 3.8))
                .isInstanceOf(InvalidQuantityException.class).hasMessageContaining("coldInterfaceKPerW");
    }
}
