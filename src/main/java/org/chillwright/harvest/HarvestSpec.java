package org.chillwright.harvest;

import java.util.Set;
import org.chillwright.catalog.Lifecycle;

/**
 * What to rank and against what: the harvest case, plus which catalog modules may take part.
 *
 * @param harvestCase the case and ranking settings (SI, kelvin)
 * @param supplier    only this supplier's modules, or null for all
 * @param lifecycles  only modules in these lifecycle states; empty for all
 */
public record HarvestSpec(HarvestCase harvestCase, String supplier, Set<Lifecycle> lifecycles) {

    public HarvestSpec {
        lifecycles = lifecycles == null ? Set.of() : Set.copyOf(lifecycles);
        supplier = supplier == null || supplier.isBlank() ? null : supplier.trim();
    }
}
