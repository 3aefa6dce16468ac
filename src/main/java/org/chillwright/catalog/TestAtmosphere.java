package org.chillwright.catalog;

/** The gas around the module when its ratings were measured (ΔTmax is highest in vacuum). */
public enum TestAtmosphere {
    VACUUM("Vacuum"),
    DRY_NITROGEN("Dry nitrogen"),
    AIR("Air");

    private final String label;

    TestAtmosphere(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }
}
