package org.chillwright.approval;

/** Where a module stands on one approved list. */
public enum EntryState {
    /** Someone asked for the part; nobody has looked at it yet. */
    PROPOSED,
    /** Datasheet review, pilot builds or reliability tests under way. */
    QUALIFYING,
    /** Signed off: designs may use it. */
    APPROVED,
    /** Still approved for existing designs, not for new ones. */
    RESTRICTED,
    /** Not to be used any more; may name the entry that replaces it. */
    OBSOLETE
}
