package org.chillwright.approval;

import static org.chillwright.approval.EntryState.APPROVED;
import static org.chillwright.approval.EntryState.OBSOLETE;
import static org.chillwright.approval.EntryState.PROPOSED;
import static org.chillwright.approval.EntryState.QUALIFYING;
import static org.chillwright.approval.EntryState.RESTRICTED;

import java.util.EnumSet;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.chillwright.account.Role;

/**
 * The sign-off rules: which moves the states allow, which roles may move an entry into each state,
 * and the four-eyes rule (an approver is neither the entry's proposer nor its qualifier). Rejection is
 * the move from {@code QUALIFYING} back to {@code PROPOSED}. An approved part may go straight to
 * {@code OBSOLETE} when its supplier ends it without a restricted phase.
 */
final class Workflow {

    private static final Map<EntryState, Set<EntryState>> MOVES = Map.of(
            PROPOSED, EnumSet.of(QUALIFYING),
            QUALIFYING, EnumSet.of(APPROVED, PROPOSED),
            APPROVED, EnumSet.of(RESTRICTED, OBSOLETE),
            RESTRICTED, EnumSet.of(OBSOLETE),
            OBSOLETE, EnumSet.noneOf(EntryState.class));

    /** Who may move an entry into each state; ADMIN may do everything. */
    private static final Map<EntryState, Set<Role>> MOVERS = Map.of(
            PROPOSED, EnumSet.of(Role.APPROVER, Role.ADMIN),
            QUALIFYING, EnumSet.of(Role.ENGINEER, Role.ADMIN),
            APPROVED, EnumSet.of(Role.APPROVER, Role.ADMIN),
            RESTRICTED, EnumSet.of(Role.APPROVER, Role.ADMIN),
            OBSOLETE, EnumSet.of(Role.APPROVER, Role.ADMIN));

    static final Set<Role> LIST_EDITORS = EnumSet.of(Role.ENGINEER, Role.APPROVER, Role.ADMIN);
    static final Set<Role> PROPOSERS = EnumSet.of(Role.ENGINEER, Role.ADMIN);
    static final Set<Role> COMMERCIAL_ANNOTATORS = EnumSet.of(Role.PURCHASING, Role.ADMIN);

    private Workflow() {
    }

    static boolean stateAllows(EntryState from, EntryState to) {
        return MOVES.get(from).contains(to);
    }

    static Set<EntryState> movesFrom(EntryState from) {
        return EnumSet.copyOf(MOVES.get(from)); // the values are EnumSets, so copying an empty one is fine
    }

    static boolean roleAllows(Actor actor, EntryState to) {
        return actor.holdsAny(MOVERS.get(to));
    }

    /**
     * The four-eyes rule: an entry moves to {@code APPROVED} only by someone who neither proposed it nor
     * moved it to {@code QUALIFYING}. Says why this person may not make this move, or is empty when they may
     * (always empty when the team has relaxed the rule).
     *
     * @param qualifiedBy who last moved the entry to QUALIFYING, or null
     */
    static Optional<String> fourEyesRefusal(EntryState to, String proposedBy, String qualifiedBy, Actor actor,
            boolean fourEyes) {
        if (!fourEyes || to != APPROVED) {
            return Optional.empty();
        }
        boolean proposed = actor.username().equals(proposedBy);
        boolean qualified = actor.username().equals(qualifiedBy);
        if (!proposed && !qualified) {
            return Optional.empty();
        }
        String what = proposed && qualified ? "proposed this entry and sent it to qualification"
                : proposed ? "proposed this entry" : "sent this entry to qualification";
        return Optional.of("Approval needs a second person: you " + what + ", so someone other than its proposer ("
                + proposedBy + ") and its qualifier (" + qualifiedBy + ") must approve it");
    }

    /** The moves this person could make from this state, for offering them on the page. */
    static Set<EntryState> targetsFor(Actor actor, EntryState from) {
        var targets = EnumSet.noneOf(EntryState.class);
        for (var to : MOVES.get(from)) {
            if (roleAllows(actor, to)) {
                targets.add(to);
            }
        }
        return targets;
    }
}
