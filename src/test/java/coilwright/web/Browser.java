package coilwright.web;

import java.io.File;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Comparator;
import java.util.stream.Stream;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * Headless Debian Chromium for page tests, driven through the system chromedriver so Selenium Manager
 * never downloads anything. Each browser has a fresh temporary profile, removed on {@link #close()}.
 * <pre>{@code try (Browser b = Browser.open()) { b.driver().get(app.url("/")); ... }}</pre>
 */
public final class Browser implements AutoCloseable {
    public static final String CHROMIUM = "/usr/bin/chromium";
    public static final String CHROMEDRIVER = "/usr/bin/chromedriver";

    private static final Duration NAVIGATION_TIMEOUT = Duration.ofSeconds(60);

    private final ChromeDriver driver;
    private final Path profile;

    private Browser(ChromeDriver driver, Path profile) {
        this.driver = driver;
        this.profile = profile;
    }

    /** True when Chromium and its driver are installed (CI installs them via .ci/run). */
    public static boolean available() {
        return new File(CHROMIUM).canExecute() && new File(CHROMEDRIVER).canExecute();
    }

    public static Browser open() {
        try {
            Path profile = Files.createTempDirectory("coilwright-chromium-");
            ChromeOptions options = new ChromeOptions();
            options.setBinary(CHROMIUM);
            options.addArguments("--headless", "--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage",
                    "--disable-quic", "--no-first-run", "--disable-background-networking",
                    "--disable-component-update", "--disable-sync", "--user-data-dir=" + profile);
            ChromeDriverService service = new ChromeDriverService.Builder()
                    .usingDriverExecutable(new File(CHROMEDRIVER))
                    .usingAnyFreePort()
                    .build();
            ChromeDriver driver = new ChromeDriver(service, options);
            driver.manage().timeouts().pageLoadTimeout(Duration.ofSeconds(30));
            return new Browser(driver, profile);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * Clicks a link or submit button and returns once the page it loads has replaced the current one and finished
     * loading. A bare {@code click()} on a form's button may return before the browser has left the old page, and
     * the next lookup then finds (or, a moment later, loses) an element of the page being replaced.
     */
    public static void follow(WebDriver d, WebElement target) {
        WebElement oldPage = d.findElement(By.tagName("html"));
        ((JavascriptExecutor) d).executeScript("arguments[0].scrollIntoView({block: 'center'});", target);
        target.click();
        WebDriverWait wait = new WebDriverWait(d, NAVIGATION_TIMEOUT);
        wait.until(ExpectedConditions.stalenessOf(oldPage));
        wait.until(x -> "complete".equals(((JavascriptExecutor) x).executeScript("return document.readyState")));
    }

    /** {@link #follow(WebDriver, WebElement)} for the first element the CSS selector finds. */
    public static void follow(WebDriver d, String css) {
        follow(d, d.findElement(By.cssSelector(css)));
    }

    /** Replaces what the field with this id holds by the text, as a user types it. */
    public static void type(WebDriver d, String fieldId, String text) {
        WebElement input = d.findElement(By.id(fieldId));
        input.clear();
        input.sendKeys(text);
    }

    public ChromeDriver driver() {
        return driver;
    }

    @Override
    public void close() {
        try {
            driver.quit();
        } finally {
            try (Stream<Path> files = Files.walk(profile)) {
                files.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }
}
