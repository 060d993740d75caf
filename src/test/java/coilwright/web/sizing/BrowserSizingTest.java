package coilwright.web.sizing;

import static coilwright.web.Browser.type;

import coilwright.web.Browser;
import coilwright.web.TestApp;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.support.ui.WebDriverWait;

import java.time.Duration;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** An installer sizes an alternator in real headless Chromium and carries the best design to the design page. */
@Tag("slow")
class BrowserSizingTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    /** 16 poles, 16 to 24 turns, AWG 13 only: a search that ends in seconds. */
    private static void narrowTheSearch(ChromeDriver d) {
        type(d, "minPoles", "16");
        type(d, "maxPoles", "16");
        type(d, "minTurns", "16");
        type(d, "maxTurns", "24");
        type(d, "thickestAwg", "13");
        type(d, "thinnestAwg", "13");
    }

    @Test
    void an_installer_finds_designs_sorts_them_and_opens_the_first_on_the_design_page() {
        try (Browser browser = Browser.open()) {
            ChromeDriver d = browser.driver();
            d.get(APP.url("/"));
            Browser.follow(d, d.findElement(By.linkText("Size an alternator")));
            type(d, "rotorDiameterM", "3");
            type(d, "batteryV", "24");
            narrowTheSearch(d);
            d.findElement(By.cssSelector("#sizing-form button[type=submit]")).click();
            // inline, or through the progress page that refreshes itself until the designs are ready
            new WebDriverWait(d, Duration.ofMinutes(4)).until(x -> !x.findElements(By.id("designs")).isEmpty());
            List<WebElement> rows = d.findElements(By.cssSelector("#designs tbody tr.design"));
            assertFalse(rows.isEmpty());

            d.findElement(By.cssSelector("#designs th[data-key=turns] button.sort")).click();
            List<Integer> turns = d.findElements(By.cssSelector("#designs tbody tr.design")).stream()
                    .map(r -> Integer.parseInt(r.getAttribute("data-turns"))).toList();
            assertEquals(turns.stream().sorted().toList(), turns, "sorted by turns, fewest first");
            d.findElement(By.cssSelector("#designs th[data-key=rank] button.sort")).click();
            WebElement first = d.findElement(By.cssSelector("#designs tbody tr.design"));
            assertEquals("1", first.getAttribute("data-rank"), "back to best first");

            String tableCutIn = first.findElement(By.cssSelector("td.cut-in span")).getText();
            Browser.follow(d, first.findElement(By.cssSelector("form.open-design button")));
            String cutIn = d.findElement(By.cssSelector("#cut-in .value")).getText();
            assertTrue(cutIn.matches("\\d+ rpm"), cutIn);
            assertEquals(tableCutIn, cutIn, "the design page finds the cut-in the sizing found");
        }
    }

    /** Imperial entry, a winding-temperature limit, a hydro site ranked by energy, and a live progress bar. */
    @Test
    void an_installer_sizes_in_imperial_units_limits_the_heat_ranks_a_stream_and_watches_a_long_search() {
        try (Browser browser = Browser.open()) {
            ChromeDriver d = browser.driver();
            d.get(APP.url("/"));
            Browser.follow(d, d.findElement(By.linkText("Size an alternator")));
            Browser.follow(d, d.findElement(By.linkText("imperial")));
            assertEquals("ft", d.findElement(By.cssSelector("#rotorDiameterM ~ .unit")).getText());
            type(d, "rotorDiameterM", "10");
            type(d, "meanWindMs", "11");
            type(d, "ratedWindMs", "22");
            type(d, "cutInWindMs", "8");
            narrowTheSearch(d);
            type(d, "maxWindingTempC", "320");
            Browser.follow(d, d.findElement(By.cssSelector("#sizing-form button[type=submit]")));
            new WebDriverWait(d, Duration.ofMinutes(4)).until(x -> !x.findElements(By.id("designs")).isEmpty());
            assertFalse(d.findElements(By.cssSelector("#limits li[data-limit=windingTemperature]")).isEmpty());
            WebElement first = d.findElement(By.cssSelector("#designs tbody tr.design"));
            assertTrue(first.findElement(By.cssSelector("td.hot-spot")).getText().matches("\\d+ °F"),
                    first.findElement(By.cssSelector("td.hot-spot")).getText());
            assertTrue(Double.parseDouble(first.getAttribute("data-hot-spot")) <= (320 - 32) / 1.8 + 1e-9);

            d.get(APP.url("/sizing?units=si"));
            new org.openqa.selenium.support.ui.Select(d.findElement(By.id("driveType"))).selectByValue("HYDRO");
            narrowTheSearch(d);
            Browser.follow(d, d.findElement(By.cssSelector("#sizing-form button[type=submit]")));
            new WebDriverWait(d, Duration.ofMinutes(4)).until(x -> !x.findElements(By.id("designs")).isEmpty());
            List<WebElement> rows = d.findElements(By.cssSelector("#designs tbody tr.design"));
            assertFalse(rows.isEmpty());
            assertTrue(Double.parseDouble(rows.get(0).getAttribute("data-energy")) > 0, "ranked by energy");

            d.get(APP.url("/sizing"));
            type(d, "discDiameterMm", "360, 390, 420");
            type(d, "coilThicknessMm", "13, 18");
            type(d, "minPoles", "12");
            type(d, "maxPoles", "20");
            type(d, "minTurns", "10");
            type(d, "maxTurns", "120");
            type(d, "thinnestAwg", "20");
            type(d, "maxStrands", "3");
            Browser.follow(d, d.findElement(By.cssSelector("#sizing-form button[type=submit]")));
            // the script asks for the live page and moves the bar from the events
            new WebDriverWait(d, Duration.ofSeconds(60)).until(x -> x.getCurrentUrl().endsWith("?live=1")
                    && "true".equals(x.findElement(By.id("progress")).getAttribute("data-live")));
            Browser.follow(d, d.findElement(By.cssSelector("#progress form button")));
            new WebDriverWait(d, Duration.ofSeconds(60)).until(x -> !x.findElements(By.id("stopped")).isEmpty());
        }
    }
}
