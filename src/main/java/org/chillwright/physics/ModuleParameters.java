package org.chillwright.physics;

import java.util.OptionalDouble;

/**
 * Lumped constant-property parameters of one thermoelectric module (or of the equivalent module of
 * an array), with the standard ideal equations.
 *
 * <p>Source of every equation here, unless a method says otherwise: A.F. Ioffe, Semiconductor
 * Thermoelements and Thermoelectric Cooling, 1957; H.J. Goldsmid, Introduction to
 * Thermoelectricity, 2016 (both from memory); the same per-couple form in A.V. da Rosa,
 * Fundamentals of Renewable Energy Processes, ch. 5.
 *
 * @param seebeckVPerK     module Seebeck coefficient S = N(αp − αn), V/K, finite and &gt; 0
 * @param resistanceOhm    module electrical resistance R (legs and contacts), Ω, finite and &gt; 0
 * @param conductanceWPerK module thermal conductance K between the junction planes, W/K, finite and &gt; 0
 */
public record ModuleParameters(double seebeckVPerK, double resistanceOhm, double conductanceWPerK) {

    public ModuleParameters {
        Check.positive("seebeckVPerK", seebeckVPerK);
        Check.positive("resistanceOhm", resistanceOhm);
        Check.positive("conductanceWPerK", conductanceWPerK);
    }

    /**
     * Parameters from maximum ratings, the ideal equations inverted (derived here; published forms in
     * {@link RatingsMethod}). ΔTmax is reached at Qc = 0 with I = Imax = S·Tc,dt/R, Tc,dt = Th − ΔTmax, which
     * gives R = S·Tc,dt/Imax and K = S·Imax·Tc,dt/(2ΔTmax); S depends on the method: Vmax/Th, or
     * 2Qmax/(Imax(Th + ΔTmax)), which assumes Qmax was measured at Imax with ΔT = 0 (see
     * {@link RatingsMethod#QMAX_IMAX_DTMAX} for the derivation and what a Qmax measured otherwise does).
     *
     * @param ratings maximum ratings at their hot-side temperature
     * @param method  which three ratings to use; {@link RatingsMethod#QMAX_IMAX_DTMAX} needs Qmax
     * @throws InvalidQuantityException on field {@code qmaxW} if the method needs Qmax and it is absent
     */
    public static ModuleParameters fromRatings(MaxRatings ratings, RatingsMethod method) {
        double th = ratings.hotSideK();     // Th of the rating test
        double dtMax = ratings.dtmaxK();    // ΔTmax
        double imax = ratings.imaxA();
        double s = switch (method) {
            case IMAX_VMAX_DTMAX -> ratings.vmaxV() / th;          // eq. (i)
            case QMAX_IMAX_DTMAX -> {
                if (!ratings.hasQmax()) {
                    throw new InvalidQuantityException("qmaxW", Double.NaN,
                            "qmaxW must be given for method QMAX_IMAX_DTMAX, was absent");
                }
                yield 2 * ratings.qmaxW() / (imax * (th + dtMax));
            }
        };
        double coldSideAtDtMaxK = th - dtMax;                       // Tc,dt
        double r = s * coldSideAtDtMaxK / imax;                     // eq. (ii)
        double k = s * imax * coldSideAtDtMaxK / (2 * dtMax);
        return new ModuleParameters(s, r, k);
    }

    /** Figure of merit Z = S²/(R·K), 1/K (Ioffe 1957, from memory). */
    public double figureOfMeritPerK() {
        return seebeckVPerK * seebeckVPerK / (resistanceOhm * conductanceWPerK);
    }

    /**
     * Heat absorbed at the cold face, W: Qc = S·I·Tc − ½I²R − K(Th − Tc) (Ioffe 1957; Goldsmid 2016).
     *
     * @param currentA  drive current, A (positive pumps heat from the cold to the hot face)
     * @param coldSideK cold junction temperature Tc, K, &gt; 0
     * @param hotSideK  hot junction temperature Th, K, &gt; 0
     */
    public double coldSideHeatW(double currentA, double coldSideK, double hotSideK) {
        double peltierW = seebeckVPerK * currentA * coldSideK;
        double jouleW = 0.5 * currentA * currentA * resistanceOhm; // half the I²R reaches the cold side
        double conductionW = conductanceWPerK * (hotSideK - coldSideK);
        return peltierW - jouleW - conductionW;
    }

    /**
     * Heat released at the hot face, W: Qh = S·I·Th + ½I²R − K(Th − Tc) (Ioffe 1957; Goldsmid 2016).
     * Arguments as {@link #coldSideHeatW}.
     */
    public double hotSideHeatW(double currentA, double coldSideK, double hotSideK) {
        double peltierW = seebeckVPerK * currentA * hotSideK;
        double jouleW = 0.5 * currentA * currentA * resistanceOhm;
        double conductionW = conductanceWPerK * (hotSideK - coldSideK);
        return peltierW + jouleW - conductionW;
    }

    /** Terminal voltage, V: V = S(Th − Tc) + I·R (Ioffe 1957). Arguments as {@link #coldSideHeatW}. */
    public double voltageV(double currentA, double coldSideK, double hotSideK) {
        return seebeckVPerK * (hotSideK - coldSideK) + currentA * resistanceOhm;
    }

    /** Electrical input power, W: P = I·V = Qh − Qc (first law). Arguments as {@link #coldSideHeatW}. */
    public double powerW(double currentA, double coldSideK, double hotSideK) {
        return currentA * voltageV(currentA, coldSideK, hotSideK);
    }

    /**
     * Lower (low-power) current that pumps {@code heatLoadW} between fixed junction temperatures
     * (ideal heat sink), A: I = [S·Tc − √(S²Tc² − 2R(Qc + KΔT))]/R (the quadratic Qc(I) solved, case S09), written
     * in the cancellation-free form 2(Qc + KΔT)/(S·Tc + √…). Empty when the load exceeds
     * S²Tc²/(2R) − KΔT.
     *
     * @param heatLoadW cold-side heat to pump, W, finite
     * @param coldSideK Tc, K, &gt; 0
     * @param hotSideK  Th, K, &gt; 0
     */
    public OptionalDouble currentForLoadA(double heatLoadW, double coldSideK, double hotSideK) {
        Check.finite("heatLoadW", heatLoadW);
        Check.positive("coldSideK", coldSideK);
        Check.positive("hotSideK", hotSideK);
        double peltierPerA = seebeckVPerK * coldSideK;                          // S·Tc
        double needW = heatLoadW + conductanceWPerK * (hotSideK - coldSideK);   // Qc + K·ΔT
        double discriminant = peltierPerA * peltierPerA - 2 * resistanceOhm * needW;
        if (discriminant < 0) {
            return OptionalDouble.empty();
        }
        if (needW <= 0) {
            return OptionalDouble.of(0.0); // conduction alone carries the load: no current needed
        }
        return OptionalDouble.of(2 * needW / (peltierPerA + Math.sqrt(discriminant)));
    }

    /** Current of largest cooling at fixed junction temperatures, A: I = S·Tc/R (Ioffe 1957; Goldsmid 2016). */
    public double maxCoolingCurrentA(double coldSideK) {
        return seebeckVPerK * coldSideK / resistanceOhm;
    }

    /**
     * Largest cooling at fixed junction temperatures, W: S²Tc²/(2R) − K(Th − Tc) (Ioffe 1957; Goldsmid 2016).
     */
    public double maxColdSideHeatW(double coldSideK, double hotSideK) {
        return coldSideHeatW(maxCoolingCurrentA(coldSideK), coldSideK, hotSideK);
    }

    /**
     * Current of best COP at fixed junction temperatures, A: I = S·ΔT/(R(M − 1)) with
     * M = √(1 + Z·Tm) (Ioffe 1957, from memory). 0 when ΔT ≤ 0 (the best COP is then
     * approached as the current goes to zero).
     */
    public double copOptimalCurrentA(double coldSideK, double hotSideK) {
        double dtK = hotSideK - coldSideK;
        if (dtK <= 0) {
            return 0.0;
        }
        double m = Math.sqrt(1 + figureOfMeritPerK() * 0.5 * (coldSideK + hotSideK));
        return seebeckVPerK * dtK / (resistanceOhm * (m - 1));
    }

    /** Best COP at fixed junction temperatures (Ioffe 1957); see {@link #maxCop(double, double, double)}. */
    public double maxCop(double coldSideK, double hotSideK) {
        return maxCop(figureOfMeritPerK(), coldSideK, hotSideK);
    }

    /**
     * Best cooling COP between fixed junction temperatures: COPmax = (Tc/ΔT)(M − Th/Tc)/(M + 1),
     * M = √(1 + Z·Tm) (Ioffe 1957, Goldsmid 2016, from memory; cases S07, S08).
     * Negative when M &lt; Th/Tc (ΔT beyond reach); +∞ when ΔT ≤ 0.
     *
     * @param figureOfMeritPerK Z, 1/K, &gt; 0
     * @param coldSideK         Tc, K, &gt; 0
     * @param hotSideK          Th, K, &gt; 0
     */
    public static double maxCop(double figureOfMeritPerK, double coldSideK, double hotSideK) {
        double dtK = hotSideK - coldSideK;
        if (dtK <= 0) {
            return Double.POSITIVE_INFINITY;
        }
        double m = Math.sqrt(1 + figureOfMeritPerK * 0.5 * (coldSideK + hotSideK));
        return coldSideK / dtK * (m - hotSideK / coldSideK) / (m + 1);
    }

    /** Carnot COP of a cooler, Tc/(Th − Tc) (second law); +∞ when Th ≤ Tc. */
    public static double carnotCop(double coldSideK, double hotSideK) {
        double dtK = hotSideK - coldSideK;
        return dtK <= 0 ? Double.POSITIVE_INFINITY : coldSideK / dtK;
    }

    /**
     * Equivalent module of {@code seriesCount × parallelCount} identical modules on common
     * isothermal plates: S·ns, R·ns/np, K·ns·np; Z is unchanged (circuit algebra of identical modules,
     * derived here; case S14).
     *
     * @param seriesCount   modules in series per string, ≥ 1
     * @param parallelCount parallel strings, ≥ 1
     */
    public ModuleParameters inArray(int seriesCount, int parallelCount) {
        Check.atLeastOne("seriesCount", seriesCount);
        Check.atLeastOne("parallelCount", parallelCount);
        return new ModuleParameters(seebeckVPerK * seriesCount,
                resistanceOhm * seriesCount / parallelCount,
                conductanceWPerK * seriesCount * parallelCount);
    }

    /**
     * Ideal ΔTmax at a hot-side temperature, K: Th − Tc,min with Tc,min = 2Th/(√(1 + 2Z·Th) + 1), the
     * root of Z·Tc²/2 + Tc − Th = 0 in its cancellation-free form (ΔTmax at Qc = 0 and I = S·Tc/R, derived here).
     *
     * @param hotSideK hot-side temperature Th, K, &gt; 0 (not checked: used on hot paths)
     */
    public double dtmaxK(double hotSideK) {
        return hotSideK - 2 * hotSideK / (Math.sqrt(1 + 2 * figureOfMeritPerK() * hotSideK) + 1);
    }

    /**
     * Ideal maximum ratings at a hot-side temperature, constant properties (derived here from the ideal
     * equations and checked by brute-force maximisation, case S02):
     * Tc,min = 2Th/(√(1 + 2Z·Th) + 1), ΔTmax = Th − Tc,min, Imax = S·Tc,min/R, Vmax = S·Th,
     * Qmax = S·Imax(Th + ΔTmax)/2.
     *
     * @param hotSideK hot-side temperature Th, K, finite and &gt; 0
     */
    public MaxRatings ratingsAt(double hotSideK) {
        Check.positive("hotSideK", hotSideK);
        double dtMaxK = dtmaxK(hotSideK);
        double coldMinK = hotSideK - dtMaxK;
        double imaxA = seebeckVPerK * coldMinK / resistanceOhm;
        double vmaxV = seebeckVPerK * hotSideK;
        double qmaxW = seebeckVPerK * imaxA * (hotSideK + dtMaxK) / 2;
        return new MaxRatings(imaxA, vmaxV, qmaxW, dtMaxK, hotSideK);
    }
}
