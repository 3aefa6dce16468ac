package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.Test;

class ToleranceAnalysisTest {

    /** Synthetic module TM-A of check-cases.json, with the set-up of check case S10. */
    private static final ModuleParameters TM_A = new ModuleParameters(0.04, 2.4, 0.25);
    private static final CoolingCase S10 = new CoolingCase(278.15, 298.15, 10, 0.3, 0.1, 0.05);
    private static final DriveLimits LIMITS = new DriveLimits(3.8, 15, 6, 353.15);

    private final ToleranceAnalysis analysis = new ToleranceAnalysis();

    private static ToleranceAnalysis.Request request(ModuleArray array, ToleranceSpread spread, double typicalK,
                                                     int samples, long seed) {
        return new ToleranceAnalysis.Request(array, S10, LIMITS, spread, typicalK, samples, seed);
    }

    @Test
    void zeroSpreadReproducesTheSingleSolveExactly() {
        // Identity: with nothing varying every sample is the single solve.
        Solved single = (Solved) new OperatingPointSolver().solve(new ModuleArray(TM_A, 2, 1), S10, LIMITS);
        ToleranceResult r = analysis.run(request(new ModuleArray(TM_A, 2, 1), ToleranceSpread.NONE, Double.NaN,
                500, 1));
        assertThat(r.probabilityHolds()).isEqualTo(1.0);
        assertThat(r.marginK().p5()).isEqualTo(single.marginK());
        assertThat(r.marginK().p95()).isEqualTo(single.marginK());
        assertThat(r.currentA().p50()).isEqualTo(single.currentA());
        assertThat(r.hotSideK().p50()).isEqualTo(single.hotSideK());
        assertThat(r.marginStandardDeviationK()).isZero();
        assertThat(r.sensitivity()).isEmpty();
    }

    @Test
    void theSameSeedGivesTheSameResultOnOneThreadOrMany() {
        var spread = new ToleranceSpread(0.05, 0.05, 0.05, 0.1, 0.1, 0.02);
        ToleranceResult one = analysis.run(request(new ModuleArray(TM_A, 2, 2), spread, 290, 10_000, 42));
        ToleranceResult many = analysis.run(request(new ModuleArray(TM_A, 2, 2), spread, 290, 10_000, 42),
                (d, t) -> { }, () -> false, true);
        ToleranceResult otherSeed = analysis.run(request(new ModuleArray(TM_A, 2, 2), spread, 290, 10_000, 43));
        assertThat(many).usingRecursiveComparison().isEqualTo(one);
        assertThat(otherSeed.marginK().p50()).isNotEqualTo(one.marginK().p50());
    }

    @Test
    void monteCarloSpreadOfTheMarginAgreesWithFirstOrderPropagation() {
        // JCGM 100:2008 (GUM), "Evaluation of measurement data — Guide to the expression of uncertainty in
        // measurement", eq. (10): u²(y) = Σ (∂f/∂xi)² u²(xi) for independent inputs. The sensitivity
        // coefficients are central finite differences of the single solve's margin, computed here. Small
        // spreads keep the margin nearly linear; the Monte Carlo standard deviation of N samples has a
        // relative standard error of about 1/√(2N) = 0.5 % at N = 20,000, so 2.5 % is five of them.
        double fs = 0.01;
        double fr = 0.01;
        double fk = 0.01;
        double fsink = 0.02;
        double fint = 0.02;
        var spread = new ToleranceSpread(fs, fr, fk, fsink, fint, 0);
        ToleranceResult r = analysis.run(request(ModuleArray.single(TM_A), spread, Double.NaN, 20_000, 7));

        double[] nominal = {TM_A.seebeckVPerK(), TM_A.resistanceOhm(), TM_A.conductanceWPerK(),
                S10.sinkResistanceKPerW(), S10.coldInterfaceKPerW(), S10.hotInterfaceKPerW()};
        double[] sigma = {fs, fr, fk, fsink, fint, fint};
        double variance = 0;
        for (int i = 0; i < nominal.length; i++) {
            double h = 1e-4 * nominal[i];
            double up = margin(nominal, i, +h);
            double down = margin(nominal, i, -h);
            double coefficient = (up - down) / (2 * h);
            double u = sigma[i] * nominal[i];
            variance += coefficient * coefficient * u * u;
        }
        assertThat(r.probabilityHolds()).isEqualTo(1.0);
        assertThat(r.marginStandardDeviationK()).isCloseTo(Math.sqrt(variance), within(0.025 * Math.sqrt(variance)));
    }

    private static double margin(double[] x, int index, double delta) {
        double[] v = x.clone();
        v[index] += delta;
        var module = new ModuleParameters(v[0], v[1], v[2]);
        var c = new CoolingCase(S10.setPointK(), S10.ambientK(), S10.heatLoadW(), v[3], v[4], v[5]);
        return ((Solved) new OperatingPointSolver().solve(module, c, LIMITS)).marginK();
    }

    @Test
    void theHeatSinkLeadsTheRankingWhenItVariesMost() {
        var spread = new ToleranceSpread(0.005, 0.005, 0.005, 0.15, 0, 0);
        ToleranceResult r = analysis.run(request(ModuleArray.single(TM_A), spread, Double.NaN, 5000, 3));
        assertThat(r.sensitivity().get(0).input()).isEqualTo(ToleranceInput.SINK_RESISTANCE);
        // a worse sink (more K/W) leaves less margin
        assertThat(r.sensitivity().get(0).rankCorrelation()).isLessThan(-0.9);
        assertThat(r.sensitivity()).extracting(ToleranceResult.Sensitivity::input)
                .containsExactlyInAnyOrder(ToleranceInput.SINK_RESISTANCE, ToleranceInput.SEEBECK,
                        ToleranceInput.RESISTANCE, ToleranceInput.CONDUCTANCE);
    }

    @Test
    void aDesignThatCannotHoldTheSetPointHasNegativeMargins() {
        var tooMuch = new CoolingCase(278.15, 298.15, 40, 0.3, 0.1, 0.05);
        ToleranceResult r = analysis.run(new ToleranceAnalysis.Request(ModuleArray.single(TM_A), tooMuch, LIMITS,
                ToleranceSpread.PARTS_FIVE_PERCENT, Double.NaN, 2000, 5));
        assertThat(r.probabilityHolds()).isZero();
        assertThat(r.marginK().p95()).isNegative();
        assertThat(r.currentA().p50()).isNaN();
    }

    @Test
    void reportsProgressAfterEachChunkAndStopsWhenCancelled() {
        List<Long> seen = new ArrayList<>();
        AtomicInteger asked = new AtomicInteger();
        int samples = 5 * ToleranceAnalysis.CHUNK;
        ToleranceResult r = analysis.run(request(ModuleArray.single(TM_A), ToleranceSpread.PARTS_FIVE_PERCENT,
                Double.NaN, samples, 9), (done, total) -> seen.add(done), () -> asked.incrementAndGet() > 2, false);
        assertThat(seen).containsExactly((long) ToleranceAnalysis.CHUNK, 2L * ToleranceAnalysis.CHUNK);
        assertThat(r.cancelled()).isTrue();
        assertThat(r.samples()).isEqualTo(2 * ToleranceAnalysis.CHUNK);
        assertThat(r.requestedSamples()).isEqualTo(samples);
    }

    @Test
    void theHistogramCountsEverySampleWithAMargin() {
        ToleranceResult r = analysis.run(request(ModuleArray.single(TM_A), ToleranceSpread.PARTS_FIVE_PERCENT, 290,
                3000, 11));
        assertThat(java.util.Arrays.stream(r.marginHistogram().counts()).sum()).isEqualTo(3000);
        assertThat(r.marginK().p5()).isLessThan(r.marginK().p50());
        assertThat(r.marginK().p50()).isLessThan(r.marginK().p95());
    }

    @Test
    void theMarginOfADrawThatFailsIsTheSameQuantityAsTheSolvedMargin() {
        // Identity: on a design that holds, the search used for failing draws (lowest object temperature
        // over the allowed currents) must give Solved.marginK, so that the histogram is continuous at 0.
        for (DriveLimits limits : new DriveLimits[] {LIMITS, DriveLimits.ofRatedImaxA(2.0), DriveLimits.NONE}) {
            OperatingPoint point = new OperatingPointSolver().solve(TM_A, S10.withHeatLoadW(6), limits);
            Solved solved = (Solved) point;
            assertThat(analysis.infeasibleMarginK(ModuleArray.single(TM_A), S10.withHeatLoadW(6), limits))
                    .isCloseTo(solved.marginK(), within(1e-6));
        }
    }
}
