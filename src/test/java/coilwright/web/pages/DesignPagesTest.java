package coilwright.web.pages;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.service.ExampleCatalogue;
import coilwright.web.Html;
import coilwright.web.TestApp;
import coilwright.web.units.Units;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/** The design pages through the real app: form, results, errors beside fields, examples (pages parsed with jsoup). */
class DesignPagesTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    /** The form as a browser would post it: every field of a fresh form, shown values in SI display units. */
    static Map<String, String> defaultForm() {
        return new HashMap<>(DesignDefaults.formValues(DesignDefaults.AXIAL_BATTERY, Units.SI));
    }

    private static List<ExampleCatalogue.Example> examples() {
        return APP.app().services().examples().all();
    }

    private static Html post(Map<String, String> form, int status) {
        return Html.of(given().formParams(form).post("/design").then().statusCode(status)
                .contentType(startsWith("text/html")).extract().response());
    }

    @Test
    void the_home_page_links_every_example_to_its_results_and_to_the_form() {
        Html home = Html.of(given().get("/").then().statusCode(200).extract().response());
        assertTrue(examples().size() >= 3, "the three shipped examples are found");
        for (ExampleCatalogue.Example ex : examples()) {
            List<String> links = home.id("example-" + ex.slug()).select("a").eachAttr("href");
            assertEquals(List.of("/design/results?example=" + ex.slug(), "/design/new?example=" + ex.slug()), links);
            assertEquals(ex.title(), home.id("example-" + ex.slug()).selectFirst("h3").text());
        }
    }

    @Test
    void a_fresh_form_shows_defaults_with_mm_beside_lengths_and_inches_on_request() {
        Html si = Html.of(given().get("/design/new").then().statusCode(200).contentType(startsWith("text/html"))
                .extract().response());
        assertEquals("10", si.value("alternator.rotor.magnetThicknessM"));
        assertEquals("mm", si.unit("alternator.rotor.magnetThicknessM"));
        assertEquals("AXIAL_DUAL", si.selected("topology"));
        Html imperial = Html.of(given().queryParam("units", "imperial").get("/design/new").then().statusCode(200)
                .extract().response());
        assertEquals("0.393701", imperial.value("alternator.rotor.magnetThicknessM"));
        assertEquals("in", imperial.unit("alternator.rotor.magnetThicknessM"));
    }

    @Test
    void an_example_pre_fills_the_form_with_its_own_values() {
        Html page = Html.of(given().queryParam("example", "radial-hydro-48v").get("/design/new").then().statusCode(200)
                .extract().response());
        assertEquals("24", page.value("alternator.winding.slots"));
        assertEquals("140", page.value("alternator.rotor.gapDiameterM"));
        assertEquals("RADIAL_INNER", page.selected("topology"));
    }

    @Test
    void an_unknown_example_is_a_404_page_naming_the_known_ones() {
        Html page = Html.of(given().queryParam("example", "no-such").get("/design/new").then().statusCode(404)
                .extract().response());
        assertTrue(page.doc().selectFirst(".detail").text().contains("radial-hydro-48v"));
    }

    @Test
    void a_valid_resistor_design_renders_results_with_summary_charts_and_winding() {
        Map<String, String> f = defaultForm();
        f.put("topology", "RADIAL_INNER");
        f.put("loadType", "RESISTOR");
        f.put("alternator.turnsPerCoil", "20");
        f.put("alternator.wire.awg", "18");
        Html page = post(f, 200);
        assertEquals("none", page.id("cut-in").selectFirst(".value").text());
        assertEquals("a resistor bank takes current at any speed", page.id("cut-in").selectFirst(".note").text());
        assertEquals(3, page.all(".charts .chart svg").size());
        assertTrue(page.text().contains("EMF and terminal voltage"));
        assertFalse(page.all("figure.unrolled").isEmpty(), "the unrolled winding");
        assertTrue(page.all(".factor-chart svg").text().contains("Winding factor by harmonic order"));
        assertEquals("details", page.all("table.factors").get(0).closest("details").tagName(), "numbers behind a disclosure");
    }

    @Test
    void a_valid_battery_design_shows_its_cut_in_speed_and_cautions() {
        Html page = post(defaultForm(), 200);
        assertEquals("Cut-in speed", page.id("cut-in").selectFirst(".label").text());
        assertTrue(page.id("cut-in").selectFirst(".note").text().contains("rpm on the solved curve"));
        List<String> cautions = page.all(".cautions-list .caution .caution-title").stream().map(e -> e.text()).toList();
        assertTrue(cautions.stream().anyMatch(t -> t.contains("DC-rated fusing at the battery")), cautions.toString());
    }

    @Test
    void danger_cautions_come_first() {
        List<String> severities = post(defaultForm(), 200).all(".cautions-list .caution .caution-title strong").eachText();
        List<String> dangerFirst = severities.stream().sorted(java.util.Comparator.comparing(s -> !s.equals("Danger"))).toList();
        assertTrue(severities.contains("Danger"), severities.toString());
        assertEquals(dangerFirst, severities);
    }

    @Test
    void invalid_fields_come_back_with_the_api_messages_beside_them_and_what_was_typed() {
        Map<String, String> f = defaultForm();
        f.put("alternator.winding.poles", "7");
        f.put("alternator.rotor.magnetWidthM", "abc");
        f.put("load.battery.cells", "");
        Html page = post(f, 400);
        assertTrue(page.error("alternator.winding.poles").startsWith("alternator.winding.poles = 7: must be even"),
                page.error("alternator.winding.poles"));
        assertTrue(page.error("alternator.rotor.magnetWidthM").startsWith("alternator.rotor.magnetWidthM = \"abc\""));
        assertTrue(page.error("load.battery.cells").startsWith("load.battery.cells is missing"));
        assertEquals("abc", page.value("alternator.rotor.magnetWidthM"));
        assertTrue(page.id("alternator.winding.poles").parent().hasClass("invalid"));
        assertFalse(page.has("cut-in"));
    }

    @Test
    void a_length_out_of_range_is_named_in_the_apis_si_terms() {
        Map<String, String> f = defaultForm();
        f.put("alternator.rotor.clearancePerSideM", "0");
        Html page = post(f, 400);
        assertTrue(page.error("alternator.rotor.clearancePerSideM").startsWith("alternator.rotor.clearancePerSideM = 0.0"),
                page.error("alternator.rotor.clearancePerSideM"));
    }

    @Test
    void an_unbalanced_winding_is_a_422_with_the_reason_beside_the_slots_field() {
        Map<String, String> f = defaultForm();
        f.put("alternator.winding.slots", "12");
        f.put("alternator.winding.poles", "12");
        Html page = post(f, 422);
        assertTrue(page.error("alternator.winding.slots").startsWith("12 slots with 12 poles"), page.error("alternator.winding.slots"));
        assertTrue(page.error("alternator.winding.slots").contains("cannot be balanced"));
        assertEquals("12", page.value("alternator.winding.poles"));
    }

    @Test
    void an_unknown_machine_type_is_refused_by_name() {
        Map<String, String> f = defaultForm();
        f.put("topology", "LINEAR");
        Html page = post(f, 400);
        assertEquals("topology = \"LINEAR\": must be one of radial inner, radial outer, axial dual", page.error("topology"));
    }

    @Test
    void every_example_has_a_results_page_with_cut_in_and_cautions() {
        for (ExampleCatalogue.Example ex : examples()) {
            Html page = Html.of(given().queryParam("example", ex.slug()).get("/design/results").then().statusCode(200)
                    .extract().response());
            assertEquals(ex.title(), page.doc().selectFirst("h1").text());
            assertTrue(page.has("cut-in"), ex.slug());
            assertFalse(page.all(".cautions-list .caution").isEmpty(), ex.slug());
        }
    }

    @Test
    void results_without_an_example_name_are_a_400_page() {
        Html page = Html.of(given().get("/design/results").then().statusCode(400).contentType(startsWith("text/html"))
                .extract().response());
        assertTrue(page.all(".field-errors li").get(0).text().contains("example is missing"));
    }
}
