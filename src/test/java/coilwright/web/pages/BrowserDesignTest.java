package coilwright.web.pages;

import static coilwright.web.Browser.type;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.web.Browser;
import coilwright.web.TestApp;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.openqa.selenium.By;
import org.openqa.selenium.Dimension;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.support.ui.Select;
import org.junit.jupiter.api.Tag;

/**
 * A person entering a design in real headless Chromium: choosing from the selects, typing numbers, pressing
 * Calculate, and reading the result. Screenshots go to {@code target/screenshots/} for a look by eye.
 */
@Tag("slow")
class BrowserDesignTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    private static void choose(ChromeDriver d, String field, String visibleText) {
        new Select(d.findElement(By.id(field))).selectByVisibleText(visibleText);
    }

    private static void screenshot(ChromeDriver d, String name) {
        try {
            Path dir = Files.createDirectories(Path.of("target", "screenshots"));
            Files.write(dir.resolve(name + ".png"), d.getScreenshotAs(OutputType.BYTES));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void elementShot(ChromeDriver d, String css, String name) {
        try {
            Path dir = Files.createDirectories(Path.of("target", "screenshots"));
            Files.write(dir.resolve(name + ".png"), d.findElement(By.cssSelector(css)).getScreenshotAs(OutputType.BYTES));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Test
    void a_builder_enters_an_axial_machine_and_reads_its_cut_in_speed_and_a_caution() {
        try (Browser browser = Browser.open()) {
            ChromeDriver d = browser.driver();
            d.get(APP.url("/"));
            Browser.follow(d, d.findElement(By.linkText("Start a design")));
            choose(d, "topology", "Axial flux, dual rotor (air-cored coils)");
            type(d, "alternator.turnsPerCoil", "45");
            choose(d, "alternator.rotor.gradeName", "N45");
            type(d, "alternator.rotor.magnetThicknessM", "12");
            choose(d, "loadType", "Battery through a diode bridge");
            type(d, "load.battery.cells", "12");
            Browser.follow(d, "button[type=submit]");
            d.manage().window().setSize(new Dimension(1300, 6000));
            screenshot(d, "results-battery");
            elementShot(d, "main", "results-battery-main");
            String cutIn = d.findElement(By.cssSelector("#cut-in .value")).getText();
            assertTrue(cutIn.matches("\\d+ rpm"), cutIn);
            assertTrue(d.findElements(By.cssSelector(".caution .caution-title")).stream()
                    .anyMatch(e -> e.getText().contains("DC-rated fusing")), "the fusing caution is shown");
        }
    }

    @Test
    void a_builder_switches_to_a_radial_machine_on_resistors_and_sees_charts_and_the_winding() {
        try (Browser browser = Browser.open()) {
            ChromeDriver d = browser.driver();
            d.get(APP.url("/design/new"));
            choose(d, "topology", "Radial flux, inner rotor (slotted stator)");
            choose(d, "loadType", "Resistor bank (star)");
            type(d, "alternator.turnsPerCoil", "20");
            type(d, "alternator.wire.awg", "18");
            Browser.follow(d, "button[type=submit]");
            d.manage().window().setSize(new Dimension(1300, 6000));
            screenshot(d, "results-resistor");
            elementShot(d, ".summary", "results-resistor-summary");
            elementShot(d, ".charts", "results-resistor-charts");
            elementShot(d, "section.winding", "results-resistor-winding");
            assertEquals("none", d.findElement(By.cssSelector("#cut-in .value")).getText());
            assertEquals(3, d.findElements(By.cssSelector(".charts .chart svg")).size(), "the speed-range charts");
            WebElement unrolled = d.findElement(By.cssSelector("figure.unrolled img"));
            new org.openqa.selenium.interactions.Actions(d).scrollToElement(unrolled).perform();
            new org.openqa.selenium.support.ui.WebDriverWait(d, java.time.Duration.ofSeconds(10)).until(x ->
                    ((Number) d.executeScript("return arguments[0].complete && arguments[0].naturalWidth", unrolled))
                            .intValue() > 0);
            d.get(unrolled.getAttribute("src"));
            assertEquals(9, d.findElements(By.cssSelector("g.loop")).stream()
                    .map(e -> e.getAttribute("data-coil")).distinct().count(), "9 coils in the 9 slots of the form, double layer");
        }
    }

    @Test
    void a_rewinder_lays_out_a_winding_and_reads_its_factor_and_coil_order() {
        try (Browser browser = Browser.open()) {
            ChromeDriver d = browser.driver();
            d.get(APP.url("/winding"));
            type(d, "slots", "12");
            type(d, "poles", "10");
            Browser.follow(d, "button[type=submit]");
            d.manage().window().setSize(new Dimension(1300, 2600));
            screenshot(d, "winding-12s10p");
            // source: El-Refaie, IEEE Trans. Ind. Electron. 57(1), 2010: 12 slots / 10 poles double layer kw1 = 0.933
            assertEquals("0.9330", d.findElement(By.cssSelector("[data-fact=fundamental] .fact-value")).getText());
            d.findElement(By.cssSelector(".factor-numbers summary")).click();
            assertEquals("0.9330", d.findElement(By.cssSelector("table.factors tbody tr:first-child td")).getText(),
                    "the numbers behind the chart open without JavaScript");
            assertEquals(3, d.findElements(By.cssSelector(".phase-order li")).size());
            assertTrue(d.getCurrentUrl().contains("slots=12"), "the layout has a link of its own: " + d.getCurrentUrl());
        }
    }
}
