package org.chillwright.physics;

import java.util.List;

/**
 * The best two-stage stacks of a catalog for one case, best first, and how much of the search was needed.
 *
 * @param stacks             feasible stacks in order of COP, best first (the same order as lowest power, since
 *                           every stack pumps the same load); at most the search's limit
 * @param stacksPossible     every cold stage × hot stage pair the search could have solved (module × split on
 *                           each side, the hot stage with at least as many modules as the cold one)
 * @param coldStagesDropped  cold stages (module × split) dropped before pairing: not even the best partner
 *                           the bounds allow could hold the set-point with them
 * @param stacksPruned       pairs not solved because a bound ruled them out, alone or with their bucket
 *                           (stacksPossible − stacksEvaluated)
 * @param stacksEvaluated    pairs whose shared-current operating point was solved
 * @param stacksFeasible     solved pairs that hold the set-point within every limit
 * @param elapsedNanos       time taken, ns
 */
public record StackRanking(List<StackSolved> stacks, long stacksPossible, long coldStagesDropped, long stacksPruned,
                           long stacksEvaluated, long stacksFeasible, long elapsedNanos) {

    public StackRanking {
        stacks = List.copyOf(stacks);
    }
}
