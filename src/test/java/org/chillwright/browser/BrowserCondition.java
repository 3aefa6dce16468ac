package org.chillwright.browser;

import java.io.PrintStream;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicBoolean;
import org.junit.jupiter.api.extension.ConditionEvaluationResult;
import org.junit.jupiter.api.extension.ExecutionCondition;
import org.junit.jupiter.api.extension.ExtensionContext;

/**
 * Runs the real-browser tests only where Chromium and chromedriver work. Elsewhere they are skipped and
 * the build prints one line, once per test run, saying what to install. Under CI=true a missing browser
 * fails them instead, so CI never passes without running them.
 */
public final class BrowserCondition implements ExecutionCondition {

    static final String INSTALL = "apt-get install chromium chromium-driver";

    private static final AtomicBoolean NOTICE_PRINTED = new AtomicBoolean();
    /** Each installation is asked for its version once per JVM, not once per test class. */
    private static final Map<BrowserInstallation, Optional<String>> PROBED = new ConcurrentHashMap<>();

    private final BrowserInstallation installation;
    private final boolean ci;
    private final AtomicBoolean noticePrinted;
    private final PrintStream out;

    public BrowserCondition() {
        this(BrowserInstallation.DEBIAN, "true".equalsIgnoreCase(System.getenv("CI")), NOTICE_PRINTED, System.out);
    }

    BrowserCondition(BrowserInstallation installation, boolean ci, AtomicBoolean noticePrinted, PrintStream out) {
        this.installation = installation;
        this.ci = ci;
        this.noticePrinted = noticePrinted;
        this.out = out;
    }

    @Override
    public ConditionEvaluationResult evaluateExecutionCondition(ExtensionContext context) {
        var problem = PROBED.computeIfAbsent(installation, BrowserInstallation::problem);
        if (problem.isEmpty()) {
            return ConditionEvaluationResult.enabled("Chromium and chromedriver run");
        }
        if (ci) {
            throw new IllegalStateException("CI=true and the browser tests cannot run: " + problem.get()
                    + ". Install them with: " + INSTALL);
        }
        String notice = "Browser tests skipped: " + problem.get() + ". To run them, install Chromium: " + INSTALL;
        if (noticePrinted.compareAndSet(false, true)) {
            out.println(notice);
        }
        return ConditionEvaluationResult.disabled(notice);
    }
}
