package org.chillwright.physics;

/**
 * One leg on a uniform grid of cells from the cold face (x = 0) to the hot face (x = L): the
 * finite-difference core of {@link DetailedSolver}. Mutable working storage, one per solve: not
 * thread-safe. The last converged profile is the start of the next solve (warm start).
 *
 * <p>Equations (1-D steady, physics.md d; the classical formulation in heat flux q and temperature,
 * e.g. H.S. Lee, Thermoelectrics: Design and Materials, Wiley 2016, ch. 5, from memory): with the
 * current density J signed along x (J = +I/A in a p leg, −I/A in an n leg, so that J·α &gt; 0 in both),
 * <pre>
 *   q = α·T·J − k·dT/dx                 (Peltier plus Fourier heat flux)
 *   dq/dx = ρ·J² + α·J·dT/dx            (Joule heat plus the work against the Seebeck field)
 * </pre>
 * which together give −d/dx(k dT/dx) = ρJ² − τ·J·dT/dx with the Thomson coefficient τ = T·dα/dT.
 *
 * <p>Discretisation (energy-conserving box scheme, second order): on each cell [Tj, Tj+1] of width h,
 * with Tm = (Tj + Tj+1)/2,
 * <pre>
 *   q(j+1) − q(j) = J·[ρ(Tm)·J·h + ∫ α dT]                 (energy, ∫ exact from the antiderivative)
 *   ½[q(j) + q(j+1)] = α(Tm)·Tm·J − k(Tm)·(Tj+1 − Tj)/h    (flux law at the cell middle)
 * </pre>
 * Eliminating q per cell leaves, at each interior node, "flux leaving the cell on the left = flux
 * entering the cell on the right": a tridiagonal system in the node temperatures, solved by Newton
 * with the analytic Jacobian (Thomas algorithm, O(n) per step). Because the work of each cell is
 * J·[ρJh + ∫α dT] and the Seebeck integrals telescope, Qh − Qc = I·V holds for the discrete
 * solution up to the Newton residual, and with constant properties the scheme is exact for any n
 * (the exact profile is quadratic, and the averaging and central-difference errors of the flux law
 * cancel term by term).
 *
 * <p>Contacts: at each end a thermal contact resistance Rt = rt/A lies between the face and the leg
 * end, and the contact's Joule heat I²·Rc (Rc = ρc/A) is released at the leg end:
 * T0 = Tc − Rt·(A·q0 − I²Rc), Tn = Th + Rt·(A·qn + I²Rc); the face heats are Qc = A·q0 − I²Rc and
 * Qh = A·qn + I²Rc.
 */
final class LegGrid {

    /** Newton stops once the largest temperature step is below this, K; the fluxes are then corrected to first order, so the error left is of order step². */
    static final double STEP_TOLERANCE_K = 1e-7;
    static final int MAX_NEWTON_STEPS = 40;
    private static final int MAX_HALVINGS = 30;

    private final LegMaterial material;
    private final double areaM2;
    private final double sign;           // +1 for a p leg, −1 for an n leg
    private final double contactOhm;     // Rc per end
    private final double thermalContactKPerW; // Rt per end
    private final int cells;
    private final double h;

    final double[] temperatureK;
    private final double[] alphaNode;
    private final double[] antiNode;
    private final double[] lower;
    private final double[] diag;
    private final double[] upper;
    private final double[] rhs;
    private boolean started;

    double coldHeatW;
    double hotHeatW;
    double voltageV;
    double lowestK;
    double highestK;

    LegGrid(LegMaterial material, double areaM2, double lengthM, double sign, double contactOhm,
            double thermalContactKPerW, int cells) {
        this.material = material;
        this.areaM2 = areaM2;
        this.sign = sign;
        this.contactOhm = contactOhm;
        this.thermalContactKPerW = thermalContactKPerW;
        this.cells = cells;
        this.h = lengthM / cells;
        temperatureK = new double[cells + 1];
        alphaNode = new double[cells + 1];
        antiNode = new double[cells + 1];
        lower = new double[cells + 1];
        diag = new double[cells + 1];
        upper = new double[cells + 1];
        rhs = new double[cells + 1];
    }

    /** Forget the last profile: the next solve starts from a straight line between the faces. */
    void reset() {
        started = false;
    }

    /**
     * Solves the leg between fixed faces; false when Newton finds no steady profile (a temperature
     * would fall to 0 K or the iteration does not settle).
     *
     * @param currentA  current through the leg, A (positive pumps heat from the cold face to the hot face)
     * @param coldFaceK cold face, K
     * @param hotFaceK  hot face, K
     */
    boolean solve(double currentA, double coldFaceK, double hotFaceK) {
        int n = cells;
        double[] t = temperatureK;
        if (!started || !(t[0] > 0)) {
            for (int j = 0; j <= n; j++) {
                t[j] = coldFaceK + (hotFaceK - coldFaceK) * j / n;
            }
            started = true;
        }
        double j0 = sign * currentA / areaM2;       // J, A/m², signed along x
        double jouleContactW = currentA * currentA * contactOhm;
        PropertyCurve alpha = material.seebeckVPerK();
        PropertyCurve rho = material.resistivityOhmM();
        PropertyCurve kappa = material.conductivityWPerMK();
        for (int step = 0; step < MAX_NEWTON_STEPS; step++) {
            for (int j = 0; j <= n; j++) {
                alphaNode[j] = alpha.valueAt(t[j]);
                antiNode[j] = alpha.antiderivativeAt(t[j]);
            }
            double coldFlux = 0;
            double coldFluxSlopeA = 0;
            double coldFluxSlopeB = 0;
            double hotFlux = 0;
            double hotFluxSlopeA = 0;
            double hotFluxSlopeB = 0;
            double ohmicV = 0;
            double previousRight = 0;
            double previousRightA = 0;
            double previousRightB = 0;
            for (int j = 0; j < n; j++) {
                double a = t[j];
                double b = t[j + 1];
                double m = 0.5 * (a + b);
                double d = b - a;
                double am = alpha.valueAt(m);
                double asl = alpha.slopeAt(m);
                double rm = rho.valueAt(m);
                double rsl = rho.slopeAt(m);
                double km = kappa.valueAt(m);
                double ksl = kappa.slopeAt(m);
                double work = rm * j0 * h + antiNode[j + 1] - antiNode[j];   // ρJh + ∫α dT, V
                double left = am * m * j0 - km * d / h - 0.5 * j0 * work;    // q at the cell's cold end
                double right = left + j0 * work;                              // q at its hot end
                double common = 0.5 * (asl * m + am) * j0 - 0.5 * ksl * d / h;
                double workA = 0.5 * rsl * j0 * h - alphaNode[j];             // ∂work/∂a
                double workB = 0.5 * rsl * j0 * h + alphaNode[j + 1];         // ∂work/∂b
                double leftA = common + km / h - 0.5 * j0 * workA;
                double leftB = common - km / h - 0.5 * j0 * workB;
                double rightA = leftA + j0 * workA;
                double rightB = leftB + j0 * workB;
                ohmicV += rm * h;
                if (j == 0) {
                    coldFlux = left;
                    coldFluxSlopeA = leftA;
                    coldFluxSlopeB = leftB;
                } else {
                    // node j: flux leaving cell j−1 = flux entering cell j
                    rhs[j] = -(previousRight - left);
                    lower[j] = previousRightA;
                    diag[j] = previousRightB - leftA;
                    upper[j] = -leftB;
                }
                previousRight = right;
                previousRightA = rightA;
                previousRightB = rightB;
                if (j == n - 1) {
                    hotFlux = right;
                    hotFluxSlopeA = rightA;
                    hotFluxSlopeB = rightB;
                }
            }
            double rt = thermalContactKPerW;
            rhs[0] = -(t[0] - coldFaceK + rt * (areaM2 * coldFlux - jouleContactW));
            diag[0] = 1 + rt * areaM2 * coldFluxSlopeA;
            upper[0] = rt * areaM2 * coldFluxSlopeB;
            rhs[n] = -(t[n] - hotFaceK - rt * (areaM2 * hotFlux + jouleContactW));
            lower[n] = -rt * areaM2 * hotFluxSlopeA;
            diag[n] = 1 - rt * areaM2 * hotFluxSlopeB;
            if (!thomas(n)) {
                return false;
            }
            double largest = 0;
            for (int j = 0; j <= n; j++) {
                largest = Math.max(largest, Math.abs(rhs[j]));
            }
            double scale = 1;
            for (int halving = 0; !stepKeepsPositive(scale); halving++) {
                if (halving == MAX_HALVINGS) {
                    return false;
                }
                scale *= 0.5;
            }
            if (!(largest * scale <= STEP_TOLERANCE_K) || scale < 1) {
                for (int j = 0; j <= n; j++) {
                    t[j] += scale * rhs[j];
                }
                continue;
            }
            // Converged: take the last step and carry the face fluxes along it to first order.
            double coldQ = coldFlux + coldFluxSlopeA * rhs[0] + coldFluxSlopeB * rhs[1];
            double hotQ = hotFlux + hotFluxSlopeA * rhs[n - 1] + hotFluxSlopeB * rhs[n];
            double ohmicCorrection = 0;
            for (int j = 0; j < n; j++) {
                double m = 0.5 * (t[j] + t[j + 1]);
                ohmicCorrection += rho.slopeAt(m) * h * 0.5 * (rhs[j] + rhs[j + 1]);
            }
            double seebeckV = antiNode[n] - antiNode[0] + alphaNode[n] * rhs[n] - alphaNode[0] * rhs[0];
            for (int j = 0; j <= n; j++) {
                t[j] += rhs[j];
            }
            double lo = t[0];
            double hi = t[0];
            for (int j = 1; j <= n; j++) {
                lo = Math.min(lo, t[j]);
                hi = Math.max(hi, t[j]);
            }
            lowestK = lo;
            highestK = hi;
            coldHeatW = areaM2 * coldQ - jouleContactW;
            hotHeatW = areaM2 * hotQ + jouleContactW;
            // V in the direction of the current: sign·Σ(ρJh + ∫α dT) + 2·I·Rc, so that I·V = Qh − Qc
            voltageV = (ohmicV + ohmicCorrection) * currentA / areaM2 + sign * seebeckV + 2 * currentA * contactOhm;
            return Double.isFinite(coldHeatW) && Double.isFinite(hotHeatW);
        }
        return false;
    }

    private boolean stepKeepsPositive(double scale) {
        for (int j = 0; j <= cells; j++) {
            double next = temperatureK[j] + scale * rhs[j];
            if (!(next > 0) || !Double.isFinite(next)) {
                return false;
            }
        }
        return true;
    }

    /** Solves the tridiagonal system in place; the solution replaces rhs. False on a zero pivot. */
    private boolean thomas(int n) {
        for (int j = 1; j <= n; j++) {
            if (!(diag[j - 1] != 0)) {
                return false;
            }
            double w = lower[j] / diag[j - 1];
            diag[j] -= w * upper[j - 1];
            rhs[j] -= w * rhs[j - 1];
        }
        if (!(diag[n] != 0)) {
            return false;
        }
        rhs[n] /= diag[n];
        for (int j = n - 1; j >= 0; j--) {
            rhs[j] = (rhs[j] - upper[j] * rhs[j + 1]) / diag[j];
        }
        return true;
    }
}
