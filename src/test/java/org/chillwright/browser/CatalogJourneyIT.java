package org.chillwright.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.UUID;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.springframework.boot.test.context.SpringBootTest;

/**
 * An engineer adds a module through the form and sees its derived parameters and charts drawn, then
 * imports a CSV with one bad row and sees the row-level error with the catalog unchanged.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class CatalogJourneyIT extends BrowserJourney {

    private static final Duration PATIENCE = Duration.ofSeconds(15);

    @TempDir
    Path files;

    private static void type(WebDriver driver, String id, String text) {
        var input = driver.findElement(By.id(id));
        input.clear();
        input.sendKeys(text);
    }

    @Test
    void addAModuleSeeItsDerivedValuesAndChartsThenImportABadFile() throws Exception {
        var driver = browser.driver();
        String supplier = "Browser Test Thermal " + UUID.randomUUID().toString().substring(0, 8);
        signIn("admin", "admin-test-password");

        driver.get(url("/catalog"));
        driver.findElement(By.linkText("Add by ratings")).click();
        type(driver, "supplier", supplier);
        type(driver, "partNumber", "BTT-127-06");
        type(driver, "imaxA", "6");
        type(driver, "vmaxV", "15.4");
        type(driver, "qmaxW", "56");
        type(driver, "dtmaxK", "68");
        type(driver, "hotSideC", "25");
        type(driver, "prices", "1:12.40;100:9.85");
        type(driver, "currency", "EUR");
        driver.findElement(By.cssSelector(".module-form button[type=submit]")).click();

        browser.waitUpTo(PATIENCE).until(ExpectedConditions.presenceOfElementLocated(By.id("figure-of-merit")));
        assertThat(driver.findElement(By.tagName("h1")).getText()).contains("BTT-127-06");
        assertThat(driver.findElement(By.id("seebeck")).getText()).endsWith("V/K");
        assertThat(driver.findElement(By.id("figure-of-merit")).getText()).contains("1/K");
        browser.waitUpTo(PATIENCE).until(ExpectedConditions.presenceOfElementLocated(By.cssSelector("#qc-chart canvas")));
        assertThat(driver.findElements(By.cssSelector("#cop-chart canvas"))).isNotEmpty();
        browser.screenshot("catalog-module");

        Path csv = files.resolve("one-bad-row.csv");
        Files.writeString(csv, "supplier,partNumber,imaxA,vmaxV,qmaxW,dtmaxK,hotSideC\n"
                + supplier + ",BTT-071-03,3.1,8.6,15.3,69,25\n"
                + supplier + ",BTT-071-04,\"4,2\",8.6,20.1,69,25\n", StandardCharsets.UTF_8);
        driver.get(url("/catalog/import"));
        driver.findElement(By.id("file")).sendKeys(csv.toAbsolutePath().toString());
        driver.findElement(By.cssSelector("form[enctype] button[type=submit]")).click();

        browser.waitUpTo(PATIENCE).until(ExpectedConditions.presenceOfElementLocated(By.id("import-errors")));
        var cells = driver.findElements(By.cssSelector("#import-errors tbody tr:first-child td"));
        assertThat(cells).extracting(e -> e.getText()).startsWith("3", "imaxA");
        assertThat(driver.findElement(By.cssSelector("[role=alert]")).getText()).contains("nothing was stored");
        browser.screenshot("catalog-import-error");

        driver.get(url("/catalog?q=" + java.net.URLEncoder.encode(supplier, StandardCharsets.UTF_8)));
        assertThat(driver.findElements(By.cssSelector("table.catalog tbody tr"))).singleElement()
                .satisfies(row -> assertThat(row.getText()).contains("BTT-127-06"));
    }
}
