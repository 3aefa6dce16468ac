package org.chillwright.selection;

import org.chillwright.physics.Check;
import org.chillwright.physics.CoolingCase;

/**
 * A cooling case and how to rank candidates against it. Temperatures in the case are kelvin.
 *
 * @param coolingCase        set-point, worst ambient, load, heat sink, interfaces, humidity; in sizing
 *                           mode its sink resistance is ignored
 * @param sinkRiseK          NaN to use the case's heat sink; otherwise size the heat sink so that its base
 *                           runs this many kelvin above ambient, and report the resistance it needs
 * @param supplyMaxV         supply voltage limit, V, or NaN
 * @param supplyMaxA         supply current limit, A, or NaN
 * @param maxModules         designs of 1 to this many identical modules, in every series × parallel split
 * @param objective          what comes first
 * @param minMarginK         drop candidates with less margin in K than this (0 keeps all)
 * @param maxFractionOfImax  drop candidates above this fraction of their rated Imax (1 keeps all)
 * @param costQuantity       how many designs are built, for price breaks (cost = modules × unit price at
 *                           modules × costQuantity pieces)
 * @param limit              how many candidates to return in full detail
 */
public record RankingCase(CoolingCase coolingCase, double sinkRiseK, double supplyMaxV, double supplyMaxA,
                          int maxModules, Objective objective, double minMarginK, double maxFractionOfImax,
                          int costQuantity, int limit) {

    /** Most modules in one design: beyond this a cooler is a custom assembly, not a catalog choice. */
    public static final int MAX_MODULES = 8;

    public RankingCase {
        Check.within("maxModules", maxModules, 1, MAX_MODULES);
        Check.nonNegative("minMarginK", minMarginK);
        Check.positive("maxFractionOfImax", maxFractionOfImax);
        Check.atLeastOne("costQuantity", costQuantity);
        Check.atLeastOne("limit", limit);
        if (!Double.isNaN(sinkRiseK)) {
            Check.positive("sinkRiseK", sinkRiseK);
        }
    }

    public boolean sizesTheSink() {
        return !Double.isNaN(sinkRiseK);
    }

    /**
     * The case the solvers see: in sizing mode the heat-sink base is held at ambient + rise, which is a
     * zero-resistance sink to a warmer "ambient" (the hot interface still applies).
     */
    public CoolingCase solverCase() {
        if (!sizesTheSink()) {
            return coolingCase;
        }
        var c = coolingCase;
        return new CoolingCase(c.setPointK(), c.ambientK() + sinkRiseK, c.heatLoadW(), 0, c.coldInterfaceKPerW(),
                c.hotInterfaceKPerW(), c.relativeHumidity());
    }
}
