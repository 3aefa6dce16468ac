package org.chillwright.catalog;

/** The columns a catalog listing can be sorted by. */
public enum ModuleSort {
    PART("supplier", "partNumber"),
    QMAX("listQmaxW"),
    DTMAX("listDtmaxK"),
    IMAX("listImaxA"),
    VMAX("listVmaxV"),
    Z("figureOfMeritPerK"),
    LEAD_TIME("leadTimeDays"),
    UPDATED("updatedAt");

    private final String[] properties;

    ModuleSort(String... properties) {
        this.properties = properties;
    }

    String[] properties() {
        return properties.clone();
    }
}
