package org.chillwright.catalog;

import jakarta.annotation.Nullable;
import java.util.List;

/**
 * What an import changes (or, for a preview, would change). When {@link #errors()} is not empty
 * nothing was stored and {@link #changes()} is empty.
 *
 * @param applied true when the changes were stored
 */
public record ImportReport(List<RowChange> changes, List<CsvRowError> errors, boolean applied) {

    public ImportReport {
        changes = List.copyOf(changes);
        errors = List.copyOf(errors);
    }

    /** What one row does to the catalog. */
    public enum Kind { NEW, UPDATED, UNCHANGED }

    /**
     * @param moduleId       the stored module the row matches, null for a new one in a preview
     * @param changedColumns for an update, the columns whose value changes
     */
    public record RowChange(int row, String supplier, String partNumber, Kind kind, @Nullable Long moduleId,
                            List<String> changedColumns) {
    }

    public boolean ok() {
        return errors.isEmpty();
    }

    public long count(Kind kind) {
        return changes.stream().filter(c -> c.kind() == kind).count();
    }

    public long newCount() {
        return count(Kind.NEW);
    }

    public long updatedCount() {
        return count(Kind.UPDATED);
    }

    public long unchangedCount() {
        return count(Kind.UNCHANGED);
    }
}
