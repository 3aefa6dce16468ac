package org.chillwright.approval;

/**
 * A catalog module as an approved list shows it.
 *
 * @param lifecycle the supplier's lifecycle state as the catalog names it ({@code ACTIVE}, ..., {@code OBSOLETE})
 */
public record ModuleSummary(long id, String supplier, String partNumber, String lifecycle) {

    public static final String OBSOLETE = "OBSOLETE";

    public boolean obsolete() {
        return OBSOLETE.equals(lifecycle);
    }
}
