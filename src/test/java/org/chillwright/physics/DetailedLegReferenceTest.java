package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/**
 * The detailed leg model against an exact solution with the Thomson effect, its order of
 * convergence, and the published sign of the Thomson effect.
 */
class DetailedLegReferenceTest {

    private static final double AREA_M2 = 1e-6;
    private static final double LENGTH_M = 1.5e-3;
    private static final double RHO_OHM_M = 1.0e-5;
    private static final double K_W_PER_MK = 1.5;
    private static final double ALPHA_MEAN_V_PER_K = 200e-6;

    /**
     * α(T) = α0 + τ·ln(T/T0): a constant Thomson coefficient τ = T·dα/dT. Its antiderivative is exact:
     * α0·T + τ(T·ln(T/T0) − T).
     */
    private record LogSeebeck(double alpha0VPerK, double thomsonVPerK, double referenceK) implements PropertyCurve {
        @Override
        public double valueAt(double t) {
            return alpha0VPerK + thomsonVPerK * Math.log(t / referenceK);
        }

        @Override
        public double slopeAt(double t) {
            return thomsonVPerK / t;
        }

        @Override
        public double antiderivativeAt(double t) {
            return alpha0VPerK * t + thomsonVPerK * (t * Math.log(t / referenceK) - t);
        }

        @Override
        public PropertyCurve scaled(double factor) {
            return new LogSeebeck(alpha0VPerK * factor, thomsonVPerK * factor, referenceK);
        }
    }

    /** One symmetric couple whose legs have a constant Thomson coefficient and constant ρ, k. */
    private static DetailedArray logCouple(double thomsonVPerK, double referenceK) {
        var p = new LegMaterial(new LogSeebeck(ALPHA_MEAN_V_PER_K, thomsonVPerK, referenceK),
                PropertyCurve.constant(RHO_OHM_M), PropertyCurve.constant(K_W_PER_MK));
        var set = MaterialSet.symmetric("constant Thomson coefficient", "test", p, 150, 500);
        return DetailedArray.single(new DetailedModule(1, AREA_M2, AREA_M2, LENGTH_M, 0, 0, set));
    }

    /**
     * Exact cold-face heat of one leg with a constant Thomson coefficient τ and constant ρ, k. The
     * leg equation k·T'' − τ·J·T' = −ρJ² is then linear with constant coefficients (the route of H.S.
     * Lee's exact solution, ME539 ch. 5 "Thomson Effect, Exact Solution, and Compatibility Factor";
     * solved here independently): T = C1 + C2·exp(γx) + (ρJ/τ)·x with γ = τJ/k, and
     * Qc = A[α(Tc)·Tc·J − k·T'(0)].
     */
    private static double exactLegColdHeatW(double thomsonVPerK, double referenceK, double currentA, double tc,
                                            double th) {
        double j = currentA / AREA_M2;
        double gamma = thomsonVPerK * j / K_W_PER_MK;
        double drift = RHO_OHM_M * j / thomsonVPerK;
        double c2 = (th - tc - drift * LENGTH_M) / Math.expm1(gamma * LENGTH_M);
        double slopeAtCold = c2 * gamma + drift;
        double alphaCold = ALPHA_MEAN_V_PER_K + thomsonVPerK * Math.log(tc / referenceK);
        return AREA_M2 * (alphaCold * tc * j - K_W_PER_MK * slopeAtCold);
    }

    private static double detailedColdHeatW(int cells, double thomsonVPerK, double currentA, double tc, double th) {
        return new DetailedSolver(cells).atFaces(logCouple(thomsonVPerK, 300), currentA, tc, th).orElseThrow()
                .coldSideHeatW();
    }

    @Test
    void matchesTheExactSolutionWithAConstantThomsonCoefficient() {
        // 60 µV/K of Thomson coefficient is about a third of α, a strong case; both legs carry it.
        double exact = 2 * exactLegColdHeatW(60e-6, 300, 3.0, 270, 330);
        assertThat(detailedColdHeatW(512, 60e-6, 3.0, 270, 330)).isCloseTo(exact, within(1e-6 * Math.abs(exact)));
    }

    @Test
    void convergesAtSecondOrderUnderGridRefinement() {
        // Measured order: halving the cell width should divide the error by 2² = 4.
        double exact = 2 * exactLegColdHeatW(60e-6, 300, 3.0, 270, 330);
        double e8 = detailedColdHeatW(8, 60e-6, 3.0, 270, 330) - exact;
        double e16 = detailedColdHeatW(16, 60e-6, 3.0, 270, 330) - exact;
        double e32 = detailedColdHeatW(32, 60e-6, 3.0, 270, 330) - exact;
        double order1 = Math.log(e8 / e16) / Math.log(2);
        double order2 = Math.log(e16 / e32) / Math.log(2);
        assertThat(order1).isCloseTo(2.0, within(0.1));
        assertThat(order2).isCloseTo(2.0, within(0.1));
    }

    @Test
    void convergesAtSecondOrderWithTheBismuthTelluridePolynomials() {
        // Same measurement without an exact solution: Richardson's ratio (Q8 − Q16)/(Q16 − Q32) → 4.
        var array = DetailedArray.single(DetailedSolverTest.BI2TE3_MODULE);
        double q8 = new DetailedSolver(8).atFaces(array, 3.0, 260, 330).orElseThrow().coldSideHeatW();
        double q16 = new DetailedSolver(16).atFaces(array, 3.0, 260, 330).orElseThrow().coldSideHeatW();
        double q32 = new DetailedSolver(32).atFaces(array, 3.0, 260, 330).orElseThrow().coldSideHeatW();
        assertThat((q8 - q16) / (q16 - q32)).isCloseTo(4.0, within(0.2));
    }

    @Test
    void aPositiveThomsonCoefficientRaisesTheCoolingAboveTheIdealEquation() {
        // Published finding: "The positive Thomson coefficient led to a slight improvement on the
        // performance of the thermoelectric device while the negative Thomson coefficient led to a slight
        // declination" (H.S. Lee, ME539 ch. 5, opening summary read; journal version "The Thomson effect and
        // the ideal equation on thermoelectric coolers", Energy 56 (2013) 61-69, not re-read). Ideal
        // equation with α at the mean temperature Tm, as there.
        double tc = 270;
        double th = 330;
        double tm = 0.5 * (tc + th);
        for (double thomson : new double[] {+40e-6, -40e-6}) {
            double alphaAtMean = ALPHA_MEAN_V_PER_K + thomson * Math.log(tm / 300);
            var ideal = new ModuleParameters(2 * alphaAtMean, 2 * RHO_OHM_M * LENGTH_M / AREA_M2,
                    2 * K_W_PER_MK * AREA_M2 / LENGTH_M);
            double detailed = detailedColdHeatW(64, thomson, 3.0, tc, th);
            double idealW = ideal.coldSideHeatW(3.0, tc, th);
            if (thomson > 0) {
                assertThat(detailed).isGreaterThan(idealW);
            } else {
                assertThat(detailed).isLessThan(idealW);
            }
            // "slight": well within 10 % of the cooling for ΔT = 60 K (the qualitative claim, sized here)
            assertThat(Math.abs(detailed - idealW)).isLessThan(0.1 * Math.abs(idealW));
        }
    }

    @Test
    void theThomsonGainMatchesItsFirstOrderEstimate() {
        // Derived here, first order in τ with α(T) = α0 + τ·ln(T/Tm) and the ideal equation at α(Tm):
        // per leg the Peltier term changes by τ·Tc·I·ln(Tc/Tm), half of the Thomson heat τ·I·ΔT of the
        // linear profile returns to the cold face, and the Thomson heat of the Joule bow of the profile
        // (T' − ΔT/L = −(ρJ²/k)(x − L/2)) moves τ·I³·R/(12·K) more to the hot face. A check of the model's
        // Thomson term, to 2 % at a small τ.
        double tc = 280;
        double th = 320;
        double tm = 300;
        double tau = 5e-6;
        double currentA = 2.0;
        double legOhm = RHO_OHM_M * LENGTH_M / AREA_M2;
        double legWPerK = K_W_PER_MK * AREA_M2 / LENGTH_M;
        var ideal = new ModuleParameters(2 * ALPHA_MEAN_V_PER_K, 2 * legOhm, 2 * legWPerK); // ln(Tm/T0) = 0
        double gain = detailedColdHeatW(256, tau, currentA, tc, th) - ideal.coldSideHeatW(currentA, tc, th);
        double perLeg = tau * currentA * (tc * Math.log(tc / tm) + 0.5 * (th - tc))
                + tau * currentA * currentA * currentA * legOhm / (12 * legWPerK);
        assertThat(gain).isCloseTo(2 * perLeg, within(0.02 * 2 * perLeg));
    }
}
