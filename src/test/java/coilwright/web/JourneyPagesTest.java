package coilwright.web;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.restassured.response.Response;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/**
 * One design carried through the pages over HTTP (pages parsed with jsoup): results to the form, to the match pages
 * with its own battery, back with a matched speed as rated, saved through the form, revised through the form, and
 * the units switch of every page reached by POST answered by a GET that shows the same thing.
 */
class JourneyPagesTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    private static Html get(String pathAndQuery, int status) {
        return Html.of(given().urlEncodingEnabled(false).get(pathAndQuery).then().statusCode(status)
                .contentType(startsWith("text/html")).extract().response());
    }

    private static Html post(String path, Map<String, String> form, int status) {
        Response r = given().formParams(form).post(path);
        assertEquals(status, r.statusCode(), () -> Html.of(r).summary().toString());
        return Html.of(r.then().contentType(startsWith("text/html")).extract().response());
    }

    /** Every named field of the forms matched, with the values they show, as a browser would post them. */
    private static Map<String, String> formOf(Html page, String formCss) {
        Map<String, String> f = new LinkedHashMap<>();
        page.all(formCss).forEach(form -> f.putAll(PageWordsTest.values(form)));
        return f;
    }

    private static Html results(int turns) {
        Html form = get("/design/new", 200);
        Map<String, String> f = formOf(form, "main form");
        f.put("alternator.turnsPerCoil", Integer.toString(turns));
        return post("/design", f, 200);
    }

    private static String unitsLink(Html page, String units) {
        return page.all(".units-switch a").stream().filter(a -> a.text().equalsIgnoreCase(units)).findFirst()
                .orElseThrow().attr("href");
    }

    @Test
    void a_results_page_offers_every_next_step_and_change_opens_the_form_with_the_same_design() {
        Html page = results(37);
        for (String id : List.of("next-change", "next-wind", "next-hydro", "save-design")) {
            assertTrue(page.has(id), id);
        }
        assertEquals("Change this design", page.id("next-change").text());
        Html again = get(page.id("next-change").attr("href"), 200);
        assertEquals("37", again.value("alternator.turnsPerCoil"));
        assertEquals("AXIAL_DUAL", again.selected("topology"));
    }

    @Test
    void the_units_switch_of_a_posted_result_leads_to_the_same_result_by_get() {
        Html page = results(37);
        String imperial = unitsLink(page, "imperial");
        assertTrue(imperial.startsWith("/design/results?design="), imperial);
        Html inImperial = get(imperial, 200);
        assertEquals(page.id("cut-in").selectFirst(".value").text(), inImperial.id("cut-in").selectFirst(".value").text(),
                "the same design gives the same cut-in speed");
        Html form = get(inImperial.id("next-change").attr("href") + "&units=imperial", 200);
        assertEquals("in", form.unit("alternator.rotor.magnetThicknessM"));
        assertEquals("0.393701", form.value("alternator.rotor.magnetThicknessM"), "10 mm shown in inches");
    }

    @Test
    void a_rejected_form_switched_to_imperial_keeps_what_was_typed_converted() {
        Html form = get("/design/new", 200);
        Map<String, String> f = formOf(form, "main form");
        f.put("alternator.turnsPerCoil", "-3");
        f.put("alternator.rotor.magnetThicknessM", "25.4");
        Html rejected = post("/design", f, 400);
        Html switched = get(unitsLink(rejected, "imperial"), 200);
        assertEquals("-3", switched.value("alternator.turnsPerCoil"), "the bad value is kept as typed");
        assertEquals("1", switched.value("alternator.rotor.magnetThicknessM"), "25.4 mm is 1 in");
    }

    private static Map<String, String> windFields(Html matchForm) {
        Map<String, String> f = formOf(matchForm, "main form");
        f.put("rotor.diameterM", "3.6");
        f.put("rotor.maxRotorSpeedRpm", "0");
        return f;
    }

    @Test
    void the_wind_match_takes_the_design_handed_on_and_its_battery_is_editable_there() {
        Html page = results(37);
        Html match = get(page.id("next-wind").attr("href"), 200);
        assertFalse(match.value("design").isEmpty(), "the design rides in a hidden field");
        assertTrue(match.id("machine").text().contains("37 turns per coil"), match.id("machine").text());
        assertEquals("12", match.value("load.battery.cells"), "the design's own bank");
        Map<String, String> f = windFields(match);
        f.put("load.battery.cells", "24");
        Html result = post("/match/wind", f, 200);
        assertTrue(result.has("results"));
        assertEquals("24", result.value("load.battery.cells"));
        Html byGet = get(unitsLink(result, "imperial"), 200);
        assertTrue(byGet.has("results"), "the units switch shows the same match by GET");
        assertEquals(result.id("annual-energy").selectFirst(".value").text(),
                byGet.id("annual-energy").selectFirst(".value").text());

        Element rated = result.id("ratedSpeedRpm").selectFirst("option");
        Map<String, String> use = formOf(result, "#use-rated");
        use.put("ratedSpeedRpm", rated.val());
        Html back = Html.of(given().queryParams(use).get("/design/new").then().statusCode(200).extract().response());
        assertEquals(rated.val(), back.value("ratedSpeedRpm"), "the matched speed is the rated speed now");
        assertEquals("24", back.value("load.battery.cells"), "and the bank chosen on the match page came along");
        assertEquals("37", back.value("alternator.turnsPerCoil"));
    }

    @Test
    void a_bad_battery_on_the_match_page_is_named_beside_its_field() {
        Html match = get(results(37).id("next-wind").attr("href"), 200);
        Map<String, String> f = windFields(match);
        f.put("load.battery.cells", "0");
        Html rejected = post("/match/wind", f, 400);
        assertTrue(rejected.error("load.battery.cells").startsWith("load.battery.cells = 0"), rejected.error("load.battery.cells"));
        assertEquals("0", rejected.value("load.battery.cells"));
        assertFalse(rejected.value("design").isEmpty(), "the design stays in the form");
    }

    @Test
    void the_hydro_match_takes_the_design_handed_on() {
        Html match = get(results(37).id("next-hydro").attr("href"), 200);
        assertTrue(match.id("machine").text().contains("37 turns per coil"));
        Html result = post("/match/hydro", formOf(match, "main form"), 200);
        assertTrue(result.has("results"));
        assertTrue(get(unitsLink(result, "si"), 200).has("results"));
    }

    private static Response save(Html results, String title) {
        Map<String, String> f = formOf(results, "#save-design");
        f.put("title", title);
        f.put("notes", "Bench notes");
        return given().formParams(f).post("/saved");
    }

    @Test
    void saving_from_the_results_page_shows_the_full_link_and_the_token_once_and_revising_goes_through_the_form() {
        Response r = save(results(37), "Workshop alternator");
        r.then().statusCode(201).header("Cache-Control", "no-store");
        Html created = Html.of(r);
        String link = created.value("permalink");
        assertTrue(link.matches("http://127\\.0\\.0\\.1:\\d+/d/[A-Za-z0-9_-]+"), link);
        String token = created.value("edit-token");
        assertEquals(43, token.length());
        assertTrue(created.id("edit-token").parent().parent().text().contains("shown only this once"));
        assertEquals(1, created.all("script[src=/static/js/copy.js]").size());
        assertTrue(created.all("script:not([src])").isEmpty(), "no inline script");
        String path = link.substring(link.indexOf("/d/"));
        assertEquals(200, given().get(unitsLink(created, "imperial")).statusCode());

        Html saved = get(path, 200);
        assertEquals("Workshop alternator", saved.doc().selectFirst("h1").text());
        assertEquals("37", input(saved, "Winding", "Turns per coil").isEmpty() ? input(saved, "Machine", "Turns per coil")
                : input(saved, "Winding", "Turns per coil"));
        assertEquals("Star (Y)", input(saved, "Machine", "Connection"));
        assertEquals("10 mm", input(saved, "Rotor and magnets", "Magnet thickness"));
        assertEquals("0.3937 in", input(get(path + "?units=imperial", 200), "Rotor and magnets", "Magnet thickness"));
        assertEquals("12", input(saved, "Battery", "Cells"));
        String revise = saved.id("next-revise").attr("href");
        Html form = get(revise, 200);
        assertEquals("37", form.value("alternator.turnsPerCoil"));
        assertEquals("Workshop alternator", form.value("revision.title"));

        Map<String, String> f = formOf(form, "main form");
        f.put("alternator.turnsPerCoil", "41");
        f.put("editToken", "not-the-token");
        Html refused = post(revise, f, 403);
        assertFalse(refused.error("editToken").isEmpty(), "a wrong token is named beside its field");
        assertEquals("41", refused.value("alternator.turnsPerCoil"), "the input is kept");
        assertEquals("", refused.value("editToken"), "the token is never written back into the page");

        f.put("editToken", token);
        f.put("alternator.turnsPerCoil", "0");
        Html invalid = post(revise, f, 400);
        assertTrue(invalid.error("alternator.turnsPerCoil").startsWith("alternator.turnsPerCoil = 0"),
                invalid.error("alternator.turnsPerCoil"));
        assertEquals("0", invalid.value("alternator.turnsPerCoil"));

        f.put("alternator.turnsPerCoil", "41");
        f.put("revision.title", "Workshop alternator, 41 turns");
        Response done = given().redirects().follow(false).formParams(f).post(revise);
        assertEquals(303, done.statusCode());
        Html second = get(done.header("Location"), 200);
        assertEquals("2", second.doc().selectFirst(".revision-line strong").text());
        assertEquals("Workshop alternator, 41 turns", second.doc().selectFirst("h1").text());
        assertEquals("41", get(second.id("next-change").attr("href"), 200).value("alternator.turnsPerCoil"));

        Html compare = get(second.all(".history a[href^=/compare]").get(0).attr("href"), 200);
        Element efficiency = compare.all("table.compare-results tr").stream()
                .filter(row -> row.text().startsWith("Efficiency at rated speed")).findFirst().orElseThrow();
        assertEquals("%", efficiency.child(1).text(), "efficiency as a percentage");
        Element cutIn = compare.all("table.compare-results tr").stream()
                .filter(row -> row.text().startsWith("Cut-in speed (differs)")).findFirst().orElseThrow();
        double first = Double.parseDouble(cutIn.child(2).text());
        double then = Double.parseDouble(cutIn.child(3).text());
        assertTrue(then < first, "more turns cut in sooner");
        assertTrue(cutIn.selectFirst(".difference").text().startsWith("-"), cutIn.text());
        assertEquals(String.format(java.util.Locale.ROOT, "%+.1f %%", 100 * (then - first) / first),
                cutIn.selectFirst(".change").text(), cutIn.text());
    }

    @Test
    void the_rewind_pages_reached_by_post_switch_units_by_get_with_the_input_converted() {
        Html form = get("/rewind", 200);
        Map<String, String> plan = formOf(form, "form[action=/rewind]");
        plan.put("machine.measurements.measuredTemperatureC", "25");
        Html planned = post("/rewind", plan, 200);
        Html imperial = get(unitsLink(planned, "imperial"), 200);
        assertTrue(imperial.has("results"), "the plan is shown again");
        assertEquals("77", imperial.value("machine.measurements.measuredTemperatureC"), "25 °C is 77 °F");
        assertEquals(planned.id("derived").text(), imperial.id("derived").text());

        Html options = post("/rewind/stator-options", formOf(form, "form[action=/rewind/stator-options]"), 200);
        assertTrue(get(unitsLink(options, "imperial"), 200).has("stator-options"));
    }

    @Test
    void a_rewind_option_opens_as_the_machine_on_the_bench_and_evaluates_with_its_measured_resistance() {
        Html planned = post("/rewind", formOf(get("/rewind", 200), "form[action=/rewind]"), 200);
        Html form = get(planned.all("#reconnections td a").get(0).attr("href"), 200);
        assertEquals("AXIAL_DUAL", form.selected("topology"), "the example's coils are air-cored");
        Html results = post("/design", formOf(form, "main form"), 200);
        // 1.45 Ω between two line leads of a star winding at 20 °C is 0.725 Ω a phase; the coils' mean turn is sized
        // to it, so the evaluation's cold resistance is the measured one (to the 3 figures shown)
        String note = results.id("hot-resistance").selectFirst(".note").text();
        assertTrue(note.contains("(0.725 Ω at 20 °C)"), note);

        Map<String, String> slotted = formOf(get("/rewind", 200), "form[action=/rewind]");
        slotted.put("machine.slots", "36");
        slotted.put("machine.poles", "4");
        slotted.put("machine.measurements.measuredFrequencyHz", "10");
        slotted.put("machine.layers", "DOUBLE");
        slotted.put("machine.coilWindow.kind", "SLOTTED");
        slotted.put("machine.turnsPerCoil", "20");
        slotted.put("machine.measurements.lineResistanceOhm", "4.0");
        Html motor = get(post("/rewind", slotted, 200).all("#reconnections td a").get(0).attr("href"), 200);
        assertEquals("RADIAL_INNER", motor.selected("topology"), "a motor stator opens as a slotted radial machine");
        assertEquals("36", motor.value("alternator.winding.slots"));
        String motorNote = post("/design", formOf(motor, "main form"), 200).id("hot-resistance").selectFirst(".note").text();
        // 4.0 Ω line is 2.0 Ω a phase; the guessed slots' end-turn span is estimated at mid-slot and the dimensions
        // are written to 0.01 mm, so the stack that gives the measured turn is within 2 %
        double cold = Double.parseDouble(motorNote.substring(motorNote.indexOf('(') + 1, motorNote.indexOf(" Ω at 20")));
        assertEquals(2.0, cold, 0.04, motorNote);
    }

    /** A saved design's input, by its group and label; empty when absent. */
    private static String input(Html page, String group, String label) {
        return page.all("#design-inputs table").stream().filter(t -> t.selectFirst("caption").text().equals(group))
                .flatMap(t -> t.select("tr").stream()).filter(r -> r.selectFirst("th").text().equals(label))
                .map(r -> r.selectFirst("td").text()).findFirst().orElse("");
    }

    private static String row(Html page, String table, String label) {
        return page.all("#" + table + " tr").stream().filter(r -> r.selectFirst("th").text().equals(label))
                .findFirst().orElseThrow(() -> new AssertionError("no row " + label)).selectFirst("td").text();
    }

    private static double leading(String text) {
        return Double.parseDouble(text.substring(0, text.indexOf(' ')));
    }

    @Test
    void the_bench_sheet_lists_what_to_wind_and_what_to_measure_at_a_chosen_test_speed() {
        Html bench = get(results(37).id("next-bench").attr("href"), 200);
        assertEquals("37", row(bench, "bench-build", "Turns per coil"));
        assertEquals("Star (Y)", row(bench, "bench-build", "Connection"));
        double rPhase = leading(row(bench, "bench-check", "Resistance of one phase at 20 °C"));
        double rLine = leading(row(bench, "bench-check", "Resistance between two line leads at 20 °C"));
        // common practice: in star the meter between two line leads reads two phases in series
        assertEquals(2 * rPhase, rLine, 0.01 * rLine);
        assertTrue(bench.id("leads").text().startsWith("Star (Y): join the finishes"));
        assertTrue(bench.id("connection-sketch").selectFirst("title").text().startsWith("Star (Y)"), "the lead sketch is a star");
        assertEquals(3, bench.id("connection-sketch").select("g[fill=#fff] circle").size(), "three line leads");
        assertFalse(bench.all(".phase-order li").isEmpty());
        assertFalse(bench.all("figure.unrolled").isEmpty());

        Map<String, String> f = formOf(bench, ".test-speed");
        f.put("testRpm", "200");
        Html at200 = Html.of(given().queryParams(f).get("/design/bench").then().statusCode(200).extract().response());
        f.put("testRpm", "400");
        Html at400 = Html.of(given().queryParams(f).get("/design/bench").then().statusCode(200).extract().response());
        String label = "Open-circuit line voltage at the test speed";
        assertEquals(2 * leading(row(at200, "bench-check", label)), leading(row(at400, "bench-check", label)),
                0.01 * leading(row(at400, "bench-check", label)), "the open-circuit voltage is proportional to speed");
        f.put("testRpm", "-5");
        given().queryParams(f).get("/design/bench").then().statusCode(400);
    }

    @Test
    void a_carried_design_that_cannot_be_read_is_a_400_naming_it() {
        Html page = get("/design/results?design=not-a-design", 400);
        assertTrue(page.text().contains("cannot be read"), page.text());
        Map<String, String> f = new HashMap<>();
        f.put("design", "AAAA");
        given().formParams(f).post("/saved").then().statusCode(400);
    }
}
