package org.chillwright.catalog;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.StringReader;
import java.util.UUID;
import org.chillwright.PostgresDatabase;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;

/** The catalog migration, sequence-batched inserts, row lock and snapshot query also run on PostgreSQL. */
@SpringBootTest
@PostgresDatabase
class CatalogPostgresIT {

    @Autowired
    CatalogService catalog;
    @Autowired
    DemoCatalogLoader demo;

    @Test
    void moduleRoundTripsAndAppearsInTheSnapshot() {
        var definition = CatalogFixtures.rated("Postgres Thermal " + UUID.randomUUID(), "PGT-1");
        var created = catalog.create(definition, "pg-tester");

        assertThat(catalog.get(created.id()).definition()).isEqualTo(definition);
        assertThat(catalog.snapshot().indexOf(created.id())).isNotNegative();
    }

    @Test
    void csvImportIsAllOrNothingOnPostgresql() {
        String supplier = "Postgres Thermal " + UUID.randomUUID();
        var report = catalog.importCsv(new StringReader("supplier,partNumber,imaxA,vmaxV,qmaxW,dtmaxK,hotSideC\n"
                + supplier + ",PGT-1,6,15.4,56,68,25\n" + supplier + ",PGT-2,6,15.4,56,-1,25\n"), "pg-tester");

        assertThat(report.errors()).extracting(CsvRowError::row).containsExactly(3);
        assertThat(catalog.search(ModuleQuery.text(supplier)).total()).isZero();
    }

    @Test
    void demoCatalogLoadsAtMostOnce() {
        demo.loadOnce();

        assertThat(demo.loadOnce()).isZero();
    }
}
