package coilwright.web.pages;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.startsWith;

import coilwright.web.TestApp;
import io.restassured.response.Response;
import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/** The design pages through the real app: form, results, errors beside fields, examples. */
class DesignPagesTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    /** The form as a browser would post it: every field of a fresh form, shown values in SI display units. */
    static Map<String, String> defaultForm() {
        return new HashMap<>(DesignDefaults.formValues(DesignDefaults.AXIAL_BATTERY, coilwright.web.Units.SI));
    }

    @Test
    void the_home_page_links_every_example_to_its_results_and_to_the_form() {
        String body = given().get("/").then().statusCode(200).extract().asString();
        for (Examples.Example ex : Examples.all()) {
            org.junit.jupiter.api.Assertions.assertTrue(body.contains("/design/results?example=" + ex.slug()), ex.slug());
            org.junit.jupiter.api.Assertions.assertTrue(body.contains("/design/new?example=" + ex.slug()), ex.slug());
        }
        org.junit.jupiter.api.Assertions.assertTrue(Examples.all().size() >= 3, "the three shipped examples are found");
    }

    @Test
    void a_fresh_form_shows_defaults_with_mm_beside_lengths_and_inches_on_request() {
        given().get("/design/new").then().statusCode(200).contentType(startsWith("text/html"))
                .body(containsString("id=\"alternator.rotor.magnetThicknessM\" name=\"alternator.rotor.magnetThicknessM\" value=\"10\""))
                .body(containsString("<option value=\"AXIAL_DUAL\" selected=\"selected\""))
                .body(containsString("<span class=\"unit\">mm</span>"));
        given().queryParam("units", "imperial").get("/design/new").then().statusCode(200)
                .body(containsString("name=\"alternator.rotor.magnetThicknessM\" value=\"0.393701\""))
                .body(containsString("<span class=\"unit\">in</span>"));
    }

    @Test
    void an_example_pre_fills_the_form_with_its_own_values() {
        given().queryParam("example", "radial-hydro-48v").get("/design/new").then().statusCode(200)
                .body(containsString("name=\"alternator.winding.slots\" value=\"24\""))
                .body(containsString("name=\"alternator.rotor.gapDiameterM\" value=\"140\""))
                .body(containsString("<option value=\"RADIAL_INNER\" selected=\"selected\""));
    }

    @Test
    void an_unknown_example_is_a_404_page_naming_the_known_ones() {
        given().queryParam("example", "no-such").get("/design/new").then().statusCode(404)
                .body(containsString("radial-hydro-48v"));
    }

    @Test
    void a_valid_resistor_design_renders_results_with_summary_charts_and_winding() {
        Map<String, String> f = defaultForm();
        f.put("topology", "RADIAL_INNER");
        f.put("loadType", "RESISTOR");
        f.put("alternator.turnsPerCoil", "20");
        f.put("alternator.wire.awg", "18");
        given().formParams(f).post("/design").then().statusCode(200)
                .body(containsString("id=\"cut-in\""))
                .body(containsString("a resistor bank takes current at any speed"))
                .body(containsString("EMF and terminal voltage"))
                .body(containsString("class=\"winding-diagram\""))
                .body(containsString("Winding factors by harmonic"));
    }

    @Test
    void a_valid_battery_design_shows_its_cut_in_speed_and_cautions() {
        Response r = given().formParams(defaultForm()).post("/design");
        r.then().statusCode(200)
                .body(containsString("Cut-in speed"))
                .body(containsString("rpm on the solved curve"))
                .body(containsString("class=\"caution"))
                .body(containsString("DC-rated fusing at the battery"));
    }

    @Test
    void invalid_fields_come_back_with_the_api_messages_beside_them_and_what_was_typed() {
        Map<String, String> f = defaultForm();
        f.put("alternator.winding.poles", "7");
        f.put("alternator.rotor.magnetWidthM", "abc");
        f.put("load.battery.cells", "");
        given().formParams(f).post("/design").then().statusCode(400)
                .body(containsString("class=\"field invalid\""))
                .body(containsString("id=\"alternator.winding.poles-error\">alternator.winding.poles = 7: must be even"))
                .body(containsString("id=\"alternator.rotor.magnetWidthM-error\">alternator.rotor.magnetWidthM = &quot;abc&quot;"))
                .body(containsString("id=\"load.battery.cells-error\">load.battery.cells is missing"))
                .body(containsString("value=\"abc\""))
                .body(not(containsString("id=\"cut-in\"")));
    }

    @Test
    void a_length_out_of_range_is_named_in_the_apis_si_terms() {
        Map<String, String> f = defaultForm();
        f.put("alternator.rotor.runningClearanceM", "0");
        given().formParams(f).post("/design").then().statusCode(400)
                .body(containsString("id=\"alternator.rotor.runningClearanceM-error\">alternator.rotor.runningClearanceM = 0.0"));
    }

    @Test
    void an_unbalanced_winding_is_a_422_with_the_reason_beside_the_slots_field() {
        Map<String, String> f = defaultForm();
        f.put("alternator.winding.slots", "12");
        f.put("alternator.winding.poles", "12");
        given().formParams(f).post("/design").then().statusCode(422)
                .body(containsString("id=\"alternator.winding.slots-error\">12 slots with 12 poles"))
                .body(containsString("cannot be balanced"));
    }

    @Test
    void an_unknown_machine_type_is_refused_by_name() {
        Map<String, String> f = defaultForm();
        f.put("topology", "LINEAR");
        given().formParams(f).post("/design").then().statusCode(400)
                .body(containsString("topology = &quot;LINEAR&quot;: must be one of RADIAL_INNER, RADIAL_OUTER, AXIAL_DUAL"));
    }

    @Test
    void every_example_has_a_results_page_with_cut_in_and_cautions() {
        for (Examples.Example ex : Examples.all()) {
            given().queryParam("example", ex.slug()).get("/design/results").then().statusCode(200)
                    .body(containsString(ex.document().title()))
                    .body(containsString("id=\"cut-in\""))
                    .body(containsString("class=\"caution"));
        }
    }

    @Test
    void results_without_an_example_name_are_a_400_page() {
        given().get("/design/results").then().statusCode(400).contentType(startsWith("text/html"))
                .body(containsString("example is missing"));
    }
}
