package org.chillwright.browser;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.TakesScreenshot;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * Headless Debian Chromium driven by Debian's chromedriver, given explicitly so that Selenium
 * Manager never tries the network. Each browser gets a fresh profile directory.
 */
public final class Browser implements AutoCloseable {

    private final ChromeDriver driver;
    private final Path profile;

    public Browser() throws IOException {
        profile = Files.createTempDirectory("chillwright-chromium");
        var options = new ChromeOptions();
        options.setBinary(BrowserInstallation.DEBIAN.chromium().toFile());
        options.addArguments("--headless=new", "--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage",
                "--disable-background-networking", "--disable-component-update", "--disable-sync",
                "--disable-quic", "--no-first-run", "--window-size=1280,1000", "--user-data-dir=" + profile);
        var service = new ChromeDriverService.Builder()
                .usingDriverExecutable(BrowserInstallation.DEBIAN.chromedriver().toFile()).usingAnyFreePort().build();
        driver = new ChromeDriver(service, options);
        driver.manage().timeouts().implicitlyWait(Duration.ofSeconds(2));
    }

    public WebDriver driver() {
        return driver;
    }

    public WebDriverWait waitUpTo(Duration duration) {
        return new WebDriverWait(driver, duration);
    }

    /** Keeps a picture of the page under target/screenshots for a person to look at. */
    public Path screenshot(String name) throws IOException {
        Path dir = Path.of("target", "screenshots");
        Files.createDirectories(dir);
        Path file = dir.resolve(name + ".png");
        Files.write(file, ((TakesScreenshot) driver).getScreenshotAs(OutputType.BYTES));
        return file;
    }

    @Override
    public void close() {
        driver.quit();
    }
}
