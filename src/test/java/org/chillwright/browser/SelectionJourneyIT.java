package org.chillwright.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.time.Duration;
import org.chillwright.catalog.CatalogService;
import org.chillwright.selection.TestCatalog;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;

/** An engineer's whole journey in Chromium: case → ranking → candidate with a drawn chart → compare → PDF. */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class SelectionJourneyIT extends BrowserJourney {

    @Autowired
    CatalogService catalog;

    @Test
    void caseToRankingToCandidateToCompareToReport() throws Exception {
        TestCatalog.ensure(catalog);
        var driver = browser.driver();
        var wait = browser.waitUpTo(Duration.ofSeconds(15));
        driver.get(url("/cases/new"));

        // the check case S10 set-up, typed in: 10 W at 5 °C, 25 °C ambient, 0.3 K/W sink
        type("setPointTemperature", "5");
        type("ambientTemperature", "25");
        type("activeLoad", "10");
        type("sinkResistanceKPerW", "0.3");
        type("coldInterfaceKPerW", "0.1");
        type("hotInterfaceKPerW", "0.05");
        type("relativeHumidityPct", "60");
        type("maxModules", "2");
        driver.findElement(By.cssSelector("button.primary[type=submit]")).click();

        wait.until(ExpectedConditions.presenceOfElementLocated(By.cssSelector("table.ranking")));
        assertThat(driver.findElement(By.cssSelector("[role=status]")).getText()).contains("designs evaluated");
        assertThat(driver.findElements(By.cssSelector("table.ranking tbody tr"))).hasSizeGreaterThanOrEqualTo(2);
        assertThat(driver.findElement(By.cssSelector("table.infeasible")).getText()).contains("TMA-TINY");
        browser.screenshot("ranking");

        // open the best candidate and wait for its three charts to be drawn
        driver.findElement(By.cssSelector("table.ranking tbody tr:first-child td:nth-child(3) a")).click();
        wait.until(ExpectedConditions.attributeToBe(By.id("charts"), "data-drawn", "true"));
        assertThat(driver.findElements(By.cssSelector("#charts canvas"))).hasSizeGreaterThanOrEqualTo(3);
        assertThat(driver.findElement(By.tagName("h1")).getText()).contains("TMA-1");
        assertThat(driver.getPageSource()).contains("Operating point").contains("Dew point");
        browser.screenshot("candidate");
        ((org.openqa.selenium.JavascriptExecutor) driver).executeScript(
                "document.getElementById('charts').scrollIntoView()");
        browser.screenshot("candidate-charts");

        // back to the ranking, tick two designs and compare them
        driver.navigate().back();
        wait.until(ExpectedConditions.presenceOfElementLocated(By.cssSelector("table.ranking")));
        driver.findElement(By.id("cmp-1")).click();
        driver.findElement(By.id("cmp-2")).click();
        driver.findElement(By.cssSelector("#compare-form button[type=submit]")).click();
        wait.until(ExpectedConditions.presenceOfElementLocated(By.cssSelector("table.compare")));
        assertThat(driver.findElement(By.cssSelector("table.compare")).getText())
                .contains("Second source").contains("Lead time").contains("COP");
        browser.screenshot("compare");

        // the PDF report link of the ranking downloads a PDF
        driver.navigate().back();
        wait.until(ExpectedConditions.presenceOfElementLocated(By.linkText("PDF report")));
        String href = driver.findElement(By.linkText("PDF report")).getAttribute("href");
        var response = HttpClient.newHttpClient().send(HttpRequest.newBuilder(URI.create(href)).build(),
                HttpResponse.BodyHandlers.ofByteArray());
        assertThat(response.statusCode()).isEqualTo(200);
        assertThat(response.headers().firstValue("Content-Type")).hasValueSatisfying(t -> assertThat(t).contains("pdf"));
        assertThat(new String(response.body(), 0, 5, java.nio.charset.StandardCharsets.US_ASCII)).isEqualTo("%PDF-");
    }

    private void type(String id, String value) {
        var field = browser.driver().findElement(By.id(id));
        field.clear();
        field.sendKeys(value);
    }
}
