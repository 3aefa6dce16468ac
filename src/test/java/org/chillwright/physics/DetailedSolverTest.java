package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

import org.junit.jupiter.api.Test;

class DetailedSolverTest {

    /** Synthetic module TM-A of check-cases.json. */
    private static final ModuleParameters TM_A = new ModuleParameters(0.04, 2.4, 0.25);
    /** The set-up of check case S10: 10 W at 278.15 K, ambient 298.15 K, sink 0.3, cold 0.1, hot 0.05 K/W. */
    private static final CoolingCase S10 = new CoolingCase(278.15, 298.15, 10, 0.3, 0.1, 0.05);
    /** An invented Bi2Te3 module: 127 couples of 1 mm² × 1.2 mm legs. */
    static final DetailedModule BI2TE3_MODULE = new DetailedModule(127, 1e-6, 1e-6, 1.2e-3, 0, 0,
            MaterialSet.BI2TE3_COUPLE_AVERAGE);

    private final DetailedSolver solver = new DetailedSolver();

    private static void assertRelative(double actual, double expected, double relative) {
        assertThat(actual).isCloseTo(expected, within(relative * Math.max(1e-12, Math.abs(expected))));
    }

    @Test
    void constantPropertiesReproduceTheIdealEquationsBetweenFixedFaces() {
        // Identity: with constant α, ρ, k the exact leg profile is quadratic and the ideal equations
        // (physics.md a) are exact; the box scheme is exact for quadratics, even on one cell.
        var array = DetailedArray.single(DetailedModule.ofConstantParameters(TM_A));
        for (int cells : new int[] {1, 3, 16}) {
            FaceSolution f = new DetailedSolver(cells).atFaces(array, 2.5, 275, 310).orElseThrow();
            assertRelative(f.coldSideHeatW(), TM_A.coldSideHeatW(2.5, 275, 310), 1e-9);
            assertRelative(f.hotSideHeatW(), TM_A.hotSideHeatW(2.5, 275, 310), 1e-9);
            assertRelative(f.voltageV(), TM_A.voltageV(2.5, 275, 310), 1e-9);
        }
    }

    @Test
    void constantPropertiesReproduceTheLumpedOperatingPointToOnePartPerMillion() {
        // Identity: the same network and ideal equations as OperatingPointSolver (physics.md e).
        Solved lumped = (Solved) new OperatingPointSolver().solve(TM_A, S10, DriveLimits.NONE);
        DetailedPoint detailed = (DetailedPoint) solver.solve(
                DetailedArray.single(DetailedModule.ofConstantParameters(TM_A)), S10, DriveLimits.NONE);
        assertRelative(detailed.currentA(), lumped.currentA(), 1e-6);
        assertRelative(detailed.cop(), lumped.cop(), 1e-6);
        assertRelative(detailed.powerW(), lumped.powerW(), 1e-6);
        assertRelative(detailed.hotSideK(), lumped.hotSideK(), 1e-6);
        assertRelative(detailed.coldSideK(), lumped.coldSideK(), 1e-6);
        assertRelative(detailed.heatRejectedW(), lumped.heatRejectedW(), 1e-6);
        assertRelative(detailed.maxHeatLoadW(), lumped.maxHeatLoadW(), 1e-6);
    }

    @Test
    void constantPropertiesReproduceTheLumpedArrayOperatingPoint() {
        // Identity: physics.md g, identical modules on common plates.
        var lumpedArray = new ModuleArray(TM_A, 2, 2);
        var c = new CoolingCase(283.15, 308.15, 30, 0.1, 0.02, 0.02);
        Solved lumped = (Solved) new OperatingPointSolver().solve(lumpedArray, c, DriveLimits.NONE);
        DetailedPoint detailed = (DetailedPoint) solver.solve(
                new DetailedArray(DetailedModule.ofConstantParameters(TM_A), 2, 2), c, DriveLimits.NONE);
        assertRelative(detailed.currentA(), lumped.currentA(), 1e-6);
        assertRelative(detailed.voltageV(), lumped.voltageV(), 1e-6);
        assertRelative(detailed.maxHeatLoadW(), lumped.maxHeatLoadW(), 1e-6);
    }

    @Test
    void needsNoCurrentWhenConductionCarriesTheLoad() {
        // Passive case of physics.md e, as in the lumped solve.
        var warmObject = new CoolingCase(310, 298.15, 1, 0.3, 0.1, 0.05);
        DetailedPoint p = (DetailedPoint) solver.solve(DetailedArray.single(BI2TE3_MODULE), warmObject,
                DriveLimits.NONE);
        assertThat(p.currentA()).isZero();
    }

    @Test
    void aLoadAboveCapacityIsInfeasibleWithItsReason() {
        var tooMuch = new CoolingCase(278.15, 298.15, 200, 0.3, 0, 0.05);
        DetailedResult r = solver.solve(DetailedArray.single(BI2TE3_MODULE), tooMuch, DriveLimits.NONE);
        assertThat(r).isInstanceOfSatisfying(Infeasible.class,
                i -> assertThat(i.reason()).isEqualTo(Reason.LOAD_ABOVE_CAPACITY));
    }

    @Test
    void closesTheNetworkAndTheEnergyBalanceAtTheOperatingPoint() {
        // Network Th = Tamb + Qh·Rh and first law Qh = Qc + P (physics.md e and a).
        DetailedPoint p = (DetailedPoint) solver.solve(DetailedArray.single(BI2TE3_MODULE), S10, DriveLimits.NONE);
        assertThat(p.hotSideK()).isCloseTo(S10.ambientK() + S10.hotPathKPerW() * p.heatRejectedW(), within(1e-6));
        assertRelative(p.heatRejectedW(), p.heatLoadW() + p.powerW(), 1e-9);
        assertThat(p.maxHeatLoadW()).isGreaterThan(p.heatLoadW());
        assertThat(p.withinMaterialRange()).isTrue();
    }

    @Test
    void detailedBismuthTellurideStaysCloseToTheLumpedModelAtTheMeanTemperature() {
        // Qualitative published finding: "the ideal equation effectively predicts the performance" of
        // typical Bi2Te3 coolers (H.S. Lee, course notes ME539 ch. 5, "Thomson Effect, Exact Solution, and
        // Compatibility Factor", opening summary read; journal version H.S. Lee, Energy 56 (2013) 61-69,
        // not re-read). Here: properties at the mean junction temperature, within 5 % on the current.
        DetailedPoint p = (DetailedPoint) solver.solve(DetailedArray.single(BI2TE3_MODULE), S10, DriveLimits.NONE);
        ModuleParameters atMean = BI2TE3_MODULE.lumpedAt(0.5 * (p.coldSideK() + p.hotSideK()));
        Solved lumped = (Solved) new OperatingPointSolver().solve(atMean, S10, DriveLimits.NONE);
        assertThat(p.currentA()).isCloseTo(lumped.currentA(), withinPercentage(5));
        assertThat(p.cop()).isCloseTo(lumped.cop(), withinPercentage(5));
    }

    @Test
    void theMaxHeatLoadIsTheEdgeBetweenHoldingAndNotHoldingTheSetPoint() {
        // Definition of maxHeatLoadW: just below it the set-point is held, just above it is not.
        var array = DetailedArray.single(BI2TE3_MODULE);
        double most = ((DetailedPoint) solver.solve(array, S10, DriveLimits.NONE)).maxHeatLoadW();
        assertThat(solver.solve(array, S10.withHeatLoadW(0.999 * most), DriveLimits.NONE).feasible()).isTrue();
        assertThat(solver.solve(array, S10.withHeatLoadW(1.001 * most), DriveLimits.NONE).feasible()).isFalse();
    }
}
