package org.chillwright.harvest;

import org.chillwright.physics.Check;
import org.chillwright.physics.GeneratorCase;

/**
 * A heat-harvesting case and how to rank designs against it. Temperatures in the case are kelvin.
 *
 * @param generatorCase   hot source, cold sink and the heat-exchanger resistances of the whole assembly
 *                        (source to hot plate, cold plate to sink), K/W
 * @param maxModules      designs of 1 to this many identical modules, in every series × parallel split
 * @param objective       what comes first
 * @param minLoadVoltageV drop designs whose voltage at the load is below this, V (a DC-DC converter's
 *                        start-up voltage); 0 keeps all
 * @param costQuantity    how many assemblies are built, for price breaks (cost = modules × unit price at
 *                        modules × costQuantity pieces)
 * @param limit           how many designs to return
 */
public record HarvestCase(GeneratorCase generatorCase, int maxModules, HarvestObjective objective,
                          double minLoadVoltageV, int costQuantity, int limit) {

    /** Most modules in one design: beyond this an assembly is a custom build, not a catalog choice. */
    public static final int MAX_MODULES = 8;

    public HarvestCase {
        if (generatorCase == null) {
            throw new org.chillwright.physics.InvalidQuantityException("generatorCase", Double.NaN,
                    "generatorCase must be given, was null");
        }
        Check.within("maxModules", maxModules, 1, MAX_MODULES);
        Check.nonNegative("minLoadVoltageV", minLoadVoltageV);
        Check.atLeastOne("costQuantity", costQuantity);
        Check.atLeastOne("limit", limit);
        objective = objective == null ? HarvestObjective.POWER : objective;
    }
}
