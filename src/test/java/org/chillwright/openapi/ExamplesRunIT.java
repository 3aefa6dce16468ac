package org.chillwright.openapi;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;

/**
 * The scripts in docs/examples run against a started application with the demo catalog, as a reader would run
 * them, so they cannot rot: the curl script prints the CSV header and the best designs, the Python script the same
 * designs in the same order as a table, and both agree with each other.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT,
        properties = "chillwright.demo-data.enabled=true")
@ExtendWith(ExampleToolsCondition.class)
class ExamplesRunIT {

    private static final int HOW_MANY = 3;

    @LocalServerPort
    int port;

    private record Run(int exit, List<String> lines) {
    }

    private Run run(String... command) throws IOException, InterruptedException {
        var process = new ProcessBuilder(command).redirectErrorStream(true).start();
        var lines = new ArrayList<String>();
        try (var out = process.inputReader(StandardCharsets.UTF_8)) {
            out.lines().forEach(lines::add);
        }
        assertThat(process.waitFor(120, TimeUnit.SECONDS)).as("%s finished", List.of(command)).isTrue();
        return new Run(process.exitValue(), lines);
    }

    private String base() {
        return "http://localhost:" + port;
    }

    /** The part numbers of the best designs, in rank order, from the curl script's CSV. */
    private List<String> bestByCurl() throws Exception {
        var run = run("bash", "docs/examples/rank.sh", base(), String.valueOf(HOW_MANY));
        assertThat(run.exit()).as(String.join("\n", run.lines())).isZero();
        assertThat(run.lines()).hasSize(1 + HOW_MANY);
        assertThat(run.lines().get(0)).startsWith("rank,feasible,moduleId,supplier,partNumber,");
        var parts = new ArrayList<String>();
        for (int i = 1; i <= HOW_MANY; i++) {
            String[] cells = run.lines().get(i).split(",", -1);
            assertThat(cells[0]).isEqualTo(String.valueOf(i));
            assertThat(cells[1]).isEqualTo("true");
            assertThat(Double.parseDouble(cells[11])).as("COP of design %d", i).isPositive();
            parts.add(cells[4]);
        }
        return parts;
    }

    @Test
    void theCurlScriptPrintsTheBestDesignsAsCsv() throws Exception {
        assertThat(bestByCurl()).hasSize(HOW_MANY).doesNotContain("");
    }

    @Test
    void thePythonScriptPrintsTheSameDesignsInTheSameOrder() throws Exception {
        var run = run("python3", "docs/examples/rank.py", base(), String.valueOf(HOW_MANY));
        assertThat(run.exit()).as(String.join("\n", run.lines())).isZero();
        assertThat(run.lines()).hasSize(2 + HOW_MANY);
        assertThat(run.lines().get(0)).matches("\\d+ of \\d+ designs hold the set-point; the best 3 by COP:");
        var best = bestByCurl();
        for (int i = 0; i < HOW_MANY; i++) {
            assertThat(run.lines().get(2 + i)).startsWith(String.format("%4d  ", i + 1)).contains(best.get(i));
        }
    }

    @Test
    void thePythonScriptSaysWhichFieldIsWrongWhenTheServerRefusesTheCase() throws Exception {
        // no designs asked for: the server answers 400 naming limit, and the script prints that and fails
        var run = run("python3", "docs/examples/rank.py", base(), "0");
        assertThat(run.exit()).isNotZero();
        assertThat(String.join("\n", run.lines())).contains("400 Invalid request", "limit:");
    }
}
