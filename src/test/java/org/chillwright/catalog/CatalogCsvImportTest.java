package org.chillwright.catalog;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.StringReader;
import java.io.StringWriter;
import java.util.UUID;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;

/** CSV import is all or nothing, names row and column of every bad cell, and export → import changes nothing. */
@SpringBootTest
class CatalogCsvImportTest {

    private static final String HEADER = "supplier,partNumber,imaxA,vmaxV,qmaxW,dtmaxK,hotSideC\n";

    @Autowired
    CatalogService catalog;

    private String supplier;

    @BeforeEach
    void freshSupplier() {
        supplier = "Glacier Works " + UUID.randomUUID();
    }

    private String row(String partNumber, String ratings) {
        return supplier + "," + partNumber + "," + ratings + "\n";
    }

    private ImportReport importing(String csv) {
        return catalog.importCsv(new StringReader(csv), "csv-tester");
    }

    private long stored() {
        return catalog.search(ModuleQuery.text(supplier)).total();
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            comma decimal mark      | '"6,2",15.4,52,68,25'   | imaxA  | uses ',' as the decimal mark
            unit suffix in a cell   | '6 A,15.4,52,68,25'     | imaxA  | without a unit
            empty required cell     | ',15.4,52,68,25'        | imaxA  | is required
            negative value          | '6,-15.4,52,68,25'      | vmaxV  | must be > 0
            not a number            | '6,15.4,NaN,68,25'      | qmaxW  | must be a finite number
            infinite value          | '6,15.4,52,Infinity,25' | dtmaxK | must be a finite number
            dTmax at the hot side   | '6,15.4,52,298.15,25'   | dtmaxK | below the hot-side temperature in kelvin
            dTmax above the hot side| '6,15.4,52,400,25'      | dtmaxK | below the hot-side temperature in kelvin
            """)
    void badCellIsReportedWithRowAndColumnAndNothingIsStored(String kind, String badRatings, String column,
                                                             String message) {
        var report = importing(HEADER + row("GW-1", "6,15.4,52,68,25") + row("GW-2", badRatings));

        assertThat(report.applied()).isFalse();
        assertThat(report.errors()).singleElement().satisfies(e -> {
            assertThat(e.row()).isEqualTo(3);
            assertThat(e.column()).isEqualTo(column);
            assertThat(e.message()).contains(message);
        });
        assertThat(stored()).isZero();
    }

    @Test
    void duplicateRowInOneFileIsReportedAtTheRepeat() {
        var report = importing(HEADER + row("GW-1", "6,15.4,52,68,25") + row("GW-2", "3,8,15,69,25")
                + row("GW-1", "6,15.4,52,68,25"));

        assertThat(report.errors()).singleElement().satisfies(e -> {
            assertThat(e.row()).isEqualTo(4);
            assertThat(e.column()).isEqualTo("partNumber");
            assertThat(e.message()).contains("repeats row 2");
        });
        assertThat(stored()).isZero();
    }

    @Test
    void missingRequiredColumnIsReportedOnTheHeaderRow() {
        var report = importing("supplier,partNumber,imaxA,vmaxV,dtmaxK,hotSideC\n" + supplier + ",GW-1,6,15.4,68,25\n");

        assertThat(report.errors()).extracting(CsvRowError::row, CsvRowError::column)
                .containsExactly(org.assertj.core.groups.Tuple.tuple(1, "qmaxW"));
        assertThat(stored()).isZero();
    }

    @Test
    void unknownColumnIsReportedOnTheHeaderRow() {
        var report = importing("supplier,partNumber,imaxA,vmaxV,qmaxW,dtmaxK,hotSideC,imax\n"
                + supplier + ",GW-1,6,15.4,52,68,25,6\n");

        assertThat(report.errors()).extracting(CsvRowError::row, CsvRowError::column)
                .containsExactly(org.assertj.core.groups.Tuple.tuple(1, "imax"));
    }

    @Test
    void everyBadRowIsReportedNotOnlyTheFirst() {
        var report = importing(HEADER + row("GW-1", "6;2,15.4,52,68,25") + row("GW-2", "3,8,15,69,25")
                + row("GW-3", "3,8 V,15,69,25"));

        assertThat(report.errors()).extracting(CsvRowError::row).containsExactly(2, 4);
    }

    @Test
    void columnsMayComeInAnyOrderAndEmptyQmaxMeansNotStated() {
        var report = importing("hotSideC,dtmaxK,qmaxW,vmaxV,imaxA,partNumber,supplier\n25,68,,15.4,6,GW-1," + supplier
                + "\n");

        assertThat(report.applied()).isTrue();
        var module = catalog.get(report.changes().get(0).moduleId());
        assertThat(module.definition().ratings().qmaxW()).isNull();
        assertThat(module.ratedImaxA()).isEqualTo(6.0);
    }

    @Test
    void priceBreaksAndPurchasingColumnsAreRead() {
        var report = importing("supplier,partNumber,imaxA,vmaxV,qmaxW,dtmaxK,hotSideC,currency,prices,lifecycle,rohs\n"
                + supplier + ",GW-1,6,15.4,52,68,25,eur,1:12.40;100:9.85,LAST_TIME_BUY,true\n");

        var module = catalog.get(report.changes().get(0).moduleId());
        assertThat(module.unitPriceAt(99)).contains(new java.math.BigDecimal("12.4"));
        assertThat(module.definition().currency()).isEqualTo("EUR");
        assertThat(module.lifecycle()).isEqualTo(Lifecycle.LAST_TIME_BUY);
    }

    @Test
    void badPriceEncodingIsReportedInThePricesColumn() {
        var report = importing("supplier,partNumber,imaxA,vmaxV,qmaxW,dtmaxK,hotSideC,currency,prices\n"
                + supplier + ",GW-1,6,15.4,52,68,25,EUR,1=12.40\n");

        assertThat(report.errors()).singleElement().satisfies(e -> assertThat(e.column()).isEqualTo("prices"));
    }

    @Test
    void previewStoresNothing() {
        var report = catalog.previewImport(new StringReader(HEADER + row("GW-1", "6,15.4,52,68,25")));

        assertThat(report.count(ImportReport.Kind.NEW)).isEqualTo(1);
        assertThat(report.applied()).isFalse();
        assertThat(stored()).isZero();
    }

    @Test
    void rowForAStoredModuleUpdatesOnlyTheColumnsTheFileHas() {
        var module = catalog.create(CatalogFixtures.rated(supplier, "GW-1"), "csv-tester");

        var report = importing(HEADER + row("GW-1", "6.5,15.4,56,68,25"));

        assertThat(report.changes()).singleElement().satisfies(c -> {
            assertThat(c.kind()).isEqualTo(ImportReport.Kind.UPDATED);
            assertThat(c.changedColumns()).containsExactly("imaxA");
        });
        var after = catalog.get(module.id());
        assertThat(after.ratedImaxA()).isEqualTo(6.5);
        assertThat(after.definition().prices()).isEqualTo(module.definition().prices());
    }

    @Test
    void exportThenImportChangesNothing() {
        catalog.create(CatalogFixtures.rated(supplier, "GW-1"), "csv-tester");
        catalog.create(CatalogFixtures.constructed(supplier, "GW-2"), "csv-tester");
        var first = new StringWriter();
        catalog.exportCsv(first, false);
        long revision = catalog.snapshot().revision();

        var report = importing(first.toString());

        assertThat(report.ok()).isTrue();
        assertThat(report.changes()).allSatisfy(c -> assertThat(c.kind()).isEqualTo(ImportReport.Kind.UNCHANGED));
        assertThat(catalog.snapshot().revision()).isEqualTo(revision);
        var second = new StringWriter();
        catalog.exportCsv(second, false);
        assertThat(second.toString()).isEqualTo(first.toString());
    }
}
