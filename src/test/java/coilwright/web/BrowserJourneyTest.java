package coilwright.web;

import static coilwright.web.Browser.type;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.javalin.http.HandlerType;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.openqa.selenium.By;
import org.openqa.selenium.Dimension;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.Pdf;
import org.openqa.selenium.print.PageSize;
import org.openqa.selenium.print.PrintOptions;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * The whole job of two users in real headless Chromium, through forms only, each ending by reading what that user
 * needs from the page; and every page at a phone's width (390 px) without sideways scrolling. Screenshots go to
 * {@code target/screenshots/journey-*.png}.
 */
@Tag("slow")
class BrowserJourneyTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();
    private static final int PHONE_WIDTH_PX = 390;

    /** Every click in these journeys loads a page; the next step waits for it. */
    private static void click(ChromeDriver d, String css) {
        Browser.follow(d, css);
    }

    private static void screenshot(ChromeDriver d, String name) {
        try {
            Path dir = Files.createDirectories(Path.of("target", "screenshots"));
            Files.write(dir.resolve("journey-" + name + ".png"), d.getScreenshotAs(OutputType.BYTES));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String text(ChromeDriver d, String css) {
        return d.findElement(By.cssSelector(css)).getText();
    }

    @Test
    void an_installer_designs_matches_a_wind_rotor_takes_its_speed_as_rated_saves_and_opens_the_link() {
        try (Browser browser = Browser.open()) {
            ChromeDriver d = browser.driver();
            d.manage().window().setSize(new Dimension(1300, 1000));
            d.get(APP.url("/design/new"));
            type(d, "alternator.turnsPerCoil", "45");
            type(d, "load.battery.cells", "24");
            click(d, "form button[type=submit]");
            assertTrue(text(d, "#cut-in .value").matches("\\d+ rpm"), text(d, "#cut-in .value"));

            click(d, "#next-wind");
            assertTrue(text(d, "#machine").contains("45 turns per coil"), text(d, "#machine"));
            assertEquals("24", d.findElement(By.id("load.battery.cells")).getAttribute("value"), "the design's own bank");
            type(d, "rotor.diameterM", "3.6");
            type(d, "rotor.maxRotorSpeedRpm", "0");
            click(d, "main form[action='/match/wind'] button[type=submit]");
            String energy = text(d, "#annual-energy .value");
            assertTrue(energy.endsWith("kWh"), energy);
            screenshot(d, "installer-match");

            Select speeds = new Select(d.findElement(By.id("ratedSpeedRpm")));
            String chosen = speeds.getFirstSelectedOption().getAttribute("value");
            assertTrue(speeds.getFirstSelectedOption().getText().contains("at 10 m/s"), speeds.getFirstSelectedOption().getText());
            click(d, "#use-speed");
            assertEquals(chosen, d.findElement(By.id("ratedSpeedRpm")).getAttribute("value"), "the matched speed is rated now");
            assertEquals("45", d.findElement(By.id("alternator.turnsPerCoil")).getAttribute("value"));
            click(d, "form button[type=submit]");

            type(d, "save-title", "Hilltop 3.6 m rotor, 48 V");
            click(d, "#next-save");
            String link = d.findElement(By.id("permalink")).getAttribute("value");
            assertTrue(link.matches("http://127\\.0\\.0\\.1:\\d+/d/[A-Za-z0-9_-]+"), link);
            assertTrue(d.findElement(By.cssSelector("button[data-copy=permalink]")).isDisplayed(), "the copy button is shown with JavaScript");
            assertFalse(d.findElement(By.id("edit-token")).getAttribute("value").isBlank());
            assertTrue(text(d, ".token-warning").contains("shown only this once"));
            screenshot(d, "installer-saved");

            d.get(link);
            assertEquals("Hilltop 3.6 m rotor, 48 V", text(d, "h1"));
            assertFalse(d.findElements(By.cssSelector(".saved-results .summary .figure")).isEmpty(), "the client reads the results");
            assertTrue(d.findElement(By.id("next-wind")).isDisplayed());
            // and sees what was designed: the inputs, the curves and the winding
            assertTrue(text(d, "#design-inputs").contains("45"), "the turns per coil are among the inputs");
            assertEquals(3, d.findElements(By.cssSelector("#design-charts .chart svg")).size());
            assertFalse(d.findElements(By.cssSelector("#design-winding .unrolled img")).isEmpty(), "the drawings, as images");
        }
    }

    @Test
    void a_consultant_changes_an_example_saves_it_revises_it_with_the_token_and_compares_the_revisions() {
        try (Browser browser = Browser.open()) {
            ChromeDriver d = browser.driver();
            d.manage().window().setSize(new Dimension(1300, 1000));
            d.get(APP.url("/design/results?example=axial-wind-48v"));
            click(d, "#change-design");
            type(d, "alternator.turnsPerCoil", "28");
            click(d, "form button[type=submit]");
            type(d, "save-title", "Client A, 28 turns");
            type(d, "save-notes", "First proposal");
            click(d, "#next-save");
            String token = d.findElement(By.id("edit-token")).getAttribute("value");
            click(d, "#open-link");

            click(d, "#next-revise");
            assertEquals("28", d.findElement(By.id("alternator.turnsPerCoil")).getAttribute("value"));
            type(d, "alternator.turnsPerCoil", "0");
            type(d, "editToken", token);
            click(d, "form button[type=submit]");
            assertTrue(d.findElement(By.id("alternator.turnsPerCoil-error")).getText().startsWith("alternator.turnsPerCoil = 0"),
                    "a rejected revision comes back with the message beside the field");
            type(d, "alternator.turnsPerCoil", "31");
            type(d, "revision.title", "Client A, 31 turns");
            type(d, "editToken", token);
            click(d, "form button[type=submit]");
            new WebDriverWait(d, Duration.ofSeconds(10)).until(x -> x.getCurrentUrl().contains("/r/"));
            assertEquals("2", text(d, ".revision-line strong"));
            assertEquals("Client A, 31 turns", text(d, "h1"));

            click(d, ".history a[href^='/compare']");
            List<String> inputs = d.findElements(By.cssSelector("table.compare-input tbody tr")).stream().map(WebElement::getText).toList();
            assertTrue(inputs.stream().anyMatch(t -> t.contains("turnsPerCoil") && t.contains("28") && t.contains("31")), inputs.toString());
            assertTrue(d.findElements(By.cssSelector("table.compare-results tr.differs")).size() > 0, "results differ");
            screenshot(d, "consultant-compare");

            assertTrue(text(d, "#compare-curves").contains("Power to load, second"), "both revisions' curves on one chart");
            click(d, "table.compare-sides tbody tr:nth-child(2) td:nth-child(3) a");
            click(d, ".exports a[href$='/print']");
            assertEquals("Client A, 31 turns", text(d, "h1"));
            assertFalse(d.findElements(By.cssSelector(".saved-results .summary .figure")).isEmpty(), "the print view has the results");
            assertEquals(3, d.findElements(By.cssSelector("#design-charts .chart svg")).size(), "the print view has the curves");
            assertFalse(d.findElements(By.cssSelector("#design-winding .unrolled svg")).isEmpty(), "and the winding");
        }
    }

    @Test
    void a_rewinder_plans_a_reconnection_evaluates_it_and_reads_the_bench_sheet() {
        try (Browser browser = Browser.open()) {
            ChromeDriver d = browser.driver();
            d.manage().window().setSize(new Dimension(1300, 1000));
            d.get(APP.url("/rewind"));
            click(d, "form[action='/rewind'] button[type=submit]");
            click(d, "#reconnections td a");
            // the option opens as the machine on the bench: air-cored coils, magnets that fit its 16 poles
            assertEquals("AXIAL_DUAL", new Select(d.findElement(By.id("topology"))).getFirstSelectedOption().getAttribute("value"));
            click(d, "form button[type=submit]");
            assertTrue(d.findElements(By.cssSelector(".error-summary")).isEmpty(),
                    () -> "the option evaluates: " + d.findElement(By.cssSelector(".error-summary")).getText());
            // its coils' mean turn comes from the measured 1.45 Ω between line leads: 0.725 Ω a phase at 20 °C
            assertTrue(text(d, "#hot-resistance .note").contains("(0.725 Ω at 20 °C)"), text(d, "#hot-resistance .note"));
            click(d, "#next-bench");
            type(d, "testRpm", "300");
            click(d, ".test-speed button");
            screenshot(d, "rewinder-bench");
            String voltage = d.findElements(By.cssSelector("#bench-check tr")).stream().map(WebElement::getText)
                    .filter(t -> t.startsWith("Open-circuit line voltage at the test speed")).findFirst().orElseThrow();
            // the planner's default machine was measured at 41.5 V line at 300 rpm; its measured constant is carried over
            assertTrue(voltage.contains("41.5 V rms"), voltage);
            assertFalse(d.findElements(By.cssSelector(".phase-order li")).isEmpty(), "the coils of each phase in order");
        }
    }

    @Test
    void an_installer_in_feet_and_gallons_matches_a_stream_from_the_menu_and_finds_compare_and_the_demos_there() {
        try (Browser browser = Browser.open()) {
            ChromeDriver d = browser.driver();
            d.manage().window().setSize(new Dimension(1300, 1000));
            d.get(APP.url("/"));
            click(d, "nav.site-nav a[href='/match/hydro']");
            assertEquals("L/s", unitOf(d, "site.designFlowM3s"));
            click(d, ".units-switch a:nth-of-type(2)");
            assertEquals("US gpm", unitOf(d, "site.designFlowM3s"));
            assertEquals("190.204", d.findElement(By.id("site.designFlowM3s")).getAttribute("value"), "12 L/s in US gpm");
            assertEquals("ft", unitOf(d, "site.grossHeadM"));
            type(d, "site.grossHeadM", "80");
            click(d, "main form[action='/match/hydro'] button[type=submit]");
            assertTrue(text(d, "#net-head .value").endsWith(" ft"), text(d, "#net-head .value"));
            assertEquals("80", d.findElement(By.id("site.grossHeadM")).getAttribute("value"), "what was typed stays");
            screenshot(d, "installer-hydro-imperial");
            click(d, ".units-switch a:nth-of-type(1)");
            assertEquals("24.384", d.findElement(By.id("site.grossHeadM")).getAttribute("value"), "80 ft is 24.384 m");
            assertTrue(text(d, "#net-head .value").endsWith(" m"), text(d, "#net-head .value"));

            click(d, "nav.site-nav a[href='/demos']");
            click(d, "main li a");
            assertEquals(3, d.findElements(By.cssSelector("#design-charts .chart svg")).size(), "a demo shows its curves");
            click(d, "nav.site-nav a[href='/compare']");
            assertFalse(d.findElements(By.cssSelector("main form[action='/compare'] input#a")).isEmpty());
        }
    }

    @Test
    void a_bench_sheet_prints_on_at_most_two_pages_of_a4_and_of_letter() {
        try (Browser browser = Browser.open()) {
            ChromeDriver d = browser.driver();
            List<String> over = new ArrayList<>();
            for (String example : List.of("rewound-motor-12v", "axial-wind-48v", "radial-hydro-48v")) {
                d.get(APP.url("/design/bench?example=" + example));
                assertTrue(d.findElement(By.id("connection-sketch")).isDisplayed(), example + ": the star/delta sketch");
                for (PageSize size : List.of(new PageSize(29.7, 21.0), new PageSize(27.94, 21.59))) {
                    PrintOptions options = new PrintOptions();
                    options.setPageSize(size);
                    Pdf pdf = d.print(options);
                    savePdf(pdf, "bench-" + example + "-" + (int) size.getHeight());
                    int pages = pdfPages(pdf);
                    // one page is the aim (issue 10); the sheet, its unrolled layout and the coil list take two today
                    if (pages > 2) {
                        over.add(example + " on " + size.getWidth() + " x " + size.getHeight() + " cm: " + pages + " pages");
                    }
                }
            }
            assertTrue(over.isEmpty(), over.toString());
        }
    }

    private static void savePdf(Pdf pdf, String name) {
        try {
            Path dir = Files.createDirectories(Path.of("target", "screenshots"));
            Files.write(dir.resolve(name + ".pdf"), java.util.Base64.getDecoder().decode(pdf.getContent()));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Pages of a PDF Chromium printed: its page objects ("/Type /Page", not the "/Type /Pages" tree). */
    private static int pdfPages(Pdf pdf) {
        String text = new String(java.util.Base64.getDecoder().decode(pdf.getContent()), java.nio.charset.StandardCharsets.ISO_8859_1);
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("/Type\\s*/Page(?![a-zA-Z])").matcher(text);
        int n = 0;
        while (m.find()) {
            n++;
        }
        return n;
    }

    private static String unitOf(ChromeDriver d, String field) {
        return d.findElement(By.id(field)).findElement(By.xpath("..")).findElement(By.cssSelector(".unit")).getText();
    }

    @Test
    void no_page_scrolls_sideways_at_390_px() {
        List<String> pages = new ArrayList<>();
        for (Route r : APP.app().routes()) {
            if (r.method() == HandlerType.GET && !Route.isApiPath(r.path()) && !r.path().contains("{")
                    && !r.path().equals("/design/results") && !r.path().equals("/design/bench")
                    && !r.path().endsWith(".svg")) {
                pages.add(r.path());
            }
        }
        pages.addAll(List.of("/design/results?example=rewound-motor-12v", "/design/results?example=axial-wind-48v",
                "/winding?slots=36&poles=4", "/demos", "/design/bench?example=rewound-motor-12v"));
        List<String> wide = new ArrayList<>();
        try (Browser browser = Browser.open()) {
            ChromeDriver d = browser.driver();
            d.manage().window().setSize(new Dimension(PHONE_WIDTH_PX, 900));
            for (String page : pages) {
                d.get(APP.url(page));
                check(d, page, wide);
            }
            d.get(APP.url("/match/wind"));
            click(d, "main form[action='/match/wind'] button[type=submit]");
            check(d, "wind match result", wide);
            d.get(APP.url("/match/hydro"));
            click(d, "main form[action='/match/hydro'] button[type=submit]");
            check(d, "hydro match result", wide);
            d.get(APP.url("/demos"));
            click(d, "main li a");
            check(d, "a saved design", wide);
            screenshot(d, "phone-saved");
        }
        assertTrue(wide.isEmpty(), String.join("\n", wide));
    }

    private static void check(ChromeDriver d, String page, List<String> wide) {
        JavascriptExecutor js = d;
        long viewport = ((Number) js.executeScript("return document.documentElement.clientWidth;")).longValue();
        long document = ((Number) js.executeScript("return document.documentElement.scrollWidth;")).longValue();
        if (document > viewport) {
            String culprits = (String) js.executeScript("var out=[]; document.querySelectorAll('body *').forEach(function(e){"
                    + "var r=e.getBoundingClientRect(); if (r.right > document.documentElement.clientWidth + 1 && out.length < 4) "
                    + "out.push(e.tagName + '.' + e.className + '#' + e.id + ' ' + Math.round(r.right));}); return out.join('; ');");
            wide.add(page + ": " + document + " px in a " + viewport + " px viewport; " + culprits);
        }
    }
}
