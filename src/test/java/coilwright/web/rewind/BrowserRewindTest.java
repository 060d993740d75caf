package coilwright.web.rewind;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.web.Browser;
import coilwright.web.TestApp;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.junit.jupiter.api.Tag;

/** A rewinder fills the /rewind form in real headless Chromium, without JavaScript doing anything for them. */
@Tag("slow")
class BrowserRewindTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @Test
    void a_rewinder_corrects_a_wrong_pole_count_and_gets_the_plan() {
        try (Browser browser = Browser.open()) {
            var driver = browser.driver();
            driver.get(APP.url("/rewind"));
            WebElement poles = driver.findElement(By.id("machine.poles"));
            poles.clear();
            poles.sendKeys("14");
            Browser.follow(driver, "form[action='/rewind'] button[type=submit]");
            WebElement error = driver.findElement(By.id("machine.poles-error"));
            assertTrue(error.getText().contains("implies 16 poles"), error.getText());

            poles = driver.findElement(By.id("machine.poles"));
            poles.clear();
            poles.sendKeys("16");
            Browser.follow(driver, "form[action='/rewind'] button[type=submit]");
            assertTrue(driver.findElements(By.cssSelector(".error-summary")).isEmpty());
            assertEquals(6, driver.findElements(By.cssSelector("#reconnections tr")).size() - 1,
                    "star and delta for 1, 2 and 4 paths");
            assertTrue(driver.findElement(By.id("derived")).getText().contains("Ke 0.13833 V/rpm"));
        }
    }
}
