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
        // Source: matched load RL = R (Ioffe 1957; Rowe, CRC Handbook 1995, from memory).
        assertThat(solver.maxPower(TM_A, GeneratorCase.atJunctions(373.15, 303.15)).loadOhm())
                .isCloseTo(2.4, within(1e-5));
    }

    @Test
    void idealExchangersSolveEveryLoadOfAnArray() {
        // Source: I = Voc/(R + RL) (Ioffe 1957; Rowe, CRC Handbook 1995, from memory). Four TM-A in series (S 0.16 V/K,
        // R 9.6 Ω) on a 9.808 Ω load once failed to bracket: the bracket end is the root itself.
        var array = TM_A.inArray(4, 1);
        double loadOhm = 9.80817245099401;
        assertThat(solver.atLoad(array, GeneratorCase.atJunctions(373.15, 303.15), loadOhm).currentA())
                .isCloseTo(0.16 * 70 / (9.6 + loadOhm), within(1e-12));
    }

    @Test
    void exchangerResistancesRaiseTheMaxPowerLoad() {
        // Source: thermal matching moves the optimum away from RL = R (Yazawa & Shakouri,
        // J. Appl. Phys. 111, 2012, from memory). Each half of the heat path drops part of the ΔT.
        assertThat(solver.maxPower(TM_A, WITH_EXCHANGERS).loadOhm()).isGreaterThan(2.4);
    }

    @Test
    void heatInIsPowerPlusHeatOut() {
        // Source: first law, Qc,out = Qh,in - P (Ioffe 1957; Rowe, CRC Handbook 1995, from memory).
        GeneratorPoint p = solver.atLoad(TM_A, WITH_EXCHANGERS, 3);
        double heatOutW = TM_A.seebeckVPerK() * p.currentA() * p.coldJunctionK()
                + 0.5 * p.currentA() * p.currentA() * 2.4 + 0.25 * (p.hotJunctionK() - p.coldJunctionK());
        assertThat(p.heatOutW()).isCloseTo(heatOutW, within(1e-9));
    }

    @Test
    void junctionsSitOnTheExchangerLines() {
        // Source: Th = Tsrc - Rh·Qh,in and Tc = Tsnk + Rc·Qc,out (Ioffe 1957; Rowe, CRC Handbook 1995, from memory).
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
    void fiveBySevenArrayOfTheS10ModuleBetweenExchangersGivesTheBruteForceMaxPower() {
        // The S10 module (S 0.04 V/K, R 2.4 Ω, K 0.25 W/K) as 5 series × 7 parallel, 0.5 K/W on each side,
        // source 600 K, sink 300 K. Reference: an independent brute-force scan of the raw node equations
        // (issue 10 of this project, recomputed in arbitrary precision by its reviewer): 2.661 W on 3.558 Ω at
        // 0.865 A, Th 460.73 K, Tc 437.94 K. The old solver returned 202 W with Th ≈ −1e13 K here.
        var array = TM_A.inArray(5, 7);
        var c = new GeneratorCase(600, 300, 0.5, 0.5);
        GeneratorPoint p = solver.maxPower(array, c);
        assertThat(p.powerW()).isCloseTo(2.661, within(0.0005));
        assertThat(p.loadOhm()).isCloseTo(3.558, within(0.001));
        assertThat(p.currentA()).isCloseTo(0.865, within(0.0005));
        assertThat(p.hotJunctionK()).isCloseTo(460.73, within(0.005));
        assertThat(p.coldJunctionK()).isCloseTo(437.94, within(0.005));
        // and the scan in GeneratorBruteForce (not the solver) agrees to 1e-6
        assertThat(p.powerW()).isCloseTo(GeneratorBruteForce.scanMaxPowerW(array, c), within(3e-6));
        GeneratorBruteForce.assertPhysical(array, c, p);
    }

    @Test
    void theBracketEndsBelowTheSingularCurrentOfTheExchangerSystem() {
        // D(I) = (1 + Rh·K + Rh·S·I)(1 + Rc·K − Rc·S·I) − Rh·Rc·K² vanishes at the returned current (hand algebra
        // on the 2x2 determinant). For the 5 × 7 array (S 0.2 V/K, R 1.714 Ω, K 8.75 W/K) with Rh = Rc = 0.5 K/W
        // the linear term cancels: I_D = √((1 + (Rh + Rc)K)/(Rh·Rc·S²)) = √(9.75/0.01) = 31.22 A, below the
        // short-circuit bound S·ΔT/R = 35 A, which is why that bound alone was not a safe end of the bracket.
        var array = TM_A.inArray(5, 7);
        var c = new GeneratorCase(600, 300, 0.5, 0.5);
        double singularA = GeneratorSolver.singularCurrentA(array, c);
        double s = array.seebeckVPerK();
        double k = array.conductanceWPerK();
        double d = (1 + 0.5 * k + 0.5 * s * singularA) * (1 + 0.5 * k - 0.5 * s * singularA) - 0.25 * k * k;
        assertThat(d).isCloseTo(0, within(1e-9));
        assertThat(singularA).isCloseTo(Math.sqrt(975), within(1e-9)).isLessThan(s * 300 / array.resistanceOhm());
        assertThat(GeneratorSolver.singularCurrentA(array, new GeneratorCase(600, 300, 0.5, 0))).isInfinite();
    }

    @Test
    void onlyAHotSideResistanceStillSolvesThroughTheExchanger() {
        // Rc = 0 holds the cold face at the sink; the hot face still drops Rh·Qh (not the ideal shortcut)
        var c = new GeneratorCase(400, 300, 0.5, 0);
        GeneratorPoint p = solver.atLoad(TM_A, c, 3);
        assertThat(p.coldJunctionK()).isCloseTo(300, within(1e-9));
        assertThat(p.hotJunctionK()).isCloseTo(400 - 0.5 * p.heatInW(), within(1e-9));
        assertThat(p.hotJunctionK()).isLessThan(400);
    }

    @Test
    void anImpossiblePointIsAFaultNotAnAnswer() {
        // what the old solver returned for the 5 × 7 array above: Th ≈ −1e13 K, far outside [Tsink, Tsource]
        var array = TM_A.inArray(5, 7);
        var c = new GeneratorCase(600, 300, 0.5, 0.5);
        var impossible = new GeneratorPoint(0.207, 31.22, 6.47, 202.07, 9.7e-12, -1.04e13, -2.03e13, 2.09e13);
        assertThatThrownBy(() -> GeneratorSolver.requirePhysical(array, c, impossible))
                .isInstanceOf(IllegalStateException.class).hasMessageContaining("impossible generator point");
        // a real point passes
        GeneratorSolver.requirePhysical(array, c, solver.maxPower(array, c));
    }

    @Test
    void rejectsSourceNotHotterThanSink() {
        assertThatThrownBy(() -> new GeneratorCase(300, 300, 0, 0))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("hotSourceK"));
    }
}
