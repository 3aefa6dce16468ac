package org.chillwright.catalog;

import java.util.List;

/** One page of search results and how many matched in all. */
public record ModulePage(List<ModuleSpec> items, long total, int page, int size) {

    public int pageCount() {
        return (int) Math.max(1, (total + size - 1) / size);
    }
}
