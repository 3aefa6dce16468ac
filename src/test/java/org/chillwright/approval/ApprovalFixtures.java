package org.chillwright.approval;

import java.util.EnumSet;
import java.util.Set;
import java.util.concurrent.atomic.AtomicLong;
import org.chillwright.account.AccountService;
import org.chillwright.account.Role;

/**
 * Lists and entries in a wanted state, made through the service the way people would make them: an
 * administrator proposes and qualifies, and a second person approves, as the four-eyes rule wants.
 */
public final class ApprovalFixtures {

    public static final Actor ADMIN = new Actor("admin", EnumSet.allOf(Role.class));
    /** The second pair of eyes: approves, restricts and obsoletes what {@link #ADMIN} proposed. */
    public static final Actor APPROVER = new Actor("fixture-approver", EnumSet.of(Role.APPROVER));
    public static final String PASSWORD = "fixture-password-1";
    private static final AtomicLong SEQUENCE = new AtomicLong(System.nanoTime() % 1_000_000);

    private ApprovalFixtures() {
    }

    /** A name no other test in this JVM uses. */
    public static String unique(String prefix) {
        return prefix + "-" + SEQUENCE.incrementAndGet();
    }

    public static ListView newList(ApprovedListService lists) {
        return lists.create(unique("Line"), "invented product line", ADMIN);
    }

    /**
     * An entry for module {@code moduleId} on {@code listId} in state {@code state}: proposed and qualified
     * by {@link #ADMIN}, approved and later moved by {@link #APPROVER}.
     */
    public static EntryView entryIn(ApprovedListService lists, long listId, long moduleId, EntryState state) {
        var entry = lists.propose(listId, moduleId, "fixture", ADMIN);
        for (var step : pathTo(state)) {
            var by = step == EntryState.QUALIFYING ? ADMIN : APPROVER;
            entry = lists.transition(listId, entry.id(), step, "fixture step", null, null, by);
        }
        return entry;
    }

    private static EntryState[] pathTo(EntryState state) {
        return switch (state) {
            case PROPOSED -> new EntryState[0];
            case QUALIFYING -> new EntryState[] {EntryState.QUALIFYING};
            case APPROVED -> new EntryState[] {EntryState.QUALIFYING, EntryState.APPROVED};
            case RESTRICTED -> new EntryState[] {EntryState.QUALIFYING, EntryState.APPROVED, EntryState.RESTRICTED};
            case OBSOLETE -> new EntryState[] {EntryState.QUALIFYING, EntryState.APPROVED, EntryState.OBSOLETE};
        };
    }

    /** An account with exactly these roles, created on first use. */
    public static String account(AccountService accounts, String username, Set<Role> roles) {
        if (!accounts.exists(username)) {
            accounts.create(username, PASSWORD, roles, "test-setup");
        }
        return username;
    }
}
