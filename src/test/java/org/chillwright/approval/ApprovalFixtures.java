package org.chillwright.approval;

import java.util.EnumSet;
import java.util.Set;
import java.util.concurrent.atomic.AtomicLong;
import org.chillwright.account.AccountService;
import org.chillwright.account.Role;

/** Lists and entries in a wanted state, made through the service the way people would make them. */
public final class ApprovalFixtures {

    public static final Actor ADMIN = new Actor("admin", EnumSet.allOf(Role.class));
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

    /** An entry for module {@code moduleId} on {@code listId}, walked by an admin to state {@code state}. */
    public static EntryView entryIn(ApprovedListService lists, long listId, long moduleId, EntryState state) {
        var entry = lists.propose(listId, moduleId, "fixture", ADMIN);
        for (var step : pathTo(state)) {
            entry = lists.transition(listId, entry.id(), step, "fixture step", null, null, ADMIN);
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
