package coilwright.web;

import java.io.File;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Comparator;
import java.util.stream.Stream;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;

/**
 * Headless Debian Chromium for page tests, driven through the system chromedriver so Selenium Manager
 * never downloads anything. Each browser has a fresh temporary profile, removed on {@link #close()}.
 * <pre>{@code try (Browser b = Browser.open()) { b.driver().get(app.url("/")); ... }}</pre>
 */
public final class Browser implements AutoCloseable {
    public static final String CHROMIUM = "/usr/bin/chromium";
    public static final String CHROMEDRIVER = "/usr/bin/chromedriver";

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
