package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

import tools.jackson.databind.JsonNode;

/**
 * The two-stage stack on the heat-sink network. Modules are the synthetic TM-A of check-cases.json
 * (S 0.04 V/K, R 2.4 Ω, K 0.25 W/K) and the cold stage of case S15 (30 couples of the same legs).
 */
class TwoStageStackTest {

    private static final ModuleParameters TM_A = new ModuleParameters(0.04, 2.4, 0.25);
    private static final ModuleParameters S15_COLD = new ModuleParameters(0.012, 0.72, 0.075);
    /** −30 °C set-point, 25 °C ambient, 0.5 W, forced-air sink. */
    private static final CoolingCase DEEP = new CoolingCase(243.15, 298.15, 0.5, 0.15, 0.1, 0.05);

    private static TwoStageStack stack(ModuleParameters cold, int coldSeries, int coldParallel, ModuleParameters hot,
                                       int hotSeries, int hotParallel) {
        return new TwoStageStack(new StageDesign(CandidateModule.of(1, cold), coldSeries, coldParallel),
                new StageDesign(CandidateModule.of(2, hot), hotSeries, hotParallel));
    }

    private static StackSolved solved(TwoStageStack stack, CoolingCase c, DriveLimits limits) {
        StackPoint point = stack.solve(c, limits);
        assertThat(point).as("%s", point).isInstanceOf(StackSolved.class);
        return (StackSolved) point;
    }

    @Test
    void networkMatchesCheckCaseS15AtFixedStageCurrents() {
        // Source: check case S15 (ideal equations per stage with Qh1 = Qc2, the two-stage balance derived here, this work): the stack's
        // 2x2 network with an ideal sink (Rh = 0) and the hot face at the case's Th is that cascade.
        JsonNode s15 = CheckCaseFile.byId("S15-two-stage-cascade");
        ModuleParameters cold = S15_COLD;
        ModuleParameters hot = TM_A;
        double i1 = CheckCaseFile.input(s15, "I1");
        double i2 = CheckCaseFile.input(s15, "I2");
        double tc = CheckCaseFile.input(s15, "Tc");
        double th = CheckCaseFile.input(s15, "Th");
        double[] junctions = StackKernel.junctionsK(cold.seebeckVPerK(), cold.resistanceOhm(), cold.conductanceWPerK(),
                hot.seebeckVPerK(), hot.resistanceOhm(), hot.conductanceWPerK(), tc, th, 0.0, i1, i2);
        double ti = junctions[0];
        double qc = cold.coldSideHeatW(i1, tc, ti);
        double p1 = cold.powerW(i1, tc, ti);
        double p2 = hot.powerW(i2, ti, th);
        assertThat(junctions[1]).isEqualTo(th);
        CheckCaseFile.assertMatches(s15, "Ti", ti);
        CheckCaseFile.assertMatches(s15, "Qc", qc);
        CheckCaseFile.assertMatches(s15, "P1", p1);
        CheckCaseFile.assertMatches(s15, "P2", p2);
        CheckCaseFile.assertMatches(s15, "COP", qc / (p1 + p2));
    }

    @Test
    void withAnIdealSinkItAgreesWithTheFixedSideCascade() {
        // Independent implementation: TwoStageCascade.sharedCurrentForLoad solves the same equations with a fixed
        // hot side by Commons Math's Brent optimiser and solver; with Rh = 0 and no cold interface the stack must
        // give the same current and interstage.
        var c = new CoolingCase(250, 300, 1.0, 0, 0, 0);
        StackSolved stack = solved(stack(S15_COLD, 1, 1, TM_A, 1, 1), c, DriveLimits.NONE);
        CascadeSolved cascade = (CascadeSolved) new TwoStageCascade(S15_COLD, TM_A).sharedCurrentForLoad(1.0, 250, 300);
        assertThat(stack.currentA()).isCloseTo(cascade.coldStageCurrentA(), within(1e-7));
        assertThat(stack.interstageK()).isCloseTo(cascade.interstageK(), within(1e-7));
        assertThat(stack.powerW()).isCloseTo(cascade.powerW(), within(1e-7));
    }

    @Test
    void pumpsTheLoadOnOneCurrentThroughBothStages() {
        StackSolved s = solved(stack(S15_COLD, 1, 2, TM_A, 1, 2), DEEP, DriveLimits.NONE);
        assertThat(s.coldStage().currentA()).isEqualTo(s.currentA());
        assertThat(s.hotStage().currentA()).isEqualTo(s.currentA());
        assertThat(s.coldStage().perModuleCurrentA()).isEqualTo(s.currentA() / 2);
        ModuleParameters cold = S15_COLD.inArray(1, 2);
        assertThat(cold.coldSideHeatW(s.currentA(), s.coldSideK(), s.interstageK())).isCloseTo(0.5, within(1e-7));
    }

    @Test
    void balancesEnergyAndKeepsTheTemperaturesInOrder() {
        // Identities (the two-stage balance derived here; the heat-sink network derived here): Qh1 = Qc2 at the interstage, Qh2 = load + P1 + P2 flows through the
        // hot path, Tc = set-point − load·Rint,c, and Tc < Ti < Th.
        StackSolved s = solved(stack(S15_COLD, 1, 1, TM_A, 2, 1), DEEP, DriveLimits.NONE);
        ModuleParameters cold = S15_COLD;
        ModuleParameters hot = TM_A.inArray(2, 1);
        double i = s.currentA();
        assertThat(cold.hotSideHeatW(i, s.coldSideK(), s.interstageK()))
                .isCloseTo(hot.coldSideHeatW(i, s.interstageK(), s.hotSideK()), within(1e-7));
        double rejectedW = hot.hotSideHeatW(i, s.interstageK(), s.hotSideK());
        assertThat(rejectedW).isCloseTo(s.heatLoadW() + s.powerW(), within(1e-7));
        assertThat(s.hotSideK()).isCloseTo(298.15 + DEEP.hotPathKPerW() * rejectedW, within(1e-7));
        assertThat(s.coldSideK()).isCloseTo(243.15 - 0.5 * 0.1, within(1e-12));
        assertThat(s.coldSideK()).isLessThan(s.interstageK());
        assertThat(s.interstageK()).isLessThan(s.hotSideK());
    }

    @Test
    void voltageIsTheSumOfTheStagesAndOhmsLawHolds() {
        // V = S(Th − Tc) + I·R per stage (the Ioffe 1957 / Goldsmid 2016 ideal equations); P = I·V.
        StackSolved s = solved(stack(S15_COLD, 1, 1, TM_A, 1, 1), DEEP, DriveLimits.NONE);
        double coldV = S15_COLD.voltageV(s.currentA(), s.coldSideK(), s.interstageK());
        double hotV = TM_A.voltageV(s.currentA(), s.interstageK(), s.hotSideK());
        assertThat(s.voltageV()).isCloseTo(coldV + hotV, within(1e-9));
        assertThat(s.powerW()).isCloseTo(s.currentA() * s.voltageV(), within(1e-9));
    }

    @Test
    void overallCopFollowsTheCascadeIdentity() {
        // Energy conservation (the two-stage balance derived here): 1 + 1/COP = (1 + 1/COP1)(1 + 1/COP2), COP2 = Qh1/P2.
        StackSolved s = solved(stack(S15_COLD, 1, 1, TM_A, 1, 1), DEEP, DriveLimits.NONE);
        double cop1 = s.heatLoadW() / s.coldStage().powerW();
        double cop2 = s.hotStage().heatPumpedW() / s.hotStage().powerW();
        assertThat(1 + 1 / s.cop()).isCloseTo((1 + 1 / cop1) * (1 + 1 / cop2), within(1e-9));
    }

    @Test
    void marginIsTheLowestSetPointWithinTheCurrentLimit() {
        // Definition shared with the single stage (Solved.marginK): the set-point can be lowered by marginK at
        // the same load with the current limited to the rated Imax, and not further.
        var limits = new DriveLimits(Double.NaN, Double.NaN, 1.6, Double.NaN);
        TwoStageStack stack = stack(S15_COLD, 1, 1, TM_A, 1, 1);
        StackSolved s = solved(stack, DEEP, limits);
        assertThat(s.marginK()).isPositive();
        double lowestK = DEEP.setPointK() - s.marginK();
        assertThat(stack.solve(withSetPoint(DEEP, lowestK + 0.01), limits).feasible()).isTrue();
        assertThat(stack.solve(withSetPoint(DEEP, lowestK - 0.01), limits).feasible()).isFalse();
    }

    @Test
    void marginWithoutALimitEndsAtTheCapacityPeak() {
        TwoStageStack stack = stack(S15_COLD, 1, 1, TM_A, 1, 1);
        StackSolved s = solved(stack, DEEP, DriveLimits.NONE);
        double lowestK = DEEP.setPointK() - s.marginK();
        assertThat(stack.solve(withSetPoint(DEEP, lowestK + 0.01), DriveLimits.NONE).feasible()).isTrue();
        assertThat(stack.solve(withSetPoint(DEEP, lowestK - 0.01), DriveLimits.NONE))
                .isInstanceOfSatisfying(Infeasible.class, i -> assertThat(i.reason()).isIn(Reason.LOAD_ABOVE_CAPACITY,
                        Reason.DELTA_T_BEYOND_REACH));
    }

    @Test
    void explainsALoadAboveWhatOneCurrentCanPump() {
        StackPoint point = stack(S15_COLD, 1, 1, TM_A, 1, 1).solve(DEEP.withHeatLoadW(20), DriveLimits.NONE);
        assertThat(point).isInstanceOfSatisfying(Infeasible.class, i -> {
            assertThat(i.reason()).isEqualTo(Reason.LOAD_ABOVE_CAPACITY);
            assertThat(i.detail()).contains("needs 20.00 W");
        });
    }

    @Test
    void explainsACurrentAboveTheColdStagesRating() {
        var rated = new CandidateModule(1, S15_COLD, 0.5, Double.NaN);
        var stack = new TwoStageStack(new StageDesign(rated, 1, 1), new StageDesign(CandidateModule.of(2, TM_A), 1, 1));
        assertThat(stack.solve(DEEP, DriveLimits.NONE)).isInstanceOfSatisfying(Infeasible.class, i -> {
            assertThat(i.reason()).isEqualTo(Reason.CURRENT_ABOVE_IMAX);
            assertThat(i.detail()).contains("cold stage");
        });
    }

    @Test
    void explainsASupplyVoltageTooLowForBothStages() {
        var limits = new DriveLimits(Double.NaN, 1.0, Double.NaN, Double.NaN);
        assertThat(stack(S15_COLD, 1, 1, TM_A, 1, 1).solve(DEEP, limits)).isInstanceOfSatisfying(Infeasible.class,
                i -> assertThat(i.reason()).isEqualTo(Reason.SUPPLY_VOLTAGE_EXCEEDED));
    }

    @Test
    void refusesAStackWhoseHotFaceIsAboveTheHotModulesLimit() {
        // As for a single stage: a hot face above the module's stated maximum is no operating point.
        var hot = new CandidateModule(2, TM_A, Double.NaN, 290);
        var stack = new TwoStageStack(new StageDesign(CandidateModule.of(1, S15_COLD), 1, 1), new StageDesign(hot, 1, 1));
        assertThat(stack.solve(DEEP, DriveLimits.NONE)).isInstanceOfSatisfying(Infeasible.class,
                i -> assertThat(i.reason()).isEqualTo(Reason.HOT_SIDE_ABOVE_LIMIT));
    }

    @Test
    void rejectsAMissingStageNamingIt() {
        assertThatThrownBy(() -> new TwoStageStack(new StageDesign(CandidateModule.of(1, TM_A), 1, 1), null))
                .isInstanceOfSatisfying(InvalidQuantityException.class, e -> assertThat(e.field()).isEqualTo("hotStage"));
    }

    @Test
    void rejectsANegativeRatedImaxNamingIt() {
        assertThatThrownBy(() -> new CandidateModule(1, TM_A, -1, Double.NaN))
                .isInstanceOfSatisfying(InvalidQuantityException.class,
                        e -> assertThat(e.field()).isEqualTo("ratedImaxA"));
    }

    private static CoolingCase withSetPoint(CoolingCase c, double setPointK) {
        return new CoolingCase(setPointK, c.ambientK(), c.heatLoadW(), c.sinkResistanceKPerW(), c.coldInterfaceKPerW(),
                c.hotInterfaceKPerW());
    }
}
