package coilwright.web.pages;

import static io.restassured.RestAssured.given;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.web.Html;
import coilwright.web.TestApp;
import java.util.List;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

class HeatViewPageTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    private static Html results(String slug, String units) {
        var request = given().queryParam("example", slug);
        if (units != null) {
            request = request.queryParam("units", units);
        }
        return Html.of(request.get("/design/results").then().statusCode(200).extract().response());
    }

    @Test
    void the_results_page_shows_temperature_losses_cogging_and_demagnetisation_with_a_loss_chart() {
        Html page = results("rewound-motor-12v", null);
        Element heat = page.id("heat");
        assertNotNull(heat, "the heat and losses section");
        for (String id : List.of("heat-rated-temperature", "heat-limit-speed", "heat-efficiency", "heat-cogging",
                "heat-starting-torque", "heat-demagnetisation")) {
            assertTrue(page.has(id), id);
        }
        assertTrue(page.id("heat-rated-temperature").selectFirst(".value").text().endsWith("°C"));
        assertTrue(page.id("heat-cogging").selectFirst(".value").text().endsWith("N·m"));
        // the rewound example uses a high-coercivity grade because its magnets run hot in the closed housing
        assertTrue(page.id("heat-demagnetisation").hasClass("ok"), "the rewound example keeps a margin");
        assertTrue(page.id("heat-demagnetisation").selectFirst(".value").text().endsWith("%"));
        Element svg = heat.selectFirst(".chart svg");
        assertNotNull(svg, "loss chart drawn on the server");
        assertTrue(svg.selectFirst("title").text().startsWith("Losses at rated speed"));
        List<String> headings = heat.select("table.losses th").eachText();
        assertTrue(headings.containsAll(List.of("Copper (W)", "Delta circulation (W)", "Stator iron (W)",
                "Bearings (W)", "Efficiency (%)")), headings.toString());
        assertFalse(headings.contains("Eddy in conductors (W)"), "a slotted stator has no conductor eddy column");
        assertFalse(heat.select("table.losses tbody tr").isEmpty());
        assertFalse(heat.select("ul.assumptions li").isEmpty());
        Element template = heat.clone();
        template.select("svg").remove();
        assertTrue(template.select("[style]").isEmpty() && heat.select("script").isEmpty(),
                "no inline style or script outside the drawn chart");
    }

    @Test
    void imperial_units_show_temperatures_in_fahrenheit_and_torque_in_pound_feet() {
        Html page = results("axial-wind-48v", "imperial");
        String t = page.id("heat-rated-temperature").selectFirst(".value").text();
        assertTrue(t.endsWith("°F"), t);
        String c = page.id("heat-cogging").selectFirst(".value").text();
        assertEquals("0 lbf·ft", c, "an air-cored stator has no cogging");
    }
}
