package org.chillwright.bench;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.concurrent.TimeUnit;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.chillwright.ChillwrightApplication;
import org.chillwright.catalog.CatalogService;
import org.chillwright.catalog.DemoCatalogGenerator;
import org.chillwright.catalog.ImportReport;
import org.chillwright.catalog.ModuleDefinition;
import org.chillwright.catalog.ModuleText;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.springframework.boot.builder.SpringApplicationBuilder;
import org.springframework.context.ConfigurableApplicationContext;
import org.springframework.jdbc.core.JdbcTemplate;

/**
 * Imports a CSV of 10,000 rated modules into an empty catalog on the embedded H2 database: parsing,
 * per-row validation and derivation through the physics engine, the diff against stored modules,
 * the batched inserts in one transaction and the snapshot rebuild. Target: 5 s (issue 4).
 * Run: {@code ./mvnw -Pbench test-compile exec:exec -Djmh.args="-f 1 -wi 2 -i 5 CatalogImport"}
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class CatalogImportBenchmark {

    static final int ROWS = 10_000;

    private ConfigurableApplicationContext app;
    private CatalogService catalog;
    private JdbcTemplate jdbc;
    private String csv;

    @Setup(Level.Trial)
    public void start() {
        app = new SpringApplicationBuilder(ChillwrightApplication.class)
                .properties("server.port=0", "spring.datasource.url=jdbc:h2:mem:bench;DB_CLOSE_DELAY=-1",
                        "chillwright.demo-data.enabled=false", "chillwright.admin.password=bench-admin-password",
                        "logging.level.root=WARN")
                .run();
        catalog = app.getBean(CatalogService.class);
        jdbc = app.getBean(JdbcTemplate.class);
        csv = tenThousandRows();
    }

    /** The demo modules, repeated under distinct part numbers. */
    static String tenThousandRows() {
        var demo = DemoCatalogGenerator.modules();
        var out = new StringWriter();
        try (var printer = new CSVPrinter(out, CSVFormat.DEFAULT.builder()
                .setHeader(ModuleText.COLUMNS.toArray(String[]::new)).setRecordSeparator('\n').get())) {
            for (int i = 0; i < ROWS; i++) {
                ModuleDefinition d = demo.get(i % demo.size());
                var cells = ModuleText.cells(d);
                cells.put(ModuleText.PART_NUMBER, d.partNumber() + "-" + i);
                printer.printRecord(cells.values());
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    @Setup(Level.Invocation)
    public void emptyCatalog() {
        jdbc.update("DELETE FROM catalog_price_break");
        jdbc.update("DELETE FROM catalog_module");
    }

    @Benchmark
    public ImportReport importTenThousandRows() {
        ImportReport report = catalog.importCsv(new StringReader(csv), "bench");
        if (report.count(ImportReport.Kind.NEW) != ROWS) {
            throw new IllegalStateException("import did not store every row: " + report.errors());
        }
        catalog.snapshot();
        return report;
    }

    @TearDown(Level.Trial)
    public void stop() {
        app.close();
    }
}
