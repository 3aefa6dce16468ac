package org.chillwright.browser;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.concurrent.atomic.AtomicBoolean;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** When the real-browser tests run, when they are skipped with a notice, and when they fail the build. */
class BrowserConditionTest {

    @TempDir
    Path dir;

    private final ByteArrayOutputStream printed = new ByteArrayOutputStream();
    private final AtomicBoolean noticePrinted = new AtomicBoolean();

    private BrowserCondition condition(BrowserInstallation installation, boolean ci) {
        return new BrowserCondition(installation, ci, noticePrinted,
                new PrintStream(printed, true, StandardCharsets.UTF_8));
    }

    private Path program(String name, int exitCode) throws IOException {
        Path file = Files.writeString(dir.resolve(name), "#!/bin/sh\nexit " + exitCode + "\n");
        Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rwxr-xr-x"));
        return file;
    }

    private String printedText() {
        return printed.toString(StandardCharsets.UTF_8);
    }

    @Test
    void runsWhenBothProgramsAnswerTheirVersion() throws IOException {
        var installation = new BrowserInstallation(program("chromium", 0), program("chromedriver", 0));

        var result = condition(installation, false).evaluateExecutionCondition(null);

        assertThat(result.isDisabled()).isFalse();
        assertThat(printedText()).isEmpty();
    }

    @Test
    void withoutChromiumTheTestsAreSkippedAndOneLineSaysWhatToInstall() throws IOException {
        var installation = new BrowserInstallation(dir.resolve("no-chromium"), program("chromedriver", 0));

        var first = condition(installation, false).evaluateExecutionCondition(null);
        var second = condition(installation, false).evaluateExecutionCondition(null);

        assertThat(first.isDisabled()).isTrue();
        assertThat(second.isDisabled()).isTrue();
        assertThat(first.getReason()).hasValueSatisfying(reason -> assertThat(reason)
                .contains(dir.resolve("no-chromium") + " is not installed")
                .contains("apt-get install chromium chromium-driver"));
        assertThat(printedText().lines()).singleElement().asString()
                .startsWith("Browser tests skipped: ").contains("apt-get install chromium chromium-driver");
    }

    @Test
    void aProgramMaskedByDevNullCountsAsNotInstalled() throws IOException {
        var installation = new BrowserInstallation(program("chromium", 0), Path.of("/dev/null"));

        var result = condition(installation, false).evaluateExecutionCondition(null);

        assertThat(result.getReason()).hasValueSatisfying(reason -> assertThat(reason)
                .contains("/dev/null is not installed"));
    }

    @Test
    void aDriverThatFailsToRunSkipsTheTestsWithItsExitCode() throws IOException {
        var installation = new BrowserInstallation(program("chromium", 0), program("chromedriver", 3));

        var result = condition(installation, false).evaluateExecutionCondition(null);

        assertThat(result.isDisabled()).isTrue();
        assertThat(result.getReason()).hasValueSatisfying(reason -> assertThat(reason)
                .contains("chromedriver --version failed with exit code 3"));
    }

    @Test
    void underCiAMissingBrowserFailsInsteadOfSkipping() {
        var installation = new BrowserInstallation(dir.resolve("no-chromium"), dir.resolve("no-chromedriver"));

        assertThatThrownBy(() -> condition(installation, true).evaluateExecutionCondition(null))
                .isInstanceOf(IllegalStateException.class)
                .hasMessageContaining("CI=true")
                .hasMessageContaining("apt-get install chromium chromium-driver");
        assertThat(printedText()).isEmpty();
    }
}
