package coilwright.web.rewind;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.web.TestApp;
import coilwright.web.Units;
import java.util.HashMap;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/** The /rewind page: the form, its results, and messages beside the fields. */
class RewindPageTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    private static Map<String, String> form() {
        return new HashMap<>(RewindForm.defaults(Units.SI));
    }

    @Test
    void the_form_opens_with_an_example_machine_grouped_as_a_rewinder_thinks() {
        given().get("/rewind").then().statusCode(200).contentType(startsWith("text/html"))
                .body(containsString("What you know of the machine"))
                .body(containsString("What you measured, and how accurately"))
                .body(containsString("What you want"))
                .body(containsString("name=\"machine.measurements.lineResistanceOhm\" value=\"1.45\""))
                .body(containsString("A bare stator for a magnet rotor"))
                .body(not(containsString("error-summary")));
    }

    @Test
    void posting_the_example_shows_what_was_derived_the_options_and_links_to_a_full_evaluation() {
        String html = given().formParams(form()).post("/rewind").then().statusCode(200)
                .body(containsString("Ke 0.13833 V/rpm (line, rms) from 41.50 V at 300 rpm, +-1.4 %"))
                .body(containsString("Reconnections (no rewinding)"))
                .body(containsString("reconnect the existing coils delta, 1 path (now star, 1 path)"))
                .body(containsString("turns per coil"))
                .body(containsString("strands in hand"))
                .body(containsString("Other pole counts for this stator"))
                .body(containsString("phase inductance 2.000e-03 H from 4.000e-03 H between line terminals"))
                .extract().asString();
        Matcher link = Pattern.compile("href=\"(/design/new\\?[^\"]+)\"").matcher(html);
        assertTrue(link.find(), "an evaluation link");
        String url = link.group(1).replace("&amp;", "&");
        assertTrue(url.contains("alternator.winding.slots=12"), url);
        assertTrue(url.contains("alternator.winding.poles=16"), url);
        assertTrue(url.contains("alternator.measuredKeLineVPerRpm="), url);
        assertTrue(url.contains("load.battery.customVoltageV=24"), url);
    }

    @Test
    void the_first_rewind_link_carries_its_turns_and_the_scaled_ke() {
        String html = given().formParams(form()).post("/rewind").then().statusCode(200).extract().asString();
        Matcher heading = Pattern.compile("<h3>1\\. (star|delta), (\\d+) path\\(s\\): (\\d+) turns per coil</h3>")
                .matcher(html);
        assertTrue(heading.find(), "first rewind heading");
        String section = html.substring(heading.end());
        Matcher link = Pattern.compile("href=\"(/design/new\\?[^\"]+)\"").matcher(section);
        assertTrue(link.find());
        String url = link.group(1).replace("&amp;", "&");
        assertTrue(url.contains("alternator.turnsPerCoil=" + heading.group(3) + "&"), url);
        assertTrue(url.contains("alternator.connection=" + heading.group(1).toUpperCase()), url);
        assertTrue(url.contains("alternator.winding.parallelPaths=" + heading.group(2) + "&"), url);
    }

    @Test
    void a_pole_count_that_contradicts_the_frequency_comes_back_beside_the_field() {
        Map<String, String> f = form();
        f.put("machine.poles", "14");
        given().formParams(f).post("/rewind").then().statusCode(400)
                .body(containsString("class=\"field invalid\""))
                .body(containsString("machine.poles = 14: does not fit the measured 40.0 Hz at 300 rpm, which implies 16 poles"))
                .body(containsString("Please correct the marked fields"))
                .body(not(containsString("Reconnections (no rewinding)")));
    }

    @Test
    void unreadable_and_impossible_entries_come_back_with_messages_and_what_was_typed() {
        Map<String, String> f = form();
        f.put("machine.turnsPerCoil", "sixty");
        f.put("target.cutInSpeedRpm", "-5");
        given().formParams(f).post("/rewind").then().statusCode(400)
                .body(containsString("machine.turnsPerCoil = &quot;sixty&quot;: must be a whole number"))
                .body(containsString("value=\"sixty\""))
                .body(containsString("target.cutInSpeedRpm = -5"));
    }

    @Test
    void a_resistance_the_planner_finds_impossible_is_shown_beside_the_resistance_field() {
        Map<String, String> f = form();
        f.put("machine.measurements.lineResistanceOhm", "0.00001");
        String html = given().formParams(f).post("/rewind").then().statusCode(400)
                .body(containsString("too low for 60 turns per coil of AWG 16"))
                .extract().asString();
        int field = html.indexOf("id=\"machine.measurements.lineResistanceOhm\"");
        int message = html.lastIndexOf("too low for 60 turns");
        assertTrue(field > 0 && message > field && message - field < 800, "message beside its field");
    }

    @Test
    void blank_optional_readings_mean_not_measured() {
        Map<String, String> f = form();
        f.put("machine.measurements.lineResistanceOhm", "");
        f.put("machine.measurements.measuredFrequencyHz", "");
        given().formParams(f).post("/rewind").then().statusCode(200)
                .body(containsString("no resistance measured"))
                .body(containsString("(given)"));
    }

    @Test
    void a_coil_window_adds_the_fill_check() {
        Map<String, String> f = form();
        f.put("machine.coilWindow.areaM2", "0.000208");
        given().formParams(f).post("/rewind").then().statusCode(200)
                .body(containsString(" copper, "))
                .body(not(containsString("window unknown")));
    }

    @Test
    void imperial_temperatures_are_converted_at_the_edge() {
        Map<String, String> f = form();
        f.put("machine.measurements.measuredTemperatureC", "68");
        f.put("target.windingTemperatureC", "140");
        given().queryParam("units", "imperial").formParams(f).post("/rewind").then().statusCode(200)
                .body(containsString("from 1.45000 Ohm between line terminals (star: R_ph = R_LL / 2) at 20.0 C"));
    }

    @Test
    void a_bare_stator_lists_its_pole_options_with_links_to_the_design_form() {
        Map<String, String> f = Map.of("slots", "12", "phases", "3", "layers", "DOUBLE", "minPoles", "8", "maxPoles", "16");
        String html = given().formParams(f).post("/rewind/stator-options").then().statusCode(200)
                .body(containsString("class=\"pole-options\""))
                .extract().asString();
        Matcher first = Pattern.compile("<tr>\\s*<td>(\\d+)</td>\\s*<td>([^<]+)</td>").matcher(
                html.substring(html.indexOf("id=\"stator-options\"")));
        assertTrue(first.find());
        assertTrue(first.group(1).equals("10") || first.group(1).equals("14"), first.group(1));
        assertEquals("2/5".equals(first.group(2)) || "2/7".equals(first.group(2)), true, first.group(2));
        assertTrue(html.contains("/design/new?alternator.winding.slots=12&amp;alternator.winding.poles="));
    }

    @Test
    void a_bare_stator_with_bad_counts_comes_back_with_messages() {
        Map<String, String> f = Map.of("slots", "1", "phases", "3", "layers", "DOUBLE", "minPoles", "2", "maxPoles", "16");
        given().formParams(f).post("/rewind/stator-options").then().statusCode(400)
                .body(containsString("slots = 1"))
                .body(not(containsString("class=\"pole-options\"")));
    }
}
