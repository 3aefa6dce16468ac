package org.chillwright.approval;

/** A module's place on one list, for the catalog page of that module. */
public record Placement(long listId, String listName, long entryId, EntryState state) {
}
