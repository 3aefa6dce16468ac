package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;

import org.junit.jupiter.api.Test;

import tools.jackson.databind.JsonNode;

/**
 * Cool-down from ambient. Module TM-A of check-cases.json (S 0.04 V/K, R 2.4 Ω, K 0.25 W/K). The independent
 * integrations here are classical fourth-order Runge–Kutta with a fixed step of a ten-thousandth of the time
 * constant, on face balances solved in the test from the ideal equations (the Ioffe 1957 / Goldsmid 2016 ideal equations) and the network of
 * the heat-sink network derived here.
 */
class CooldownSolverTest {

    private static final ModuleParameters TM_A = new ModuleParameters(0.04, 2.4, 0.25);
    private static final ModuleArray ONE = ModuleArray.single(TM_A);
    private final CooldownSolver solver = new CooldownSolver();

    /** 0 °C set-point at 30 °C, 3 W of which 0.02 W/K leak; interfaces 0.1 and 0.05 K/W, sink 0.3 K/W. */
    private static final CoolingCase CASE = new CoolingCase(273.15, 303.15, 3.0, 0.3, 0.1, 0.05);
    private static final CooldownSetup NO_SINK_MASS = new CooldownSetup(40, 0.02, 0, 0.1);
    private static final CooldownSetup SINK_MASS = new CooldownSetup(40, 0.02, 250, 0.1);

    @Test
    void reproducesCheckCaseS16() {
        // Source: check case S16 (lumped-capacitance method, Incropera & DeWitt ch. 5; exact exponential). The hot
        // face is held at 300 K by an ideal sink at a 300 K ambient, no interfaces; a 260 K set-point with a
        // 1/20 W/K leak makes the active load the case's 2 W.
        JsonNode s16 = CheckCaseFile.byId("S16-cooldown-transient");
        var c = new CoolingCase(260, 300, 2 + (300 - 260) / 20.0, 0, 0, 0);
        var setup = new CooldownSetup(CheckCaseFile.input(s16, "C"), 1 / CheckCaseFile.input(s16, "Rleak"), 0, 0.1);
        CooldownRun run = solver.run(ONE, c, setup, CheckCaseFile.input(s16, "I"), CheckCaseFile.input(s16, "t"));
        List<CooldownSample> curve = run.curve();
        assertThat(curve.get(curve.size() - 1).timeS()).isEqualTo(60.0);
        CheckCaseFile.assertMatches(s16, "T", curve.get(curve.size() - 1).partK());
        CheckCaseFile.assertMatches(s16, "T_inf", run.finalPartK());
        CheckCaseFile.assertMatches(s16, "tau", run.timeConstantS());
        assertThat(run.method()).isEqualTo(CooldownRun.Method.CLOSED_FORM);
    }

    @Test
    void withoutInterfacesItIsTheExistingClosedForm() {
        var c = new CoolingCase(260, 300, 4, 0, 0, 0);
        CooldownRun run = solver.run(ONE, c, new CooldownSetup(50, 0.05, 0, 0.1), 2, 600);
        var cooldown = new Cooldown(TM_A, 2, 300, 50, 2, 300, 20);
        for (CooldownSample sample : run.curve()) {
            assertThat(sample.partK()).isCloseTo(cooldown.temperatureAtK(300, sample.timeS()), within(1e-9));
        }
        assertThat(run.timeToSetPointS()).isCloseTo(cooldown.timeToTargetS(300, 260.1).orElseThrow(), within(1e-9));
    }

    @Test
    void oneNodeWithInterfacesMatchesAnIndependentIntegration() {
        double currentA = 2.5;
        CooldownRun run = solver.run(ONE, CASE, NO_SINK_MASS, currentA, Double.NaN);
        double[][] reference = rk4(CASE, NO_SINK_MASS, currentA, run.curve(), run.timeConstantS() / 10_000);
        for (int n = 0; n < run.curve().size(); n++) {
            assertThat(run.curve().get(n).partK()).isCloseTo(reference[n][0], within(1e-6));
            assertThat(run.curve().get(n).hotSideK()).isCloseTo(reference[n][2], within(1e-6));
        }
    }

    @Test
    void twoNodesMatchAnIndependentIntegration() {
        double currentA = 2.5;
        CooldownRun run = solver.run(ONE, CASE, SINK_MASS, currentA, Double.NaN);
        assertThat(run.method()).isEqualTo(CooldownRun.Method.DORMAND_PRINCE_853);
        double[][] reference = rk4(CASE, SINK_MASS, currentA, run.curve(), run.timeConstantS() / 10_000);
        for (int n = 0; n < run.curve().size(); n++) {
            assertThat(run.curve().get(n).timeS()).isCloseTo(reference[n][3], within(1e-9));
            assertThat(run.curve().get(n).partK()).isCloseTo(reference[n][0], within(1e-6));
            assertThat(run.curve().get(n).hotSideK()).isCloseTo(reference[n][2], within(1e-6));
        }
    }

    @Test
    void twoNodesReachTheSetPointWhenTheIndependentIntegrationDoes() {
        double currentA = 2.5;
        CooldownRun run = solver.run(ONE, CASE, SINK_MASS, currentA, Double.NaN);
        assertThat(run.reachesSetPoint()).isTrue();
        double stepS = run.timeConstantS() / 10_000;
        double crossingS = rk4Crossing(CASE, SINK_MASS, currentA, CASE.setPointK() + 0.1, stepS);
        assertThat(run.timeToSetPointS()).isCloseTo(crossingS, within(stepS));
    }

    @Test
    void theExactTwoNodeSolutionAgreesWithTheIntegrator() {
        // Two independent routes through the same linear system: Dormand–Prince 8(5,3) and the matrix exponential.
        var network = new CooldownSolver.Network(TM_A, CASE, SINK_MASS, 2.5);
        CooldownRun integrated = network.integrated(Double.NaN);
        CooldownRun exact = network.exact(Double.NaN);
        assertThat(exact.method()).isEqualTo(CooldownRun.Method.EXACT_TWO_NODE);
        assertThat(exact.timeToSetPointS()).isCloseTo(integrated.timeToSetPointS(), within(1e-6));
        assertThat(exact.timeConstantS()).isEqualTo(integrated.timeConstantS());
        for (int n = 0; n < exact.curve().size(); n++) {
            assertThat(exact.curve().get(n).timeS()).isCloseTo(integrated.curve().get(n).timeS(), within(1e-9));
            assertThat(exact.curve().get(n).partK()).isCloseTo(integrated.curve().get(n).partK(), within(1e-7));
        }
    }

    @Test
    void aStiffSinkNodeIsSolvedExactlyAndMatchesAnIndependentIntegration() {
        // 0.05 J/K behind 0.3 K/W: the sink node settles in milliseconds, the part in minutes (stiff)
        var stiff = new CooldownSetup(40, 0.02, 0.05, 0.1);
        CooldownRun run = solver.run(ONE, CASE, stiff, 2.5, 300);
        assertThat(run.method()).isEqualTo(CooldownRun.Method.EXACT_TWO_NODE);
        double[][] reference = rk4(CASE, stiff, 2.5, run.curve(), 1e-3);
        for (int n = 0; n < run.curve().size(); n++) {
            assertThat(run.curve().get(n).partK()).isCloseTo(reference[n][0], within(1e-6));
        }
        double crossingS = rk4Crossing(CASE, stiff, 2.5, CASE.setPointK() + 0.1, 1e-3);
        assertThat(run.timeToSetPointS()).isCloseTo(crossingS, within(1e-3));
    }

    @Test
    void aHeatSinkWithMassChangesHowFastButNotWhere() {
        // Heat capacities change how fast, not where: the steady balance has no capacity in it (the lumped-capacitance method, Incropera & DeWitt ch. 5).
        // A sink with mass starts at ambient and warms slowly, so early on its hot face is cooler than that of a
        // sink that follows its heat at once.
        CooldownRun light = solver.run(ONE, CASE, NO_SINK_MASS, 2.5, 300);
        CooldownRun heavy = solver.run(ONE, CASE, SINK_MASS, 2.5, 300);
        assertThat(heavy.finalPartK()).isCloseTo(light.finalPartK(), within(1e-9));
        assertThat(heavy.finalHotSideK()).isCloseTo(light.finalHotSideK(), within(1e-9));
        assertThat(heavy.curve().get(1).hotSideK()).isLessThan(light.curve().get(1).hotSideK());
    }

    @Test
    void theSlowestTimeConstantGovernsTheTail() {
        // Identity of a linear system: once the fast mode has died, T − T∞ falls by e per time constant.
        CooldownRun run = solver.run(ONE, CASE, SINK_MASS, 2.5, 1500); // about 12 time constants
        List<CooldownSample> curve = run.curve();
        CooldownSample a = curve.get(80);
        CooldownSample b = curve.get(100);
        double ratio = (b.partK() - run.finalPartK()) / (a.partK() - run.finalPartK());
        assertThat(Math.log(ratio)).isCloseTo(-(b.timeS() - a.timeS()) / run.timeConstantS(), within(1e-4));
    }

    @Test
    void atTheDesignCurrentThePartSettlesAtTheSetPoint() {
        // The design current holds the set-point against the case's load, so the cool-down ends exactly there.
        CooldownAnalysis analysis = solver.analyse(ONE, CASE, DriveLimits.ofRatedImaxA(3.8), SINK_MASS);
        assertThat(analysis.atDesignCurrent().finalPartK()).isCloseTo(CASE.setPointK(), within(1e-7));
        assertThat(analysis.atDesignCurrent().reachesSetPoint()).isTrue();
        assertThat(analysis.timeConstantS()).isEqualTo(analysis.atDesignCurrent().timeConstantS());
    }

    @Test
    void atTheCurrentLimitThePartGetsThereSooner() {
        CooldownAnalysis analysis = solver.analyse(ONE, CASE, DriveLimits.ofRatedImaxA(3.8), NO_SINK_MASS);
        assertThat(analysis.atCurrentLimit().currentA()).isEqualTo(3.8);
        assertThat(analysis.atCurrentLimit().timeToSetPointS())
                .isLessThan(analysis.atDesignCurrent().timeToSetPointS());
    }

    @Test
    void withoutALimitThereIsNoRunAtTheLimit() {
        assertThat(solver.analyse(ONE, CASE, DriveLimits.NONE, NO_SINK_MASS).atCurrentLimit()).isNull();
    }

    @Test
    void tooLittleCurrentNeverReachesTheSetPoint() {
        CooldownRun run = solver.run(ONE, CASE, NO_SINK_MASS, 0.5, Double.NaN);
        assertThat(run.finalPartK()).isGreaterThan(CASE.setPointK() + 0.1);
        assertThat(run.reachesSetPoint()).isFalse();
        assertThat(run.timeToSetPointS()).isNaN();
    }

    @Test
    void aRunawayHasNoSteadyState() {
        // 0.35 K/W hot path: the fixed-current system loses its steady state from about 77 A,
        // (1 + √(1 + 4·Rh·K))/(2·Rh·S) (the fixed-current balance derived here), far above the capacity peak
        CooldownRun run = solver.run(ONE, CASE, NO_SINK_MASS, 100, Double.NaN);
        assertThat(run.finalPartK()).isNaN();
        assertThat(run.curve()).isEmpty();
    }

    @Test
    void rejectsALeakLargerThanTheLoadNamingIt() {
        assertThatThrownBy(() -> solver.run(ONE, CASE, new CooldownSetup(40, 1.0, 0, 0.1), 2, Double.NaN))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("leakConductanceWPerK"));
    }

    @Test
    void rejectsANegativeCurrentNamingIt() {
        assertThatThrownBy(() -> solver.run(ONE, CASE, NO_SINK_MASS, -1, Double.NaN))
                .isInstanceOfSatisfying(InvalidQuantityException.class, e -> assertThat(e.field()).isEqualTo("currentA"));
    }

    // ---- independent integration ----

    /**
     * Rates {dT/dt, dTb/dt} and the hot face at the part T and sink base Tb: the faces from the two face
     * balances Qc = (T − Tc)/Rc and Qh = (Th − Tb)/Rint,h (Rint,h + Rsink to ambient with no sink node),
     * with Qc and Qh from the ideal equations, solved as a 2x2 linear system.
     */
    private static double[] rates(CoolingCase c, CooldownSetup setup, double i, double partK, double sinkK) {
        double s = 0.04;
        double r = 2.4;
        double k = 0.25;
        boolean sinkNode = setup.sinkHeatCapacityJPerK() > 0;
        double rc = c.coldInterfaceKPerW();
        double rhot = sinkNode ? c.hotInterfaceKPerW() : c.hotPathKPerW();
        double hotNodeK = sinkNode ? sinkK : c.ambientK();
        // (S·I + K)Tc − K·Th − Qc = ½I²R with Qc = (T − Tc)/Rc, written with Rc multiplied through:
        double a11 = 1 + rc * (s * i + k);
        double a12 = -rc * k;
        double b1 = partK + rc * 0.5 * i * i * r;
        double a21 = -rhot * k;
        double a22 = 1 + rhot * (k - s * i);
        double b2 = hotNodeK + rhot * 0.5 * i * i * r;
        double det = a11 * a22 - a12 * a21;
        double tc = (b1 * a22 - a12 * b2) / det;
        double th = (a11 * b2 - a21 * b1) / det;
        double qc = s * i * tc - 0.5 * i * i * r - k * (th - tc);
        double qh = s * i * th + 0.5 * i * i * r - k * (th - tc);
        double activeW = c.heatLoadW() - setup.leakConductanceWPerK() * (c.ambientK() - c.setPointK());
        double partRate = (activeW + setup.leakConductanceWPerK() * (c.ambientK() - partK) - qc)
                / setup.heatCapacityJPerK();
        double sinkRate = sinkNode
                ? (qh - (sinkK - c.ambientK()) / c.sinkResistanceKPerW()) / setup.sinkHeatCapacityJPerK() : 0.0;
        return new double[] {partRate, sinkRate, th};
    }

    /** RK4 from ambient; for each sample time of {@code at}: {T, Tb, Th, t}. */
    private static double[][] rk4(CoolingCase c, CooldownSetup setup, double i, List<CooldownSample> at,
                                  double stepS) {
        double[][] out = new double[at.size()][];
        double t = 0;
        double[] y = {c.ambientK(), c.ambientK()};
        for (int n = 0; n < at.size(); n++) {
            double until = at.get(n).timeS();
            while (t < until - 1e-12) {
                double h = Math.min(stepS, until - t);
                y = step(c, setup, i, y, h);
                t += h;
            }
            out[n] = new double[] {y[0], y[1], rates(c, setup, i, y[0], y[1])[2], t};
        }
        return out;
    }

    /** First time T falls to {@code targetK}, by RK4 with linear interpolation inside the step. */
    private static double rk4Crossing(CoolingCase c, CooldownSetup setup, double i, double targetK, double stepS) {
        double t = 0;
        double[] y = {c.ambientK(), c.ambientK()};
        while (t < 1e7) {
            double[] next = step(c, setup, i, y, stepS);
            if (next[0] <= targetK) {
                return t + stepS * (y[0] - targetK) / (y[0] - next[0]);
            }
            y = next;
            t += stepS;
        }
        throw new AssertionError("never reached " + targetK);
    }

    private static double[] step(CoolingCase c, CooldownSetup setup, double i, double[] y, double h) {
        double[] k1 = rates(c, setup, i, y[0], y[1]);
        double[] k2 = rates(c, setup, i, y[0] + h / 2 * k1[0], y[1] + h / 2 * k1[1]);
        double[] k3 = rates(c, setup, i, y[0] + h / 2 * k2[0], y[1] + h / 2 * k2[1]);
        double[] k4 = rates(c, setup, i, y[0] + h * k3[0], y[1] + h * k3[1]);
        return new double[] {y[0] + h / 6 * (k1[0] + 2 * k2[0] + 2 * k3[0] + k4[0]),
                y[1] + h / 6 * (k1[1] + 2 * k2[1] + 2 * k3[1] + k4[1])};
    }
}
