package coilwright.web.pages;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.web.Browser;
import coilwright.web.TestApp;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.openqa.selenium.By;
import org.openqa.selenium.Dimension;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;

/** The winding page in real headless Chromium on a phone-sized window: the unrolled drawing first, readable, no sideways scroll. */
@Tag("slow")
class BrowserWindingTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    /** Smallest text we count as readable on a phone, CSS px (the page's body text is 18 px). */
    private static final double MIN_TEXT_PX = 10;

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"/winding", "/winding?slots=36&poles=4", "/winding?slots=24&poles=22&layers=SINGLE"})
    void on_a_390_px_phone_the_unrolled_drawing_comes_first_readable_and_without_sideways_scroll(String path) {
        try (Browser browser = Browser.open()) {
            ChromeDriver d = browser.driver();
            d.manage().window().setSize(new Dimension(390, 844));
            d.get(APP.url(path));
            long inner = (Long) d.executeScript("return window.innerWidth;");
            assertTrue(inner <= 400, "a phone-sized window: " + inner);
            List<WebElement> figures = d.findElements(By.cssSelector("section.winding figure"));
            WebElement first = figures.stream().filter(WebElement::isDisplayed).findFirst().orElseThrow();
            assertTrue(first.getAttribute("class").contains("unrolled"), "first shown figure: " + first.getAttribute("class"));
            assertFalse(first.getAttribute("class").contains("wide"), "the phone gets the narrow rows");
            long scroll = (Long) d.executeScript("return document.documentElement.scrollWidth;");
            assertTrue(scroll <= inner, "no sideways scroll: page " + scroll + " px in a " + inner + " px window");
            @SuppressWarnings("unchecked")
            Map<String, Object> box = (Map<String, Object>) d.executeScript(
                    "const r = arguments[0].getBoundingClientRect(); return {left: r.left, right: r.right};", first);
            assertTrue(((Number) box.get("left")).doubleValue() >= 0 && ((Number) box.get("right")).doubleValue() <= inner,
                    "the drawing lies inside the window: " + box);
            @SuppressWarnings("unchecked")
            List<Number> heights = (List<Number>) d.executeScript("return Array.from(arguments[0].querySelectorAll("
                    + "'text.slot-number, g.side text')).map(t => t.getBoundingClientRect().height);", first);
            assertFalse(heights.isEmpty());
            double smallest = heights.stream().mapToDouble(Number::doubleValue).min().orElseThrow();
            assertTrue(smallest >= MIN_TEXT_PX, "slot numbers and phase letters at least " + MIN_TEXT_PX + " px: " + smallest);
        }
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"/winding?slots=36&poles=4"})
    void on_a_wide_screen_the_wide_rows_are_shown_and_the_narrow_ones_hidden(String path) {
        try (Browser browser = Browser.open()) {
            ChromeDriver d = browser.driver();
            d.manage().window().setSize(new Dimension(1280, 900));
            d.get(APP.url(path));
            WebElement wide = d.findElement(By.cssSelector("figure.unrolled.wide"));
            WebElement narrow = d.findElement(By.cssSelector("figure.unrolled.narrow"));
            assertTrue(wide.isDisplayed());
            assertFalse(narrow.isDisplayed());
            assertEquals(2, wide.findElements(By.cssSelector("g.slot-row")).size(), "36 slots in two rows of 18");
        }
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"/winding?slots=36&poles=4", "/winding?slots=36&poles=8&layers=SINGLE"})
    void printed_on_a4_the_unrolled_drawing_of_36_slots_fits_one_page(String path) {
        // A4 is 210 x 297 mm; with 10 mm margins the printable area is 190 x 277 mm, 718 x 1047 CSS px at 96 px/inch
        try (Browser browser = Browser.open()) {
            ChromeDriver d = browser.driver();
            d.manage().window().setSize(new Dimension(718, 1047));
            d.executeCdpCommand("Emulation.setEmulatedMedia", Map.of("media", "print"));
            d.get(APP.url(path));
            List<WebElement> shown = d.findElements(By.cssSelector("figure.unrolled")).stream()
                    .filter(WebElement::isDisplayed).toList();
            assertEquals(1, shown.size(), "one drawing is printed");
            assertTrue(shown.get(0).getAttribute("class").contains("wide"));
            @SuppressWarnings("unchecked")
            Map<String, Object> box = (Map<String, Object>) d.executeScript(
                    "const r = arguments[0].getBoundingClientRect(); return {width: r.width, height: r.height};", shown.get(0));
            double width = ((Number) box.get("width")).doubleValue();
            double height = ((Number) box.get("height")).doubleValue();
            assertTrue(width <= 718 && height <= 1047, "the drawing fits a page: " + width + " x " + height + " px");
            assertEquals("avoid", d.executeScript("return getComputedStyle(arguments[0]).breakInside;", shown.get(0)),
                    "and is not split across pages");
        }
    }
}
