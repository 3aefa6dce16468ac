package org.chillwright.account;

/** What a person may do. A user may hold several roles. */
public enum Role {
    /** Accounts and everything else. */
    ADMIN,
    /** Catalog edits, studies; proposes list entries and moves them to qualifying. */
    ENGINEER,
    /** Reads everything and adds commercial notes to list entries. */
    PURCHASING,
    /** Approves, restricts and obsoletes list entries. */
    APPROVER;

    /** The authority name Spring Security checks with {@code hasRole}. */
    public String authority() {
        return "ROLE_" + name();
    }
}
