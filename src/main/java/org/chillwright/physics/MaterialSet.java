package org.chillwright.physics;

/**
 * A pair of leg materials (p and n) with temperature-dependent properties, the range of
 * temperatures it may be used over, and where it comes from. A user may define a set of their own
 * (polynomials or tables); the constructor refuses a set whose resistivities or conductivities are
 * not positive, or whose couple Seebeck coefficient αp − αn is not positive, anywhere in its range.
 *
 * @param name     short name shown with every result that used the set
 * @param source   where the numbers come from (authors, title, journal, year), or "user-defined"
 * @param p        the p-type legs
 * @param n        the n-type legs
 * @param lowestK  lowest temperature the set is valid at, K, &gt; 0
 * @param highestK highest temperature the set is valid at, K, &gt; lowestK
 */
public record MaterialSet(String name, String source, LegMaterial p, LegMaterial n, double lowestK,
                          double highestK) {

    /** Points at which a set is checked over its range (every 1/40 of it, ends included). */
    private static final int CHECK_POINTS = 41;

    /**
     * Bi2Te3-based alloy near room temperature, couple-average fit used in thermoelectric cooler
     * models, per leg (the p leg takes +α, the n leg −α with the same ρ and k):
     * <pre>
     *   α(T) = 2.2224e-5 + 9.306e-7·T − 9.905e-10·T²     V/K
     *   ρ(T) = 5.112e-7 + 1.634e-8·T + 6.279e-11·T²       Ω·m
     *   k(T) = 6.2605 − 2.777e-2·T + 4.131e-5·T²          W/(m·K)
     * </pre>
     * Sources: B.J. Huang, C.J. Chin &amp; C.L. Duang, "A design method of thermoelectric cooler",
     * International Journal of Refrigeration 23(3) (2000) 208–218; the same fits as eqs. (8)–(10) of
     * X.C. Xuan et al., Cryogenics 42 (2002) 273–278. The coefficients were transcribed from public
     * research code that cites both papers; the papers themselves were not re-read here, and neither
     * was the temperature range of the data behind the fit (so no validity range is quoted from them). At 300 K
     * they give α = 212 µV/K, ρ = 1.11e-5 Ω·m, k = 1.65 W/(m·K), ZT = 0.74, in line with the typical
     * Bi2Te3 values of physics.md d. The set is offered for 200 K to 400 K, where α, ρ and k stay
     * physical (checked by the constructor); outside it the detailed result says so.
     */
    public static final MaterialSet BI2TE3_COUPLE_AVERAGE = symmetric("Bi2Te3 alloy, couple average (polynomial fit)",
            "B.J. Huang, C.J. Chin, C.L. Duang, A design method of thermoelectric cooler, Int. J. Refrigeration"
                    + " 23 (2000) 208-218; X.C. Xuan et al., Cryogenics 42 (2002) 273-278, eqs. (8)-(10)",
            new LegMaterial(PolynomialCurve.inKelvin(2.2224e-5, 9.306e-7, -9.905e-10),
                    PolynomialCurve.inKelvin(5.112e-7, 1.634e-8, 6.279e-11),
                    PolynomialCurve.inKelvin(6.2605, -2.777e-2, 4.131e-5)),
            200.0, 400.0);

    public MaterialSet {
        if (name == null || name.isBlank()) {
            throw new InvalidQuantityException("name", Double.NaN, "name must be given");
        }
        if (source == null || source.isBlank()) {
            throw new InvalidQuantityException("source", Double.NaN, "source must be given (or \"user-defined\")");
        }
        if (p == null || n == null) {
            throw new InvalidQuantityException(p == null ? "p" : "n", Double.NaN, "both leg materials must be given");
        }
        Check.positive("lowestK", lowestK);
        Check.above("highestK", highestK, lowestK, "lowestK");
        for (int i = 0; i < CHECK_POINTS; i++) {
            double t = lowestK + (highestK - lowestK) * i / (CHECK_POINTS - 1);
            requirePositive("p.resistivityOhmM", p.resistivityOhmM().valueAt(t), t);
            requirePositive("n.resistivityOhmM", n.resistivityOhmM().valueAt(t), t);
            requirePositive("p.conductivityWPerMK", p.conductivityWPerMK().valueAt(t), t);
            requirePositive("n.conductivityWPerMK", n.conductivityWPerMK().valueAt(t), t);
            double couple = p.seebeckVPerK().valueAt(t) - n.seebeckVPerK().valueAt(t);
            if (!(couple > 0)) {
                throw new InvalidQuantityException("p.seebeckVPerK", couple, String.format(java.util.Locale.ROOT,
                        "p.seebeckVPerK must exceed n.seebeckVPerK over the range, was %.4g V/K less at %.1f K",
                        -couple, t));
            }
        }
    }

    private static void requirePositive(String field, double value, double temperatureK) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new InvalidQuantityException(field, value, String.format(java.util.Locale.ROOT,
                    "%s must be > 0 over the set's range, was %.4g at %.1f K", field, value, temperatureK));
        }
    }

    /** A set whose n legs mirror the p legs: αn = −αp, the same ρ and k. */
    public static MaterialSet symmetric(String name, String source, LegMaterial p, double lowestK, double highestK) {
        LegMaterial n = new LegMaterial(negated(p.seebeckVPerK()), p.resistivityOhmM(), p.conductivityWPerMK());
        return new MaterialSet(name, source, p, n, lowestK, highestK);
    }

    private static PropertyCurve negated(PropertyCurve curve) {
        if (curve instanceof PolynomialCurve c) {
            double[] k = c.coefficients();
            for (int i = 0; i < k.length; i++) {
                k[i] = -k[i];
            }
            return new PolynomialCurve(c.referenceK(), k);
        }
        if (curve instanceof TableCurve t) {
            double[] v = t.values();
            for (int i = 0; i < v.length; i++) {
                v[i] = -v[i];
            }
            return new TableCurve(t.temperaturesK(), v);
        }
        return new PropertyCurve() { // any other curve: mirror it
            @Override
            public double valueAt(double temperatureK) {
                return -curve.valueAt(temperatureK);
            }

            @Override
            public double slopeAt(double temperatureK) {
                return -curve.slopeAt(temperatureK);
            }

            @Override
            public double antiderivativeAt(double temperatureK) {
                return -curve.antiderivativeAt(temperatureK);
            }

            @Override
            public PropertyCurve scaled(double factor) {
                return negated(curve.scaled(factor));
            }
        };
    }

    /**
     * The same set with every Seebeck coefficient, resistivity and conductivity multiplied by a factor
     * (all &gt; 0), as the ratings fit does; the name says so.
     */
    public MaterialSet scaled(double seebeckFactor, double resistivityFactor, double conductivityFactor) {
        Check.positive("seebeckFactor", seebeckFactor);
        Check.positive("resistivityFactor", resistivityFactor);
        Check.positive("conductivityFactor", conductivityFactor);
        return new MaterialSet(String.format(java.util.Locale.ROOT, "%s scaled (S %.3f, rho %.3f, k %.3f)", name,
                seebeckFactor, resistivityFactor, conductivityFactor), source,
                p.scaled(seebeckFactor, resistivityFactor, conductivityFactor),
                n.scaled(seebeckFactor, resistivityFactor, conductivityFactor), lowestK, highestK);
    }

    /** Whether a temperature lies within the set's range. */
    public boolean covers(double temperatureK) {
        return temperatureK >= lowestK && temperatureK <= highestK;
    }

    /** Couple Seebeck coefficient αp − αn at a temperature, V/K. */
    public double coupleSeebeckVPerK(double temperatureK) {
        return p.seebeckVPerK().valueAt(temperatureK) - n.seebeckVPerK().valueAt(temperatureK);
    }
}
