package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class GeneratorSolverTest {

    private static final ModuleParameters TM_A = new ModuleParameters(0.04, 2.4, 0.25);
    private static final GeneratorCase WITH_EXCHANGERS = new GeneratorCase(400, 300, 0.5, 0.5);

    private final GeneratorSolver solver = new GeneratorSolver();

    @Test
    void idealExchangersMatchTheLoadToTheModule() {
        // Source: matched load RL = R, physics.md i (Ioffe 1957, from memory).
        assertThat(solver.maxPower(TM_A, GeneratorCase.atJunctions(373.15, 303.15)).loadOhm())
                .isCloseTo(2.4, within(1e-5));
    }

    @Test
    void idealExchangersSolveEveryLoadOfAnArray() {
        // Source: I = Voc/(R + RL), physics.md i (Ioffe 1957, from memory). Four TM-A in series (S 0.16 V/K,
        // R 9.6 Ω) on a 9.808 Ω load once failed to bracket: the bracket end is the root itself.
        var array = TM_A.inArray(4, 1);
        double loadOhm = 9.80817245099401;
        assertThat(solver.atLoad(array, GeneratorCase.atJunctions(373.15, 303.15), loadOhm).currentA())
                .isCloseTo(0.16 * 70 / (9.6 + loadOhm), within(1e-12));
    }

    @Test
    void exchangerResistancesRaiseTheMaxPowerLoad() {
        // Source: thermal matching moves the optimum away from RL = R (physics.md i; Yazawa & Shakouri,
        // J. Appl. Phys. 111, 2012, from memory). Each half of the heat path drops part of the ΔT.
        assertThat(solver.maxPower(TM_A, WITH_EXCHANGERS).loadOhm()).isGreaterThan(2.4);
    }

    @Test
    void heatInIsPowerPlusHeatOut() {
        // Source: first law, Qc,out = Qh,in - P, physics.md i.
        GeneratorPoint p = solver.atLoad(TM_A, WITH_EXCHANGERS, 3);
        double heatOutW = TM_A.seebeckVPerK() * p.currentA() * p.coldJunctionK()
                + 0.5 * p.currentA() * p.currentA() * 2.4 + 0.25 * (p.hotJunctionK() - p.coldJunctionK());
        assertThat(p.heatOutW()).isCloseTo(heatOutW, within(1e-9));
    }

    @Test
    void junctionsSitOnTheExchangerLines() {
        // Source: Th = Tsrc - Rh·Qh,in and Tc = Tsnk + Rc·Qc,out, physics.md i.
        GeneratorPoint p = solver.atLoad(TM_A, WITH_EXCHANGERS, 3);
        assertThat(p.hotJunctionK()).isCloseTo(400 - 0.5 * p.heatInW(), within(1e-9));
        assertThat(p.coldJunctionK()).isCloseTo(300 + 0.5 * p.heatOutW(), within(1e-9));
    }

    @Test
    void maxEfficiencyIsAtLeastTheMaxPowerEfficiency() {
        double best = solver.maxEfficiency(TM_A, WITH_EXCHANGERS).efficiency();
        assertThat(best).isGreaterThanOrEqualTo(solver.maxPower(TM_A, WITH_EXCHANGERS).efficiency());
    }

    @Test
    void rejectsSourceNotHotterThanSink() {
        assertThatThrownBy(() -> new GeneratorCase(300, 300, 0, 0))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("hotSourceK"));
    }
}
