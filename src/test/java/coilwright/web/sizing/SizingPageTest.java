package coilwright.web.sizing;

import coilwright.web.Html;
import coilwright.web.TestApp;
import io.restassured.response.Response;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The sizing page through the real app, parsed with jsoup. */
class SizingPageTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    /** Near the worked example's space: one 390 mm disc, a 16 mm stator, 16 poles, 16 to 24 turns of AWG 13. */
    private static Map<String, String> small() {
        Map<String, String> form = new HashMap<>(SizingForm.defaults());
        form.putAll(Map.of("minPoles", "16", "maxPoles", "16", "minTurns", "16", "maxTurns", "24",
                "thickestAwg", "13", "thinnestAwg", "13"));
        return form;
    }

    /** The page a search ends on: inline, or the job's page once it is done. */
    private static Html sized(Map<String, String> form) throws InterruptedException {
        Response r = given().redirects().follow(false).formParams(form).post("/sizing");
        if (r.statusCode() == 200) {
            return Html.of(r);
        }
        assertEquals(303, r.statusCode(), r.asString());
        String job = r.header("Location");
        for (int i = 0; i < 600; i++) {
            Response page = given().get(job);
            if (page.header("Refresh") == null) {
                return Html.of(page);
            }
            Thread.sleep(500);
        }
        throw new AssertionError("the search did not finish");
    }

    @Test
    void the_home_page_menu_leads_to_the_form_with_defaults_in_the_trade_s_units() {
        Html home = Html.of(given().get("/").then().statusCode(200).extract().response());
        assertFalse(home.all("nav a[href=/sizing]").isEmpty(), "the menu links to the sizing page");
        Html page = Html.of(given().get("/sizing").then().statusCode(200).contentType(startsWith("text/html"))
                .extract().response());
        assertEquals("3", page.value("rotorDiameterM"));
        assertEquals("m", page.unit("rotorDiameterM"));
        assertEquals("L/s", page.unit("flowLps"));
        assertEquals("24", page.value("batteryV"));
        assertEquals("WIND", page.selected("driveType"));
        assertTrue(page.all("script:not([src])").isEmpty(), "no inline script");
        assertTrue(page.all("[style]").isEmpty(), "no inline style");
        assertFalse(page.all("script[src=/static/js/sort-table.js]").isEmpty());
        given().get("/static/js/sort-table.js").then().statusCode(200);
    }

    @Test
    void a_search_shows_ranked_designs_each_ready_to_open_on_the_design_pages() throws InterruptedException {
        Html page = sized(small());
        List<Element> rows = page.all("#designs tbody tr.design");
        assertFalse(rows.isEmpty());
        assertTrue(rows.size() <= 10, "the page asks for the ten best");
        for (int i = 0; i < rows.size(); i++) {
            assertEquals(Integer.toString(i + 1), rows.get(i).attr("data-rank"), "best first");
        }
        Element first = rows.get(0);
        String turns = first.select("td").get(2).text();
        assertTrue(Integer.parseInt(turns) >= 16 && Integer.parseInt(turns) <= 24, turns);
        assertTrue(List.of("star", "delta").contains(first.select("td").get(4).text()));
        assertTrue(first.selectFirst("td.cut-in").text().matches("\\d+ rpm \\d\\.\\d m/s"), first.text());
        assertTrue(Double.parseDouble(first.attr("data-cut-in")) > 0);
        // the row carries the whole design to the design results (POST /design) and to the design form
        Element open = first.selectFirst("form.open-design");
        assertEquals("/design", open.attr("action"));
        Map<String, String> fields = new HashMap<>();
        open.select("input[type=hidden]").forEach(i -> fields.put(i.attr("name"), i.attr("value")));
        assertEquals(turns, fields.get("alternator.turnsPerCoil"));
        Html results = Html.of(given().formParams(fields).post("/design").then().statusCode(200).extract().response());
        String cutIn = results.id("cut-in").selectFirst(".value").text();
        assertEquals(first.selectFirst("td.cut-in span").text(), cutIn, "the design page finds the same cut-in");
        assertTrue(first.selectFirst("a.edit-design").attr("href").startsWith("/design/new?"));
        Html form = Html.of(given().get(first.selectFirst("a.edit-design").attr("href")).then().statusCode(200)
                .extract().response());
        assertEquals(turns, form.value("alternator.turnsPerCoil"));
        String document = first.selectFirst("form.save-design input[name=document]").attr("value");
        Html saved = Html.of(given().formParam("document", document).post("/saved").then().statusCode(201)
                .extract().response());
        assertTrue(saved.text().contains("Sized design 1"), "saved under its title");
        assertFalse(page.all("#pareto svg").isEmpty(), "the Pareto chart is drawn");
        assertTrue(page.all("#limits li[data-limit=cutInWindSpeed]").text().contains("3.5 m/s"),
                page.all("#limits li").text());
        assertTrue(page.id("counts").text().matches("(?s)\\d+ layouts drafted, \\d+ searched.*\\d+ candidates in the space.*"),
                page.id("counts").text());
    }

    @Test
    void a_large_search_shows_a_refreshing_progress_page_that_can_stop_it() {
        Map<String, String> form = new HashMap<>(SizingForm.defaults());
        form.putAll(Map.of("discDiameterMm", "360, 390, 420", "coilThicknessMm", "13, 18", "minPoles", "12",
                "maxPoles", "20", "minTurns", "10", "maxTurns", "120", "thinnestAwg", "20", "maxStrands", "3"));
        Response started = given().redirects().follow(false).formParams(form).post("/sizing");
        assertEquals(303, started.statusCode());
        String job = started.header("Location");
        assertTrue(job.matches("/sizing/jobs/[0-9a-f]{32}"), job);
        Response progress = given().get(job);
        assertEquals("2", progress.header("Refresh"), "refreshes itself without JavaScript");
        Html page = Html.of(progress);
        assertFalse(page.all("progress#search-progress").isEmpty());
        assertTrue(page.id("progress").text().contains("863136 candidates"), page.id("progress").text());
        String cancel = page.all("#progress form").first().attr("action");
        given().redirects().follow(false).post(cancel).then().statusCode(303);
        Html stopped = Html.of(given().get(job).then().statusCode(200).extract().response());
        assertTrue(stopped.id("stopped").text().contains("cancelled by the client"), stopped.id("stopped").text());
        given().get("/sizing/jobs/0123456789abcdef0123456789abcdef").then().statusCode(404)
                .contentType(startsWith("text/html"));
    }

    @Test
    void a_requirement_nothing_meets_is_explained_by_its_nearest_miss() throws InterruptedException {
        Map<String, String> form = small();
        form.put("maxCurrentDensity", "2");
        Html page = sized(form);
        assertTrue(page.has("none-found"));
        Element miss = page.all("#near-misses li").first();
        assertEquals("currentDensity", miss.attr("data-limit"));
        assertTrue(miss.text().startsWith("Nothing that stays within 2.0 A/mm^2"), miss.text());
        assertTrue(miss.text().contains("the closest needs"), miss.text());
    }

    @Test
    void magnets_that_suit_no_layout_are_said_to_be_the_reason() throws InterruptedException {
        Map<String, String> form = small();
        form.put("magnetWidthMm", "150");
        Html page = sized(form);
        assertTrue(page.has("none-found"));
        assertTrue(page.id("layouts").text().contains("set aside: magnets do not fit"), page.id("layouts").text());
        assertTrue(page.all("ul.notes li").stream().anyMatch(li -> li.text().startsWith("No layout could be built")));
    }

    @Test
    void bad_fields_come_back_beside_their_fields_in_the_form() {
        Map<String, String> form = small();
        form.put("rotorDiameterM", "-3");
        form.put("batteryV", "25");
        form.put("flowLps", "lots");
        form.put("magnetWidthMm", "0.5");
        Html page = Html.of(given().formParams(form).post("/sizing").then().statusCode(400)
                .contentType(startsWith("text/html")).extract().response());
        assertTrue(page.error("batteryV").contains("whole number of 2.0 V cells"), page.error("batteryV"));
        assertEquals("25", page.value("batteryV"), "the input as typed");
        form.put("batteryV", "24");
        page = Html.of(given().formParams(form).post("/sizing").then().statusCode(400).extract().response());
        assertTrue(page.error("rotorDiameterM").contains("drive.rotor.diameterM"), page.error("rotorDiameterM"));
        assertTrue(page.error("magnetWidthMm").startsWith("0.5 mm is out of range"), page.error("magnetWidthMm"));
        assertTrue(page.error("magnetWidthMm").contains("build.magnets[0].widthM"), page.error("magnetWidthMm"));
        assertTrue(page.error("magnetWidthMm").contains("0.002"), page.error("magnetWidthMm"));
        assertEquals("", page.error("flowLps"), "hydro fields are not read for a wind drive");
    }

    @Test
    void winding_temperature_and_cogging_limits_are_applied_and_each_design_shows_both() throws InterruptedException {
        Map<String, String> form = small();
        form.put("maxWindingTempC", "160");
        form.put("maxCoggingPct", "5");
        Html page = sized(form);
        assertFalse(page.all("#limits li[data-limit=windingTemperature]").isEmpty(), page.all("#limits li").text());
        assertFalse(page.all("#limits li[data-limit=cogging]").isEmpty(), page.all("#limits li").text());
        assertTrue(page.all("#limits li[data-limit=currentDensity]").isEmpty(), "the temperature replaces the band");
        List<Element> rows = page.all("#designs tbody tr.design");
        assertFalse(rows.isEmpty());
        for (Element r : rows) {
            double hot = Double.parseDouble(r.attr("data-hot-spot"));
            assertTrue(hot > 25 && hot <= 160, r.attr("data-hot-spot"));
            assertTrue(r.selectFirst("td.hot-spot").text().matches("\\d+ °C"), r.selectFirst("td.hot-spot").text());
            assertEquals("none", r.selectFirst("td.cogging").text(), "air-cored coils do not cog");
        }
        form.put("maxWindingTempC", "500");
        form.put("maxCoggingPct", "-1");
        Html bad = Html.of(given().formParams(form).post("/sizing").then().statusCode(400).extract().response());
        assertTrue(bad.error("maxWindingTempC").contains("40") && bad.error("maxWindingTempC").contains("250"),
                bad.error("maxWindingTempC"));
        assertTrue(bad.error("maxCoggingPct").contains("maxCoggingPercent"), bad.error("maxCoggingPct"));
    }

    @Test
    void imperial_entry_is_converted_at_the_edge_and_the_switch_keeps_what_was_typed() throws InterruptedException {
        Html form = Html.of(given().get("/sizing?units=imperial").then().statusCode(200).extract().response());
        assertEquals("ft", form.unit("rotorDiameterM"));
        assertEquals("mph", form.unit("meanWindMs"));
        assertEquals("US gpm", form.unit("flowLps"));
        assertEquals("in", form.unit("magnetWidthMm"));
        assertEquals("per lb", form.unit("copperPrice"));
        assertEquals(3 / 0.3048, Double.parseDouble(form.value("rotorDiameterM")), 1e-3, "3 m in feet");
        assertEquals(5 / 0.44704, Double.parseDouble(form.value("meanWindMs")), 1e-3, "5 m/s in mph");
        String switched = form.all(".units-switch a").stream().filter(a -> a.text().equals("SI")).findFirst()
                .orElseThrow().attr("href");
        Html back = Html.of(given().urlEncodingEnabled(false).get(switched).then().statusCode(200).extract().response());
        assertEquals(3, Double.parseDouble(back.value("rotorDiameterM")), 1e-3, "back in metres");

        Map<String, String> imperial = small();
        imperial.putAll(Map.of("rotorDiameterM", "10", "meanWindMs", "11", "ratedWindMs", "22", "cutInWindMs", "8",
                "discDiameterMm", "15.35", "coilThicknessMm", "0.63", "magnetWidthMm", "1.575",
                "magnetLengthMm", "1.97", "magnetThicknessMm", "0.394", "cableLengthM", "100"));
        Response r = given().redirects().follow(false).queryParam("units", "imperial").formParams(imperial)
                .post("/sizing");
        assertEquals(200, r.statusCode(), r.asString());
        Html page = Html.of(r);
        assertFalse(page.all("#designs tbody tr.design").isEmpty());
        assertTrue(page.all("ul.notes li").stream().anyMatch(li -> li.text().startsWith("Rated wind 22 mph is taken as "
                + "10.0 m/s")), page.all("ul.notes li").text());
        assertTrue(page.all("#designs td.cut-in").first().text().matches("\\d+ rpm \\d+\\.\\d mph"),
                page.all("#designs td.cut-in").first().text());
        imperial.put("rotorDiameterM", "-10");
        Html bad = Html.of(given().queryParam("units", "imperial").formParams(imperial).post("/sizing").then()
                .statusCode(400).extract().response());
        assertTrue(bad.error("rotorDiameterM").startsWith("-10 ft is out of range"), bad.error("rotorDiameterM"));
    }

    @Test
    void a_hydro_site_ranks_by_the_energy_of_its_flow_duration_curve() throws InterruptedException {
        Map<String, String> form = small();
        form.put(SizingForm.DRIVE, "HYDRO");
        form.put("objective", "ANNUAL_ENERGY");
        Html page = sized(form);
        List<Element> rows = page.all("#designs tbody tr.design");
        assertFalse(rows.isEmpty(), page.text());
        double previous = Double.POSITIVE_INFINITY;
        for (Element r : rows) {
            double energy = Double.parseDouble(r.attr("data-energy"));
            assertTrue(energy > 0 && energy <= previous, "best energy first: " + energy);
            previous = energy;
        }
        form.put("flowDuration", "");
        Html none = Html.of(given().formParams(form).post("/sizing").then().statusCode(400).extract().response());
        assertTrue(none.error("objective").contains("flow-duration"), none.error("objective"));
        form.put("flowDuration", "30@0, 15@30, 20@60");
        Html rising = Html.of(given().formParams(form).post("/sizing").then().statusCode(400).extract().response());
        assertTrue(rising.error("flowDuration").contains("flowDuration[2].flowM3s"), rising.error("flowDuration"));
        form.put("flowDuration", "thirty at noon");
        Html unread = Html.of(given().formParams(form).post("/sizing").then().statusCode(400).extract().response());
        assertTrue(unread.error("flowDuration").contains("flow@percent"), unread.error("flowDuration"));
    }

    @Test
    void the_progress_page_follows_the_events_with_a_script_of_its_own_and_refreshes_without_one() {
        Map<String, String> form = new HashMap<>(SizingForm.defaults());
        form.putAll(Map.of("discDiameterMm", "360, 390, 420", "coilThicknessMm", "13, 18", "minPoles", "12",
                "maxPoles", "20", "minTurns", "10", "maxTurns", "120", "thinnestAwg", "20", "maxStrands", "3"));
        String job = given().redirects().follow(false).formParams(form).post("/sizing").then().statusCode(303)
                .extract().header("Location");
        Response plain = given().get(job);
        assertEquals("2", plain.header("Refresh"));
        Html page = Html.of(plain);
        assertEquals(job.substring(job.lastIndexOf('/') + 1), page.id("progress").attr("data-job"));
        assertFalse(page.all("script[src=/static/js/sizing-progress.js]").isEmpty());
        Response live = given().get(job + "?live=1");
        assertEquals(null, live.header("Refresh"), "the script follows the events instead");
        String script = given().get("/static/js/sizing-progress.js").then().statusCode(200).extract().asString();
        assertTrue(script.contains("/api/v1/sizing/jobs/") && script.contains("EventSource"), "served by the service");
        given().redirects().follow(false).post(job + "/cancel").then().statusCode(303);
    }
}
