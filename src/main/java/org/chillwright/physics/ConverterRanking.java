package org.chillwright.physics;

import java.util.List;

/**
 * Generator designs ranked by the power delivered after a converter.
 *
 * @param ranked      the designs whose converter starts, most delivered power first (ties keep the input order)
 * @param cannotStart the designs whose open-circuit voltage is below the converter's cold-start voltage, in input order
 */
public record ConverterRanking(List<ConditionedDesign> ranked, List<ConditionedDesign> cannotStart) {

    public ConverterRanking {
        ranked = List.copyOf(ranked);
        cannotStart = List.copyOf(cannotStart);
    }
}
