package org.chillwright.catalog;

/** How a module entered the catalog: by its maximum ratings or by its construction. */
public enum EntryRoute {
    RATINGS,
    CONSTRUCTION
}
