package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

class ModelComparisonTest {

    private static final ModuleParameters TM_A = new ModuleParameters(0.04, 2.4, 0.25);
    private static final CoolingCase S10 = new CoolingCase(278.15, 298.15, 10, 0.3, 0.1, 0.05);

    @Test
    void constantPropertiesShowNoDifferenceAndNoFlag() {
        // Identity: the constant-property detailed twin is the lumped model.
        ModelComparison c = ModelComparison.of(ModuleArray.single(TM_A),
                DetailedArray.single(DetailedModule.ofConstantParameters(TM_A)), S10, DriveLimits.NONE,
                new DetailedSolver());
        assertThat(c.differences().largestFraction()).isLessThan(1e-6);
        assertThat(c.flagged()).isFalse();
        assertThat(c.materialName()).isEqualTo("constant properties");
    }

    @Test
    void aFittedModuleIsComparedWithTheLumpedModelOfTheSameRatings() {
        // Invented ratings; the lumped model uses S, R, K from them (IMAX_VMAX_DTMAX), the detailed model
        // the Bi2Te3 set fitted to them. Both must hold the set-point; the differences are defined.
        var ratings = MaxRatings.withoutQmax(6, 15.4, 70, 300);
        RatingsFit.Fitted fit = new RatingsFit().fit(ratings, MaterialSet.BI2TE3_COUPLE_AVERAGE);
        ModelComparison c = ModelComparison.of(
                ModuleArray.single(ModuleParameters.fromRatings(ratings, RatingsMethod.IMAX_VMAX_DTMAX)),
                DetailedArray.single(fit.module()), S10, DriveLimits.NONE, new DetailedSolver());
        assertThat(c.lumped().feasible()).isTrue();
        assertThat(c.detailed().feasible()).isTrue();
        assertThat(c.differences().currentFraction()).isFinite();
        assertThat(c.flagged()).isEqualTo(c.differences().largestFraction() > ModelComparison.FLAG_FRACTION);
    }
}
