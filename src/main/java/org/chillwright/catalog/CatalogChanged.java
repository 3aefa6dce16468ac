package org.chillwright.catalog;

/**
 * Published after a catalog change commits (create, edit, archive, restore or import), so features
 * holding results that depend on the catalog (saved studies) can mark them for a re-run.
 *
 * @param revision the catalog revision the change produced
 */
public record CatalogChanged(long revision) {
}
