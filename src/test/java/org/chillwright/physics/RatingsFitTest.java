package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class RatingsFitTest {

    private static final ModuleParameters TM_A = new ModuleParameters(0.04, 2.4, 0.25);
    private final DetailedSolver solver = new DetailedSolver();

    @Test
    void detailedRatingsWithConstantPropertiesAreTheIdealForwardRelations() {
        // Identity: physics.md b, forward relations (case S02) hold exactly with constant properties.
        MaxRatings ideal = TM_A.ratingsAt(300);
        MaxRatings detailed = solver.ratingsAt(DetailedModule.ofConstantParameters(TM_A), 300);
        assertThat(detailed.dtmaxK()).isCloseTo(ideal.dtmaxK(), within(1e-6 * ideal.dtmaxK()));
        assertThat(detailed.imaxA()).isCloseTo(ideal.imaxA(), within(1e-6 * ideal.imaxA()));
        assertThat(detailed.vmaxV()).isCloseTo(ideal.vmaxV(), within(1e-6 * ideal.vmaxV()));
        assertThat(detailed.qmaxW()).isCloseTo(ideal.qmaxW(), within(1e-6 * ideal.qmaxW()));
    }

    @Test
    void reproducesTheRatingsOfAModuleMadeOfTheReferenceMaterial() {
        // Round trip: ratings of a known detailed module, then the fit must give them back.
        MaxRatings stated = solver.ratingsAt(DetailedSolverTest.BI2TE3_MODULE, 300);
        RatingsFit.Fitted fit = new RatingsFit().fit(MaxRatings.withoutQmax(stated.imaxA(), stated.vmaxV(),
                stated.dtmaxK(), 300), MaterialSet.BI2TE3_COUPLE_AVERAGE);
        assertThat(fit.rmsResidual()).isLessThan(1e-6);
        assertThat(fit.reproduced().qmaxW()).isCloseTo(stated.qmaxW(), within(1e-4 * stated.qmaxW()));
        assertThat(fit.usedQmax()).isFalse();
    }

    @Test
    void fitsInventedCatalogueRatingsAndReportsTheResidualOfAnInconsistentQmax() {
        // Invented ratings (6 A, 15.4 V, 70 K at 300 K), once with Qmax implied by the ideal consistency
        // relation (physics.md b) and once 10 % below it, which no single set of factors can match.
        var ratings = MaxRatings.withoutQmax(6, 15.4, 70, 300);
        RatingsFit.Fitted three = new RatingsFit().fit(ratings, MaterialSet.BI2TE3_COUPLE_AVERAGE);
        assertThat(three.rmsResidual()).isLessThan(1e-6);
        assertThat(three.reproduced().imaxA()).isCloseTo(6, within(1e-5));
        var inconsistent = new MaxRatings(6, 15.4, 0.9 * ratings.impliedQmaxW(), 70, 300);
        RatingsFit.Fitted four = new RatingsFit().fit(inconsistent, MaterialSet.BI2TE3_COUPLE_AVERAGE);
        assertThat(four.usedQmax()).isTrue();
        assertThat(four.rmsResidual()).isBetween(1e-4, 0.1);
    }
}
