package org.chillwright.catalog;

/** Where a part is in its supplier's life: purchasing needs this beside the price. */
public enum Lifecycle {
    ACTIVE("Active"),
    NOT_FOR_NEW_DESIGNS("Not for new designs"),
    LAST_TIME_BUY("Last-time buy"),
    OBSOLETE("Obsolete");

    private final String label;

    Lifecycle(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }
}
