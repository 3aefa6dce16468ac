package org.chillwright.openapi;

import java.io.IOException;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import org.junit.jupiter.api.extension.ConditionEvaluationResult;
import org.junit.jupiter.api.extension.ExecutionCondition;
import org.junit.jupiter.api.extension.ExtensionContext;

/**
 * Runs the tests of docs/examples only where bash, curl and python3 run. Elsewhere they are skipped with one
 * line saying what to install; under CI=true a missing tool fails them instead, so CI never passes without
 * running the examples (as {@code BrowserCondition} does for the browser tests).
 */
public final class ExampleToolsCondition implements ExecutionCondition {

    static final String INSTALL = "apt-get install bash curl python3";
    private static final List<List<String>> PROBES = List.of(List.of("bash", "--version"), List.of("curl", "--version"),
            List.of("python3", "--version"));
    private static final AtomicBoolean NOTICE_PRINTED = new AtomicBoolean();
    private static volatile Optional<String> missing;

    @Override
    public ConditionEvaluationResult evaluateExecutionCondition(ExtensionContext context) {
        if (missing == null) {
            missing = PROBES.stream().filter(probe -> !runs(probe)).map(probe -> probe.get(0)).findFirst();
        }
        if (missing.isEmpty()) {
            return ConditionEvaluationResult.enabled("bash, curl and python3 run");
        }
        if ("true".equalsIgnoreCase(System.getenv("CI"))) {
            throw new IllegalStateException("CI=true and the examples in docs/examples cannot run: " + missing.get()
                    + " is missing. Install it with: " + INSTALL);
        }
        String notice = "Example scripts not run: " + missing.get() + " is missing. To run them: " + INSTALL;
        if (NOTICE_PRINTED.compareAndSet(false, true)) {
            System.out.println(notice);
        }
        return ConditionEvaluationResult.disabled(notice);
    }

    private static boolean runs(List<String> command) {
        try {
            var process = new ProcessBuilder(command).redirectErrorStream(true)
                    .redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
            return process.waitFor(20, TimeUnit.SECONDS) && process.exitValue() == 0;
        } catch (IOException e) {
            return false;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        }
    }
}
