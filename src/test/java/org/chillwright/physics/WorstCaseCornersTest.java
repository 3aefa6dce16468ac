package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;

import org.junit.jupiter.api.Test;

class WorstCaseCornersTest {

    private static final ModuleParameters TM_A = new ModuleParameters(0.04, 2.4, 0.25);
    private static final CoolingCase S10 = new CoolingCase(278.15, 298.15, 10, 0.3, 0.1, 0.05);
    private static final DriveLimits LIMITS = new DriveLimits(3.8, 15, 6, 353.15);

    private final List<WorstCaseCorners.Corner> corners = new WorstCaseCorners().table(ModuleArray.single(TM_A), S10,
            LIMITS, new ToleranceSpread(0.05, 0.05, 0.05, 0.1, 0.1, 0.02),
            new WorstCaseCorners.Spec(11, 1, 263.15, 3));

    @Test
    void theNominalCornerIsTheSingleSolve() {
        assertThat(corners.get(0).cooling()).isEqualTo(new OperatingPointSolver().solve(TM_A, S10, LIMITS));
    }

    @Test
    void worstPartsLeaveLessMarginThanNominalPartsAtTheSameLoad() {
        // Monotonic in each input (physics.md e): less S, more R, K and thermal resistance cost margin.
        double nominalParts = ((Solved) corners.get(2).cooling()).marginK();
        OperatingPoint worst = corners.get(1).cooling();
        if (worst instanceof Solved w) {
            assertThat(w.marginK()).isLessThan(nominalParts);
        } else {
            assertThat(worst.feasible()).isFalse();
        }
    }

    @Test
    void theColdCornerChecksHeatingWhenTheIdleModuleDrainsTheObject() {
        WorstCaseCorners.Corner cold = corners.get(3);
        assertThat(cold.kind()).isEqualTo(WorstCaseCorners.Kind.COLD_LOW_LOAD);
        assertThat(cold.cooling()).isInstanceOfSatisfying(Solved.class, p -> assertThat(p.currentA()).isZero());
        assertThat(cold.heating()).isNotNull();
        assertThat(cold.heating().needsHeating()).isTrue();
    }
}
