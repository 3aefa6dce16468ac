package org.chillwright.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Duration;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.springframework.boot.test.context.SpringBootTest;

/** A newcomer opens the home page in a real browser and signs in through our login page. */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class HomeAndSignInIT extends BrowserJourney {

    @Test
    void homePageExplainsTheToolAndSignInWorks() throws Exception {
        var driver = browser.driver();
        driver.get(url("/"));
        assertThat(driver.findElement(By.tagName("h1")).getText()).contains("thermoelectric cooler");
        assertThat(driver.findElement(By.cssSelector(".caution")).getText()).contains("heat sink");
        browser.screenshot("home");

        driver.findElement(By.linkText("Sign in")).click();
        driver.findElement(By.id("username")).sendKeys("admin");
        driver.findElement(By.id("password")).sendKeys("admin-test-password");
        driver.findElement(By.cssSelector("button[type=submit]")).click();

        browser.waitUpTo(Duration.ofSeconds(10)).until(ExpectedConditions.textToBePresentInElementLocated(
                By.cssSelector(".who"), "admin"));
        assertThat(driver.findElement(By.cssSelector(".who")).getText()).contains("Sign out");
    }

    @Test
    void wrongPasswordShowsAPlainMessage() {
        var driver = browser.driver();
        driver.manage().deleteAllCookies();
        driver.get(url("/login"));
        driver.findElement(By.id("username")).sendKeys("admin");
        driver.findElement(By.id("password")).sendKeys("wrong-password");
        driver.findElement(By.cssSelector("button[type=submit]")).click();
        assertThat(driver.findElement(By.cssSelector("[role=alert]")).getText()).contains("did not match");
    }
}
