package org.chillwright;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Citations live in the repository: the code, its tests and its documents name published sources (author,
 * title, year, equation), never a note outside the checkout that a reader of the repository cannot open.
 */
class SourcesStayInTheRepositoryTest {

    /** Names of notes kept beside the checkout, written in pieces so that this file does not match itself. */
    private static final List<String> OUTSIDE_NOTES = List.of("physics" + ".md", "DESIGN" + ".md", "STYLE" + ".md",
            "stack" + ".md", "anchors" + ".md", "../" + "shared", "/work/" + "shared");

    private static final List<String> TEXT = List.of(".java", ".html", ".js", ".css", ".properties", ".sql", ".md",
            ".json", ".csv", ".yml", ".sh");

    @Test
    void noFileCitesANoteOutsideTheRepository() throws IOException {
        try (Stream<Path> files = Stream.of(Path.of("src"), Path.of("docs"), Path.of("scripts"))
                .filter(Files::isDirectory).flatMap(SourcesStayInTheRepositoryTest::walk)) {
            var offenders = Stream.concat(files, Stream.of(Path.of("README.md"), Path.of("DEVELOPERS.md")))
                    .filter(Files::isRegularFile)
                    .filter(p -> TEXT.stream().anyMatch(ext -> p.toString().endsWith(ext)))
                    .filter(SourcesStayInTheRepositoryTest::citesAnOutsideNote)
                    .map(Path::toString).toList();
            assertThat(offenders).as("files citing a note outside the repository").isEmpty();
        }
    }

    private static Stream<Path> walk(Path root) {
        try {
            return Files.walk(root).toList().stream();
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }

    private static boolean citesAnOutsideNote(Path file) {
        try {
            String text = Files.readString(file, StandardCharsets.UTF_8);
            return OUTSIDE_NOTES.stream().anyMatch(text::contains);
        } catch (IOException e) {
            return false; // not UTF-8 text: nothing to cite
        }
    }
}
