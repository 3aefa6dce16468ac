package org.chillwright.selection;

import java.util.Set;
import org.chillwright.catalog.Lifecycle;

/**
 * What to rank and against what: the case and objective, plus which catalog modules may take part.
 *
 * @param rankingCase the cooling case and ranking settings (SI, kelvin)
 * @param supplier    only this supplier's modules, or null for all
 * @param lifecycles  only modules in these lifecycle states; empty for all
 * @param listId      only the approved entries of this part list, or null
 */
public record CaseSpec(RankingCase rankingCase, String supplier, Set<Lifecycle> lifecycles, Long listId) {

    public CaseSpec {
        lifecycles = lifecycles == null ? Set.of() : Set.copyOf(lifecycles);
        supplier = supplier == null || supplier.isBlank() ? null : supplier.trim();
    }
}
