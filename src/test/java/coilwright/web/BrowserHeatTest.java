package coilwright.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.openqa.selenium.By;
import org.openqa.selenium.Dimension;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;

/**
 * Heat from the home page in real Chromium: the ambient temperature typed in °F on the design form, the hydro match's
 * winding temperature at its matched speed, the wind match's start with the machine's drag, and the current density
 * and winding temperature of rewind options.
 */
@Tag("slow")
class BrowserHeatTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    private static void nav(ChromeDriver d, String path) {
        Browser.follow(d, d.findElement(By.cssSelector("nav.site-nav a[href='" + path + "']")));
    }

    private static void screenshot(ChromeDriver d, String name) {
        try {
            Path dir = Files.createDirectories(Path.of("target", "screenshots"));
            d.manage().window().setSize(new Dimension(1300, 5000));
            Files.write(dir.resolve("heat-" + name + ".png"), d.getScreenshotAs(OutputType.BYTES));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Test
    void an_installer_enters_a_hot_site_in_fahrenheit_and_the_heat_block_solves_from_it() {
        try (Browser browser = Browser.open()) {
            ChromeDriver d = browser.driver();
            d.get(APP.url("/"));
            Browser.follow(d, d.findElement(By.linkText("Start a design")));
            Browser.follow(d, d.findElement(By.cssSelector(".units-switch a[href*='units=imperial']")));
            WebElement ambient = d.findElement(By.id("alternator.ambientTempC"));
            assertEquals("77", ambient.getAttribute("value"), "25 C shown in °F");
            ambient.clear();
            ambient.sendKeys("104");
            Browser.follow(d, "button[type=submit]");
            screenshot(d, "design-results");
            String basis = d.findElement(By.cssSelector("#heat .basis")).getText();
            assertTrue(basis.contains("still air at 40 C"), basis);
        }
    }

    @Test
    void an_ambient_out_of_range_is_named_beside_its_field() {
        try (Browser browser = Browser.open()) {
            ChromeDriver d = browser.driver();
            d.get(APP.url("/"));
            nav(d, "/design/new");
            WebElement ambient = d.findElement(By.id("alternator.ambientTempC"));
            ambient.clear();
            ambient.sendKeys("75");
            Browser.follow(d, "button[type=submit]");
            String error = d.findElement(By.id("alternator.ambientTempC-error")).getText();
            assertTrue(error.contains("-40") && error.contains("60"), error);
        }
    }

    @Test
    void a_hydro_match_shows_the_winding_at_its_matched_speed_and_a_wind_match_its_start_from_rest() {
        try (Browser browser = Browser.open()) {
            ChromeDriver d = browser.driver();
            d.get(APP.url("/"));
            nav(d, "/match/hydro");
            Browser.follow(d, "form[action='/match/hydro'] button[type=submit]");
            screenshot(d, "hydro");
            String winding = d.findElement(By.cssSelector("#hydro-winding .value")).getText();
            assertTrue(winding.matches("(> )?[\\d.]+ °C"), winding);
            assertTrue(d.findElement(By.cssSelector("#hydro-losses .value")).getText().matches("\\d+ W"));

            nav(d, "/match/wind");
            Browser.follow(d, "form[action='/match/wind'] button[type=submit]");
            screenshot(d, "wind");
            String start = d.findElement(By.cssSelector("#charges-from-rest .value")).getText();
            assertTrue(start.matches("\\d+(\\.\\d+)? m/s"), start);
            assertTrue(d.findElement(By.cssSelector("#cut-in .note")).getText().contains("drag"));
        }
    }

    @Test
    void a_rewinder_reads_the_current_density_and_winding_temperature_of_each_option() {
        try (Browser browser = Browser.open()) {
            ChromeDriver d = browser.driver();
            d.get(APP.url("/"));
            nav(d, "/rewind");
            Browser.follow(d, "form[action='/rewind'] button[type=submit]");
            screenshot(d, "rewind");
            WebElement first = d.findElement(By.cssSelector("section.rewind-option .rewind-heat"));
            assertTrue(first.findElement(By.cssSelector(".density")).getText().matches("[\\d.]+"), first.getText());
            assertFalse(first.findElement(By.cssSelector(".winding")).getText().isBlank());
        }
    }
}
