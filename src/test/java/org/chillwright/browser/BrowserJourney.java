package org.chillwright.browser;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.extension.ExtendWith;
import org.springframework.boot.test.web.server.LocalServerPort;

/**
 * What every real-browser test shares: one headless Chromium per test class and the port of the
 * application under test. Subclasses carry their own {@code @SpringBootTest(webEnvironment = RANDOM_PORT)}.
 * Without a working Chromium they are skipped with a notice, or fail under CI ({@link BrowserCondition}).
 */
@ExtendWith(BrowserCondition.class)
abstract class BrowserJourney {

    protected static Browser browser;

    @LocalServerPort
    protected int port;

    @BeforeAll
    static void openBrowser() throws Exception {
        browser = new Browser();
    }

    @AfterAll
    static void closeBrowser() {
        browser.close();
    }

    /** The address of a path on the application under test. */
    protected String url(String path) {
        return "http://localhost:" + port + path;
    }
}
