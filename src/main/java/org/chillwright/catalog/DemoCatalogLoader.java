package org.chillwright.catalog;

import java.io.IOException;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.boot.ApplicationArguments;
import org.springframework.boot.ApplicationRunner;
import org.springframework.core.annotation.Order;
import org.springframework.core.io.ClassPathResource;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Component;
import org.springframework.transaction.support.TransactionTemplate;

/**
 * Loads the invented demo catalog ({@code catalog-samples/demo-catalog.csv}) on the first start of
 * a database, once: a flag in {@code catalog_state}, set in the same transaction, keeps later starts
 * (and other instances racing on the same database) from loading it again, even after the demo
 * entries were edited or archived. On by default on the embedded database; the postgres profile
 * turns it off unless {@code CHILLWRIGHT_DEMO_DATA=true}.
 */
@Component
@Order(10)
class DemoCatalogLoader implements ApplicationRunner {

    static final String RESOURCE = "catalog-samples/demo-catalog.csv";
    private static final String ACTOR = "demo-data";
    private static final Logger log = LoggerFactory.getLogger(DemoCatalogLoader.class);

    private final boolean enabled;
    private final CatalogService catalog;
    private final JdbcTemplate jdbc;
    private final TransactionTemplate transaction;

    DemoCatalogLoader(@Value("${chillwright.demo-data.enabled:false}") boolean enabled, CatalogService catalog,
                      JdbcTemplate jdbc, TransactionTemplate transaction) {
        this.enabled = enabled;
        this.catalog = catalog;
        this.jdbc = jdbc;
        this.transaction = transaction;
    }

    @Override
    public void run(ApplicationArguments args) {
        if (enabled) {
            loadOnce();
        }
    }

    /** Loads the demo catalog unless this database already had it; returns how many modules were added. */
    long loadOnce() {
        Long added = transaction.execute(status -> {
            // the row lock makes a second instance wait here and then see the flag
            Boolean loaded = jdbc.queryForObject("SELECT demo_loaded FROM catalog_state WHERE id = 1 FOR UPDATE",
                    Boolean.class);
            if (Boolean.TRUE.equals(loaded)) {
                return 0L;
            }
            ImportReport report;
            try (Reader csv = new InputStreamReader(new ClassPathResource(RESOURCE).getInputStream(),
                    StandardCharsets.UTF_8)) {
                report = catalog.importCsv(csv, ACTOR);
            } catch (IOException e) {
                throw new UncheckedIOException("cannot read " + RESOURCE, e);
            }
            if (!report.ok()) {
                throw new IllegalStateException("the demo catalog does not import: " + report.errors());
            }
            jdbc.update("UPDATE catalog_state SET demo_loaded = TRUE WHERE id = 1");
            return report.count(ImportReport.Kind.NEW);
        });
        if (added != null && added > 0) {
            log.info("Loaded the invented demo catalog: {} modules", added);
        }
        return added == null ? 0 : added;
    }
}
