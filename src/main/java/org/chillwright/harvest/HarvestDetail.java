package org.chillwright.harvest;

import java.util.Optional;
import org.chillwright.catalog.ModuleSpec;

/**
 * One design in full for its page: the module, the design on its best-power load, what (if anything) rules
 * it out in this case, and its curves against load resistance.
 */
public record HarvestDetail(ModuleSpec module, HarvestDesign design, Optional<HarvestRanking.Rejection> problem,
                            HarvestCurves curves) {

    public boolean feasible() {
        return problem.isEmpty();
    }
}
