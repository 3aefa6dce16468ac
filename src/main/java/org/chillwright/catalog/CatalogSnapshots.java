package org.chillwright.catalog;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.chillwright.physics.Units;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Component;
import org.springframework.transaction.event.TransactionalEventListener;

/**
 * Holds the current {@link CatalogSnapshot}. Rebuilt right after a change commits in this instance,
 * and whenever the stored revision has moved on (a change made by another instance on the same
 * database), so every caller sees the committed catalog. Built on first use, not at start-up.
 */
@Component
class CatalogSnapshots {

    private final JdbcTemplate jdbc;
    private volatile CatalogSnapshot current = CatalogSnapshot.empty();

    CatalogSnapshots(JdbcTemplate jdbc) {
        this.jdbc = jdbc;
    }

    /** The snapshot of the latest committed revision. One single-row read when it is current. */
    CatalogSnapshot current() {
        CatalogSnapshot snapshot = current;
        if (snapshot.revision() == storedRevision()) {
            return snapshot;
        }
        return rebuild();
    }

    @TransactionalEventListener
    void onCommitted(CatalogChanged change) {
        if (current.revision() < change.revision()) {
            rebuild();
        }
    }

    /** Bumps the stored revision inside the caller's transaction; returns the new one. */
    long bumpRevision() {
        jdbc.update("UPDATE catalog_state SET revision = revision + 1 WHERE id = 1");
        return storedRevision();
    }

    long storedRevision() {
        Long revision = jdbc.queryForObject("SELECT revision FROM catalog_state WHERE id = 1", Long.class);
        return revision == null ? 0 : revision;
    }

    synchronized CatalogSnapshot rebuild() {
        // the revision is read before the rows: if a change commits in between, the rows are newer
        // than the label and the next call rebuilds again, never the other way round
        long revision = storedRevision();
        if (current.revision() == revision) {
            return current;
        }
        Map<Long, List<double[]>> breaks = new HashMap<>();
        jdbc.query("SELECT b.module_id, b.quantity, b.unit_price FROM catalog_price_break b "
                        + "JOIN catalog_module m ON m.id = b.module_id WHERE m.archived = FALSE "
                        + "ORDER BY b.module_id, b.quantity",
                rs -> {
                    breaks.computeIfAbsent(rs.getLong(1), id -> new ArrayList<>())
                            .add(new double[] {rs.getInt(2), rs.getBigDecimal(3).doubleValue()});
                });
        List<CatalogSnapshot.Row> rows = jdbc.query("SELECT id, supplier, part_number, lifecycle, seebeck_v_per_k, "
                        + "resistance_ohm, conductance_w_per_k, list_imax_a, list_vmax_v, list_qmax_w, list_dtmax_k, "
                        + "max_operating_c, currency, min_order_quantity FROM catalog_module WHERE archived = FALSE ORDER BY id",
                (rs, n) -> {
                    long id = rs.getLong(1);
                    double maxOperatingC = rs.getDouble(12);
                    double maxHotSideK = rs.wasNull() ? Double.NaN : Units.kelvinFromCelsius(maxOperatingC);
                    List<double[]> moduleBreaks = breaks.getOrDefault(id, List.of());
                    return new CatalogSnapshot.Row(id, rs.getString(2), rs.getString(3),
                            Lifecycle.valueOf(rs.getString(4)), rs.getDouble(5), rs.getDouble(6), rs.getDouble(7),
                            rs.getDouble(8), rs.getDouble(9), rs.getDouble(10), rs.getDouble(11), maxHotSideK,
                            rs.getString(13), moduleBreaks.stream().mapToInt(b -> (int) b[0]).toArray(),
                            moduleBreaks.stream().mapToDouble(b -> b[1]).toArray(), rs.getInt(14));
                });
        current = new CatalogSnapshot(revision, rows);
        return current;
    }
}
