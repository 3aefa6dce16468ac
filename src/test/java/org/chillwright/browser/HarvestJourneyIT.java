package org.chillwright.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Duration;
import org.chillwright.catalog.CatalogService;
import org.chillwright.harvest.HarvestTestCatalog;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;

/** Heat harvesting in Chromium: case form → ranking → design with its two charts drawn. */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT,
        properties = HarvestTestCatalog.OWN_DATABASE)
class HarvestJourneyIT extends BrowserJourney {

    @Autowired
    CatalogService catalog;

    @Test
    void caseToRankingToDesignWithDrawnCharts() throws Exception {
        HarvestTestCatalog.ensure(catalog);
        var driver = browser.driver();
        var wait = browser.waitUpTo(Duration.ofSeconds(15));
        driver.get(url("/"));
        driver.findElement(By.linkText("Harvest")).click();
        wait.until(ExpectedConditions.presenceOfElementLocated(By.id("hotSource")));

        // a 150 °C source through 0.5 K/W each side, two modules at most, only the harvest test modules
        type("hotSource", "150");
        type("coldSink", "30");
        type("hotResistanceKPerW", "0.5");
        type("coldResistanceKPerW", "0.5");
        type("maxModules", "2");
        type("supplier", HarvestTestCatalog.SUPPLIER);
        new Select(driver.findElement(By.id("objective"))).selectByValue("POWER");
        driver.findElement(By.cssSelector("button.primary[type=submit]")).click();

        wait.until(ExpectedConditions.presenceOfElementLocated(By.cssSelector("table.ranking")));
        assertThat(driver.findElement(By.cssSelector("[role=status]")).getText()).contains("designs evaluated");
        assertThat(driver.findElements(By.cssSelector("table.ranking tbody tr"))).hasSizeGreaterThanOrEqualTo(2);
        // 138 °C open-circuit hot face for one module, 130 °C for two (the node balances at I = 0): above 80 °C
        assertThat(driver.findElement(By.cssSelector("table.infeasible")).getText()).contains("HRV-COOL")
                .contains("HOT_SIDE_ABOVE_LIMIT");
        browser.screenshot("harvest-ranking");

        driver.findElement(By.cssSelector("table.ranking tbody tr:first-child td:nth-child(2) a")).click();
        wait.until(ExpectedConditions.attributeToBe(By.id("charts"), "data-drawn", "true"));
        assertThat(driver.findElements(By.cssSelector("#charts canvas"))).hasSize(2);
        assertThat(driver.getPageSource()).contains("On the load of most power").contains("Hot surfaces");
        ((org.openqa.selenium.JavascriptExecutor) driver).executeScript(
                "document.getElementById('charts').scrollIntoView()");
        browser.screenshot("harvest-design-charts");
    }

    private void type(String id, String value) {
        var field = browser.driver().findElement(By.id(id));
        field.clear();
        field.sendKeys(value);
    }
}
