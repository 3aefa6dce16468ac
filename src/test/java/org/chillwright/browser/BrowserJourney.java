package org.chillwright.browser;

import java.time.Duration;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.extension.ExtendWith;
import org.openqa.selenium.By;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.springframework.boot.test.web.server.LocalServerPort;

/**
 * What every real-browser test shares: one headless Chromium per test class, the port of the
 * application under test, and the steps many journeys take (signing in and out, moving a list entry).
 * Subclasses carry their own {@code @SpringBootTest(webEnvironment = RANDOM_PORT)}.
 * Without a working Chromium they are skipped with a notice, or fail under CI ({@link BrowserCondition}).
 */
@ExtendWith(BrowserCondition.class)
abstract class BrowserJourney {

    protected static final Duration PAGE_LOAD = Duration.ofSeconds(15);

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

    /** Signs in through the login page and waits until the header names the user. */
    protected void signIn(String username, String password) {
        var driver = browser.driver();
        driver.get(url("/login"));
        driver.findElement(By.id("username")).sendKeys(username);
        driver.findElement(By.id("password")).sendKeys(password);
        driver.findElement(By.cssSelector("main button[type=submit]")).click();
        browser.waitUpTo(PAGE_LOAD).until(ExpectedConditions.textToBePresentInElementLocated(By.cssSelector(".who"),
                username));
    }

    /** Signs out with the header's button and waits for the login page. */
    protected void signOut() {
        browser.driver().findElement(By.cssSelector(".who button")).click();
        browser.waitUpTo(PAGE_LOAD).until(ExpectedConditions.urlContains("/login"));
    }

    /** On a list page (already open): proposes a catalog module and returns the id of the new entry. */
    protected String propose(long moduleId, String note) {
        var driver = browser.driver();
        driver.findElement(By.id("moduleId")).sendKeys(String.valueOf(moduleId));
        driver.findElement(By.id("note")).sendKeys(note);
        driver.findElement(By.cssSelector("section[aria-labelledby=propose] button")).click();
        var row = browser.waitUpTo(PAGE_LOAD).until(ExpectedConditions.presenceOfElementLocated(
                By.cssSelector("tr[id^=entry-]")));
        return row.getAttribute("id").substring("entry-".length());
    }

    /** On a list page: chooses where an entry moves, gives the reason and submits the entry's form. */
    protected void submitMove(String entryId, String to, String reason) {
        var driver = browser.driver();
        new Select(driver.findElement(By.id("to-" + entryId))).selectByValue(to);
        driver.findElement(By.id("reason-" + entryId)).sendKeys(reason);
        driver.findElement(By.cssSelector("#entry-" + entryId + " form.transition button")).click();
    }

    /** Like {@link #submitMove}, then waits until the entry shows its new state. */
    protected void move(String entryId, String to, String reason) {
        submitMove(entryId, to, reason);
        browser.waitUpTo(PAGE_LOAD).until(ExpectedConditions.textToBePresentInElementLocated(
                By.cssSelector("#entry-" + entryId + " .state"), to));
    }
}
