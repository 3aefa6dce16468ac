package org.chillwright.physics;

import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.util.Pair;

/**
 * A detailed model for a module known only by its maximum ratings: scale factors of a reference
 * material set (on S, ρ and k) fitted so that the detailed model reproduces the stated Imax, Vmax and
 * ΔTmax, and Qmax when stated, at the rating temperature ({@link DetailedSolver#ratingsAt}).
 *
 * <p>The equivalent geometry: N couples with N = round(S/(αp − αn)) from the lumped IMAX_VMAX_DTMAX
 * parameters at Tm = Th − ΔTmax/2 (physics.md b), 1 mm² legs whose length makes R match with ρ
 * unscaled, no contacts (the factors absorb contacts and parasitics; only ρ·L/A and k·A/L matter to
 * the model). Then Levenberg–Marquardt (Commons Math) on the logarithms of the three factors, with the
 * relative rating errors as residuals and a forward-difference Jacobian. With three ratings the fit is
 * exact; with four (Qmax stated) it is least squares, and the residual says how far the ratings
 * disagree with the material's temperature dependence.
 */
public final class RatingsFit {

    private static final double LEG_AREA_M2 = 1e-6;
    private static final double LOG_STEP = 1e-5;
    private static final int MAX_EVALUATIONS = 200;

    private final DetailedSolver solver;

    public RatingsFit() {
        this(new DetailedSolver());
    }

    public RatingsFit(DetailedSolver solver) {
        this.solver = solver;
    }

    /**
     * The fitted module and how well it fits.
     *
     * @param module             detailed module with the scaled material
     * @param seebeckFactor      factor on both legs' α
     * @param resistivityFactor  factor on both legs' ρ
     * @param conductivityFactor factor on both legs' k
     * @param target             the stated ratings
     * @param reproduced         the fitted module's detailed ratings at the same hot side
     * @param rmsResidual        root mean square of the relative rating errors used (0.01 = 1 %)
     * @param usedQmax           whether Qmax took part
     * @param evaluations        rating evaluations spent
     */
    public record Fitted(DetailedModule module, double seebeckFactor, double resistivityFactor,
                         double conductivityFactor, MaxRatings target, MaxRatings reproduced, double rmsResidual,
                         boolean usedQmax, int evaluations) {
    }

    /**
     * Fits the scale factors.
     *
     * @param ratings   stated ratings (Qmax optional)
     * @param reference the material whose temperature dependence is kept
     * @throws IllegalStateException if the fit does not converge
     */
    public Fitted fit(MaxRatings ratings, MaterialSet reference) {
        double th = ratings.hotSideK();
        double meanK = th - 0.5 * ratings.dtmaxK();
        ModuleParameters lumped = ModuleParameters.fromRatings(ratings, RatingsMethod.IMAX_VMAX_DTMAX);
        double coupleSeebeck = reference.coupleSeebeckVPerK(meanK);
        int couples = (int) Math.max(1, Math.round(lumped.seebeckVPerK() / coupleSeebeck));
        double rhoSum = reference.p().resistivityOhmM().valueAt(meanK) + reference.n().resistivityOhmM().valueAt(meanK);
        double kSum = reference.p().conductivityWPerMK().valueAt(meanK)
                + reference.n().conductivityWPerMK().valueAt(meanK);
        double lengthM = lumped.resistanceOhm() * LEG_AREA_M2 / (couples * rhoSum);
        DetailedModule base = new DetailedModule(couples, LEG_AREA_M2, LEG_AREA_M2, lengthM, 0, 0, reference);
        double[] start = {Math.log(lumped.seebeckVPerK() / (couples * coupleSeebeck)), 0,
                Math.log(lumped.conductanceWPerK() / (couples * kSum * LEG_AREA_M2 / lengthM))};
        boolean usedQmax = ratings.hasQmax();
        int m = usedQmax ? 4 : 3;
        int[] evaluations = {0};
        LeastSquaresOptimizer.Optimum optimum;
        try {
            optimum = new LevenbergMarquardtOptimizer()
                    .withCostRelativeTolerance(1e-12).withParameterRelativeTolerance(1e-10)
                    .optimize(new LeastSquaresBuilder()
                            .start(start)
                            .target(new double[m])
                            .maxEvaluations(MAX_EVALUATIONS)
                            .maxIterations(MAX_EVALUATIONS)
                            .model(point -> {
                                double[] x = point.toArray();
                                double[] r0 = residuals(base, x, ratings, m);
                                double[][] jacobian = new double[m][3];
                                for (int k = 0; k < 3; k++) {
                                    double[] xk = x.clone();
                                    xk[k] += LOG_STEP;
                                    double[] rk = residuals(base, xk, ratings, m);
                                    for (int i = 0; i < m; i++) {
                                        jacobian[i][k] = (rk[i] - r0[i]) / LOG_STEP;
                                    }
                                }
                                evaluations[0] += 4;
                                return new Pair<RealVector, org.apache.commons.math3.linear.RealMatrix>(
                                        new ArrayRealVector(r0, false), new Array2DRowRealMatrix(jacobian, false));
                            })
                            .build());
        } catch (MathIllegalStateException e) {
            throw new IllegalStateException("ratings fit did not converge for " + ratings, e);
        }
        double[] x = optimum.getPoint().toArray();
        DetailedModule fitted = base.withMaterial(reference.scaled(Math.exp(x[0]), Math.exp(x[1]), Math.exp(x[2])));
        MaxRatings reproduced = solver.ratingsAt(fitted, th);
        double[] r = residuals(ratings, reproduced, m);
        double sum = 0;
        for (double v : r) {
            sum += v * v;
        }
        return new Fitted(fitted, Math.exp(x[0]), Math.exp(x[1]), Math.exp(x[2]), ratings, reproduced,
                Math.sqrt(sum / m), usedQmax, evaluations[0] + 1);
    }

    private double[] residuals(DetailedModule base, double[] logFactors, MaxRatings target, int m) {
        DetailedModule module = base.withMaterial(base.material().scaled(Math.exp(logFactors[0]),
                Math.exp(logFactors[1]), Math.exp(logFactors[2])));
        return residuals(target, solver.ratingsAt(module, target.hotSideK()), m);
    }

    private static double[] residuals(MaxRatings target, MaxRatings got, int m) {
        double[] r = new double[m];
        r[0] = got.imaxA() / target.imaxA() - 1;
        r[1] = got.vmaxV() / target.vmaxV() - 1;
        r[2] = got.dtmaxK() / target.dtmaxK() - 1;
        if (m == 4) {
            r[3] = got.qmaxW() / target.qmaxW() - 1;
        }
        return r;
    }
}
