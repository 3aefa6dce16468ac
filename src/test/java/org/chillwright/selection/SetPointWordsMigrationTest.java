package org.chillwright.selection;

import static org.assertj.core.api.Assertions.assertThat;

import org.flywaydb.core.Flyway;
import org.junit.jupiter.api.Test;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.jdbc.datasource.SingleConnectionDataSource;

/** Migration V24: a study saved before the set-point field was renamed re-opens with its set-point. */
class SetPointWordsMigrationTest {

    @Test
    void aStudySavedBeforeTheRenameKeepsItsSetPoint() {
        var dataSource = new SingleConnectionDataSource("jdbc:h2:mem:set-point-" + System.nanoTime(), "sa", "", true);
        Flyway.configure().dataSource(dataSource).locations("classpath:db/migration", "classpath:db/vendor/h2")
                .target("23").load().migrate();
        var jdbc = new JdbcTemplate(dataSource);
        jdbc.update("INSERT INTO selection_study (name, case_query, catalog_revision, ranking_json, created_by, "
                + "created_at, ranked_at, version) VALUES ('Bench laser', "
                + "'temperatureUnit=C&objectTemperature=20&ambientTemperature=45&activeLoad=12', 1, '{}', 'ana', "
                + "CURRENT_TIMESTAMP, CURRENT_TIMESTAMP, 0)");

        Flyway.configure().dataSource(dataSource).locations("classpath:db/migration", "classpath:db/vendor/h2").load()
                .migrate();

        assertThat(jdbc.queryForObject("SELECT case_query FROM selection_study", String.class))
                .isEqualTo("temperatureUnit=C&setPointTemperature=20&ambientTemperature=45&activeLoad=12");
        dataSource.destroy();
    }
}
