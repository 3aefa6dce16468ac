package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;

/**
 * One external check case of {@code check-cases.json}, for a test that checks a second implementation against
 * the same published value ({@link CheckCasesTest} runs every case once).
 */
final class CheckCaseFile {

    private CheckCaseFile() {
    }

    static JsonNode byId(String id) {
        try (InputStream in = CheckCaseFile.class.getResourceAsStream("/check-cases.json")) {
            for (JsonNode c : new ObjectMapper().readTree(in).get("cases")) {
                if (c.get("id").asString().equals(id)) {
                    return c;
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        throw new AssertionError("no check case " + id);
    }

    /** Whether {@code value} matches the case's expected {@code key} within the case's own tolerance. */
    static void assertMatches(JsonNode checkCase, String key, double value) {
        double expected = checkCase.get("expected").get(key).asDouble();
        JsonNode tolerance = checkCase.get("tolerance");
        double abs = tolerance.has("abs") ? tolerance.get("abs").asDouble() : 0.0;
        double rel = tolerance.has("rel") ? tolerance.get("rel").asDouble() : 0.0;
        double error = Math.abs(value - expected);
        assertThat(error <= abs || error <= rel * Math.abs(expected))
                .as("%s.%s: got %.12g, expected %.12g (abs %.1e, rel %.1e); source: %s", checkCase.get("id").asString(),
                        key, value, expected, abs, rel, checkCase.get("source").asString())
                .isTrue();
    }

    static double input(JsonNode checkCase, String key) {
        return checkCase.get("inputs").get(key).asDouble();
    }
}
