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
 * @param coldest     the heating check on the coldest day, or null when none was asked for
 */
public record CaseSpec(RankingCase rankingCase, String supplier, Set<Lifecycle> lifecycles, Long listId,
                       ColdestDay coldest) {

    public CaseSpec {
        lifecycles = lifecycles == null ? Set.of() : Set.copyOf(lifecycles);
        supplier = supplier == null || supplier.isBlank() ? null : supplier.trim();
    }

    public CaseSpec(RankingCase rankingCase, String supplier, Set<Lifecycle> lifecycles, Long listId) {
        this(rankingCase, supplier, lifecycles, listId, null);
    }

    /**
     * The coldest ambient the design must hold the set-point in, for the heating check.
     *
     * @param ambientK    coldest ambient, K
     * @param heatNeededW heat the object must get from the module then, W: its losses to the cold ambient
     *                    minus its own dissipation (negative when it still runs warm)
     */
    public record ColdestDay(double ambientK, double heatNeededW) {
    }
}
