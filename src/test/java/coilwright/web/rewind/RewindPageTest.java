package coilwright.web.rewind;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.web.Html;
import coilwright.web.TestApp;
import coilwright.web.units.Units;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/** The rewind page through the real app (pages parsed with jsoup). */
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

    private static Html post(String path, Map<String, String> form, int status) {
        return Html.of(given().formParams(form).post(path).then().statusCode(status)
                .contentType(startsWith("text/html")).extract().response());
    }

    /** The query of a design-form link as decoded parameters. */
    private static Map<String, String> query(String href) {
        Map<String, String> out = new HashMap<>();
        for (String pair : href.substring(href.indexOf('?') + 1).split("&")) {
            String[] kv = pair.split("=", 2);
            out.put(java.net.URLDecoder.decode(kv[0], java.nio.charset.StandardCharsets.UTF_8),
                    java.net.URLDecoder.decode(kv[1], java.nio.charset.StandardCharsets.UTF_8));
        }
        return out;
    }

    @Test
    void the_form_opens_with_an_example_machine_grouped_as_a_rewinder_thinks() {
        Html page = Html.of(given().get("/rewind").then().statusCode(200).contentType(startsWith("text/html"))
                .extract().response());
        assertEquals(List.of("What you know of the machine", "What you measured, and how accurately", "What you want",
                "The stator"), page.all("fieldset > legend").eachText());
        assertEquals("1.45", page.value("machine.measurements.lineResistanceOhm"));
        assertEquals("A bare stator for a magnet rotor", page.id("bare-stator").text());
        assertTrue(page.all(".error-summary").isEmpty());
    }

    @Test
    void posting_the_example_shows_what_was_derived_the_options_and_links_to_a_full_evaluation() {
        Html page = post("/rewind", form(), 200);
        List<String> derived = page.all("#derived li").eachText();
        assertTrue(derived.contains("Ke 0.13833 V/rpm (line, rms) from 41.50 V at 300 rpm, +-1.4 %"), derived.toString());
        assertTrue(derived.stream().anyMatch(d -> d.contains("phase inductance 2.000e-03 H from 4.000e-03 H between line terminals")),
                derived.toString());
        List<String> reconnections = page.all("#reconnections tr td:first-child span").eachText();
        assertTrue(reconnections.contains("reconnect the existing coils delta, 1 path (now star, 1 path)"), reconnections.toString());
        assertFalse(page.all("section.rewind-option").isEmpty());
        assertTrue(page.text().contains("Other pole counts for this stator"));
        Map<String, String> link = query(page.all("#reconnections a").get(0).attr("href"));
        assertEquals("12", link.get("alternator.winding.slots"));
        assertEquals("16", link.get("alternator.winding.poles"));
        assertTrue(link.containsKey("alternator.measuredKeLineVPerRpm"));
        assertEquals("24", link.get("load.battery.customVoltageV"));
    }

    @Test
    void the_first_rewind_link_carries_its_turns_and_the_scaled_ke() {
        Element first = post("/rewind", form(), 200).all("section.rewind-option").get(0);
        java.util.regex.Matcher heading = java.util.regex.Pattern
                .compile("1\\. (star|delta), (\\d+) path\\(s\\): (\\d+) turns per coil").matcher(first.selectFirst("h3").text());
        assertTrue(heading.matches(), first.selectFirst("h3").text());
        Map<String, String> link = query(first.selectFirst("table.wires a").attr("href"));
        assertEquals(heading.group(3), link.get("alternator.turnsPerCoil"));
        assertEquals(heading.group(1).toUpperCase(), link.get("alternator.connection"));
        assertEquals(heading.group(2), link.get("alternator.winding.parallelPaths"));
    }

    @Test
    void a_pole_count_that_contradicts_the_frequency_comes_back_beside_the_field() {
        Map<String, String> f = form();
        f.put("machine.poles", "14");
        Html page = post("/rewind", f, 400);
        assertTrue(page.error("machine.poles").startsWith(
                "machine.poles = 14: does not fit the measured 40.0 Hz at 300 rpm, which implies 16 poles"),
                page.error("machine.poles"));
        assertTrue(page.id("machine.poles").parent().hasClass("invalid"));
        assertFalse(page.summary().isEmpty());
        assertFalse(page.has("reconnections"));
    }

    @Test
    void unreadable_and_impossible_entries_come_back_with_messages_and_what_was_typed() {
        Map<String, String> f = form();
        f.put("machine.turnsPerCoil", "sixty");
        f.put("target.cutInSpeedRpm", "-5");
        Html page = post("/rewind", f, 400);
        assertEquals("machine.turnsPerCoil = \"sixty\": must be a whole number", page.error("machine.turnsPerCoil"));
        assertEquals("sixty", page.value("machine.turnsPerCoil"));
        assertTrue(page.error("target.cutInSpeedRpm").startsWith("target.cutInSpeedRpm = -5"), page.error("target.cutInSpeedRpm"));
    }

    @Test
    void a_resistance_the_planner_finds_impossible_is_shown_beside_the_resistance_field() {
        Map<String, String> f = form();
        f.put("machine.measurements.lineResistanceOhm", "0.00001");
        Html page = post("/rewind", f, 400);
        assertTrue(page.error("machine.measurements.lineResistanceOhm").contains("too low for 60 turns per coil of AWG 16"),
                page.error("machine.measurements.lineResistanceOhm"));
        assertEquals("0.00001", page.value("machine.measurements.lineResistanceOhm"));
    }

    @Test
    void blank_optional_readings_mean_not_measured() {
        Map<String, String> f = form();
        f.put("machine.measurements.lineResistanceOhm", "");
        f.put("machine.measurements.measuredFrequencyHz", "");
        Html page = post("/rewind", f, 200);
        assertTrue(page.all("#results ul.cautions li").eachText().stream().anyMatch(w -> w.startsWith("no resistance measured")));
        assertTrue(page.id("characterisation").text().contains("(given)"), page.id("characterisation").text());
    }

    @Test
    void a_coil_window_adds_the_fill_check() {
        Map<String, String> f = form();
        f.put("machine.coilWindow.areaM2", "0.000208");
        List<String> fills = post("/rewind", f, 200).all("table.wires tr td:nth-child(7)").eachText();
        assertFalse(fills.isEmpty());
        assertTrue(fills.stream().allMatch(t -> t.contains(" copper, ")), fills.toString());
    }

    @Test
    void imperial_temperatures_are_converted_at_the_edge() {
        Map<String, String> f = form();
        f.put("machine.measurements.measuredTemperatureC", "68");
        f.put("target.windingTemperatureC", "140");
        Html page = Html.of(given().queryParam("units", "imperial").formParams(f).post("/rewind").then().statusCode(200)
                .extract().response());
        assertTrue(page.all("#derived li").eachText().stream().anyMatch(d -> d.contains(
                "from 1.45000 Ω between line terminals (star: R_ph = R line-to-line / 2) at 20.0 °C")));
        assertEquals("°F", page.unit("target.windingTemperatureC"));
    }

    @Test
    void a_bare_stator_lists_its_pole_options_with_links_to_the_design_form() {
        Map<String, String> f = Map.of("slots", "12", "phases", "3", "layers", "DOUBLE", "minPoles", "8", "maxPoles", "16");
        Html page = post("/rewind/stator-options", f, 200);
        Element first = page.id("stator-options").selectFirst("table.pole-options tbody tr");
        List<String> cells = first.select("td").eachText();
        assertTrue(List.of("10", "14").contains(cells.get(0)), cells.toString());
        assertTrue(List.of("2/5", "2/7").contains(cells.get(1)), cells.toString());
        Map<String, String> layout = query(first.selectFirst("a[href^=/winding]").attr("href"));
        assertEquals(Map.of("slots", "12", "poles", cells.get(0), "phases", "3", "layers", "DOUBLE"), layout);
        Map<String, String> link = query(first.selectFirst("a[href^=/design]").attr("href"));
        assertEquals("12", link.get("alternator.winding.slots"));
        assertEquals(cells.get(0), link.get("alternator.winding.poles"));
        assertEquals("12", page.value("slots"), "the stator form keeps what was entered");
    }

    @Test
    void a_bare_stator_can_list_the_smoothest_options_first_with_plain_column_names() {
        Map<String, String> f = Map.of("slots", "12", "phases", "3", "layers", "DOUBLE", "minPoles", "2", "maxPoles", "16",
                "rankBy", "COGGING");
        Html page = post("/rewind/stator-options", f, 200);
        List<String> order = page.all("#stator-options table.pole-options tbody tr").eachAttr("data-poles");
        // LCM(12, 2p): 14 poles 84, 10 poles 60, 16 poles 48, 8 poles 24, 4 and 2 poles 12
        assertEquals(List.of("14", "10", "16", "8", "4", "2"), order);
        List<String> heads = page.all("#stator-options table.pole-options thead th").eachText();
        assertTrue(heads.contains("Cogging cycles per revolution") && heads.contains("Winding factor")
                && heads.contains("Magnetic pull"), heads.toString());
        assertTrue(heads.stream().noneMatch(h -> h.matches(".*(kw|LCM|gcd).*")), heads.toString());
        assertFalse(page.all("#stator-options .column-notes dt").isEmpty(), "each column is explained");
        assertEquals("COGGING", page.selected("rankBy"));
    }

    @Test
    void a_bare_stator_with_bad_counts_comes_back_with_messages() {
        Map<String, String> f = Map.of("slots", "1", "phases", "3", "layers", "DOUBLE", "minPoles", "2", "maxPoles", "16");
        Html page = post("/rewind/stator-options", f, 400);
        assertTrue(page.error("slots").startsWith("slots = 1"), page.error("slots"));
        assertEquals("1", page.value("slots"));
        assertTrue(page.all(".pole-options").isEmpty());
        assertEquals("60", page.value("machine.turnsPerCoil"), "the other form shows its starting values");
    }
}
