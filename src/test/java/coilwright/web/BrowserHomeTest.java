package coilwright.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.junit.jupiter.api.Tag;

/** Drives real headless Chromium against the running app, reading the page as a person would. */
@Tag("slow")
class BrowserHomeTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @Test
    void home_page_shows_title_nav_and_safety_note_with_the_stylesheet_applied() {
        try (Browser browser = Browser.open()) {
            var driver = browser.driver();
            driver.get(APP.url("/"));
            assertTrue(driver.getTitle().startsWith("Coilwright"), driver.getTitle());
            List<String> nav = driver.findElements(By.cssSelector("nav.site-nav a")).stream().map(WebElement::getText).toList();
            assertEquals(List.of("Home", "New design", "Winding layout", "Wind match", "Hydro match", "Size an alternator", "Rewind", "Saved designs", "Compare", "Demo designs"), nav);
            assertEquals("Coilwright", driver.findElement(By.cssSelector(".brand")).getText());
            assertTrue(driver.findElement(By.cssSelector("footer")).getText().contains("licensed practice"));
            String headerBackground = driver.findElement(By.cssSelector(".site-header")).getCssValue("background-color");
            assertEquals("rgba(36, 52, 63, 1)", headerBackground, "coilwright.css was loaded from /static");
        }
    }

    @Test
    void switching_to_imperial_units_is_remembered_across_pages() {
        try (Browser browser = Browser.open()) {
            var driver = browser.driver();
            driver.get(APP.url("/"));
            Browser.follow(driver, driver.findElement(By.linkText("imperial")));
            driver.get(APP.url("/"));
            assertEquals("current", driver.findElement(By.linkText("imperial")).getAttribute("class"));
        }
    }
}
