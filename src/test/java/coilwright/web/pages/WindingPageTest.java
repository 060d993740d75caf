package coilwright.web.pages;

import static io.restassured.RestAssured.given;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.web.Html;
import coilwright.web.TestApp;
import io.restassured.specification.RequestSpecification;
import java.util.List;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

class WindingPageTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    private static Html get(RequestSpecification query, int status) {
        return Html.of(query.get("/winding").then().statusCode(status).extract().response());
    }

    /** The cells of the winding-factor row of one harmonic order. */
    private static List<String> factorRow(Html page, int order) {
        return page.all("table.factors tbody tr").stream().map(Element::children).map(cells -> cells.eachText())
                .filter(cells -> cells.get(0).equals(Integer.toString(order))).findFirst().orElseThrow();
    }

    /** The value of a fact of the winding, by its label. */
    private static String fact(Html page, String label) {
        return page.all("table.facts tr").stream().filter(r -> r.selectFirst("th").text().equals(label))
                .map(r -> r.selectFirst("td").text()).findFirst().orElseThrow();
    }

    @Test
    void lays_out_twelve_slots_ten_poles_with_its_published_winding_factor() {
        // source: El-Refaie, IEEE Trans. Ind. Electron. 57(1), 2010, table of kw1: 12 slots / 10 poles, double layer 0.933
        Html page = get(given().queryParam("slots", 12).queryParam("poles", 10).queryParam("layers", "DOUBLE"), 200);
        assertEquals("0.9330", factorRow(page, 1).get(1));
        assertEquals(12, page.all("[data-coil]").stream().map(e -> e.attr("data-coil")).distinct().count());
        assertTrue(page.text().contains("Phase A"));
        assertEquals("60", fact(page, "Cogging periods per revolution, LCM(Q, 2p)"));
    }

    @Test
    void a_single_layer_winding_has_half_as_many_coils() {
        // source: El-Refaie 2010: 12 slots / 10 poles single layer kw1 = 0.966
        Html page = get(given().queryParam("slots", 12).queryParam("poles", 10).queryParam("layers", "SINGLE"), 200);
        assertEquals("0.9659", factorRow(page, 1).get(1));
        assertEquals(6, page.all("[data-coil]").stream().map(e -> e.attr("data-coil")).distinct().count());
    }

    @Test
    void an_unbalanced_combination_is_a_422_with_the_reason_beside_slots() {
        Html page = get(given().queryParam("slots", 12).queryParam("poles", 12), 422);
        assertTrue(page.error("slots").startsWith("12 slots with 12 poles"), page.error("slots"));
        assertTrue(page.all(".winding-diagram").isEmpty());
        assertEquals("12", page.value("poles"));
    }

    @Test
    void invalid_numbers_are_a_400_with_messages_under_the_short_field_names() {
        Html page = get(given().queryParam("slots", "abc").queryParam("pitch", "-1"), 400);
        assertEquals("slots = \"abc\": must be a whole number", page.error("slots"));
        assertEquals("abc", page.value("slots"));
        Html pitch = get(given().queryParam("slots", 12).queryParam("poles", 10).queryParam("pitch", 9), 400);
        assertTrue(pitch.error("pitch").startsWith("coilPitchSlots = 9"), pitch.error("pitch"));
        assertFalse(pitch.has("slots-error"));
    }
}
