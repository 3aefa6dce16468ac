package org.chillwright.catalog;

/**
 * A catalog search. Every filter is optional (null); ranges are inclusive and apply to the listed
 * ratings (stated, or ideal at the reference hot side for a constructed module).
 *
 * @param q    text matched, ignoring case, anywhere in supplier, part number or description
 * @param page zero-based
 */
public record ModuleQuery(String q, String supplier, Lifecycle lifecycle,
                          Double imaxMinA, Double imaxMaxA, Double qmaxMinW, Double qmaxMaxW,
                          Double dtmaxMinK, Double dtmaxMaxK, boolean includeArchived,
                          ModuleSort sort, boolean descending, int page, int size) {

    public static final int DEFAULT_SIZE = 25;
    public static final int MAX_SIZE = 200;

    public ModuleQuery {
        q = q == null || q.isBlank() ? null : q.strip();
        supplier = supplier == null || supplier.isBlank() ? null : supplier.strip();
        sort = sort == null ? ModuleSort.PART : sort;
        page = Math.max(page, 0);
        size = size < 1 ? DEFAULT_SIZE : Math.min(size, MAX_SIZE);
    }

    /** Every active module, first page. */
    public static ModuleQuery all() {
        return new ModuleQuery(null, null, null, null, null, null, null, null, null, false, null, false, 0,
                DEFAULT_SIZE);
    }

    public static ModuleQuery text(String q) {
        return new ModuleQuery(q, null, null, null, null, null, null, null, null, false, null, false, 0,
                DEFAULT_SIZE);
    }
}
