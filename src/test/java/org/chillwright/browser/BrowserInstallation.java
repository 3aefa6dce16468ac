package org.chillwright.browser;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.TimeUnit;

/** Where the browser tests find Chromium and its driver, and whether both of them really run there. */
record BrowserInstallation(Path chromium, Path chromedriver) {

    /** Debian's packages {@code chromium} and {@code chromium-driver}. */
    static final BrowserInstallation DEBIAN = new BrowserInstallation(Path.of("/usr/bin/chromium"),
            Path.of("/usr/bin/chromedriver"));

    /** A first start of Chromium on a busy machine can take several seconds; a hang is a failure. */
    private static final long VERSION_WAIT_S = 30;

    /** Why the browser tests cannot run here, or empty when both programs answer {@code --version}. */
    Optional<String> problem() {
        return problemWith(chromium).or(() -> problemWith(chromedriver));
    }

    private static Optional<String> problemWith(Path program) {
        if (!Files.isRegularFile(program) || !Files.isExecutable(program)) {
            return Optional.of(program + " is not installed");
        }
        try {
            var process = new ProcessBuilder(program.toString(), "--version").redirectErrorStream(true)
                    .redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
            if (!process.waitFor(VERSION_WAIT_S, TimeUnit.SECONDS)) {
                process.destroyForcibly();
                return Optional.of(program + " --version did not answer within " + VERSION_WAIT_S + " s");
            }
            return process.exitValue() == 0 ? Optional.empty()
                    : Optional.of(program + " --version failed with exit code " + process.exitValue());
        } catch (IOException e) {
            return Optional.of(program + " does not start: " + e.getMessage());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return Optional.of("interrupted while asking " + program + " for its version");
        }
    }
}
