package coilwright.web.match;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.web.Html;
import coilwright.web.TestApp;
import io.restassured.response.Response;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/** The wind and hydro match pages through the real app (pages parsed with jsoup). */
class MatchPagesTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    private static Html post(String path, Map<String, String> form, int status) {
        return Html.of(given().formParams(form).post(path).then().statusCode(status)
                .contentType(startsWith("text/html")).extract().response());
    }

    private static Map<String, String> windForm() {
        Map<String, String> f = new HashMap<>();
        f.put("example", "axial-wind-48v");
        f.put("rotor.diameterM", "2.6");
        f.put("rotor.bladeCount", "3");
        f.put("rotor.cpMax", "0.42");
        f.put("rotor.tipSpeedRatioOpt", "6.5");
        f.put("rotor.maxRotorSpeedRpm", "550");
        f.put("rotor.driveRatio", "1");
        f.put("rotor.drivetrainEfficiency", "1");
        f.put("site.altitudeM", "0");
        f.put("site.temperatureC", "15");
        f.put("site.airDensityKgM3", "0");
        f.put("wind.meanWindSpeedMs", "5");
        f.put("wind.weibullShapeK", "2");
        return f;
    }

    @Test
    void the_wind_form_starts_from_an_example_design_with_rotor_defaults() {
        Html page = Html.of(given().queryParam("example", "axial-wind-48v").get("/match/wind").then().statusCode(200)
                .contentType(startsWith("text/html")).extract().response());
        assertTrue(page.doc().selectFirst(".lead strong").text().startsWith("Axial-flux alternator for a 2.4 m wind rotor"));
        assertEquals("2.4", page.value("rotor.diameterM"));
        assertEquals("6.5", page.value("rotor.tipSpeedRatioOpt"));
        assertFalse(page.value("design").isEmpty(), "the example's design rides in a hidden field");
        assertEquals("16", page.value("load.battery.cells"), "its battery is editable here");
        assertFalse(page.has("results"));
    }

    @Test
    void every_example_design_is_offered_on_both_match_pages() {
        List<String> slugs = APP.app().services().examples().slugs();
        for (String path : List.of("/match/wind", "/match/hydro")) {
            Html page = Html.of(given().get(path).then().statusCode(200).extract().response());
            assertEquals(slugs.stream().map(s -> path + "?example=" + s).toList(), page.all(".example-link").eachAttr("href"), path);
        }
    }

    @Test
    void an_unknown_example_is_a_404_page() {
        given().queryParam("example", "no-such-design").get("/match/wind").then().statusCode(404)
                .contentType(startsWith("text/html"));
    }

    @Test
    void a_valid_wind_form_shows_charts_the_energy_table_and_the_cautions() {
        Html page = post("/match/wind", windForm(), 200);
        assertTrue(page.has("results"));
        assertEquals(2, page.all("#results .chart svg").size());
        String field = page.all("#results .chart svg").get(0).text();
        assertTrue(field.contains("Operating line through the rotor's torque field"), field);
        assertTrue(field.contains("Alternator's torque (operating line)") && field.contains("Wind speed (m/s)"), field);
        assertTrue(field.contains("6 m/s") && field.contains("10 m/s"), "the matched points carry their wind speeds");
        assertTrue(page.all("#results .chart svg").get(1).text().contains("Ideal rotor (best tip-speed ratio)"));
        assertFalse(page.all("#energy tbody tr").isEmpty());
        assertTrue(page.id("annual-energy").selectFirst(".value").text().endsWith("kWh"));
        assertTrue(page.all(".cautions-list .caution").eachText().stream()
                .anyMatch(t -> t.contains("Open-circuit line voltage")), "the open-circuit voltage caution");
        assertTrue(page.has("starts-turning") && page.has("delivered-energy"), "starting wind and delivered energy");
        assertEquals("2.6", page.value("rotor.diameterM"), "the form keeps what was entered");
    }

    @Test
    void a_bad_wind_form_comes_back_with_the_messages_beside_the_fields() {
        Map<String, String> f = windForm();
        f.put("rotor.cpMax", "0.7");
        f.put("rotor.diameterM", "-1");
        Html page = post("/match/wind", f, 400);
        assertFalse(page.summary().isEmpty());
        assertTrue(page.error("rotor.cpMax").contains("Betz"), page.error("rotor.cpMax"));
        assertTrue(page.error("rotor.diameterM").startsWith("rotor.diameterM = -1"), page.error("rotor.diameterM"));
        assertEquals("0.7", page.value("rotor.cpMax"));
        assertFalse(page.has("results"));
    }

    @Test
    void a_rotor_that_never_reaches_cut_in_is_a_422_with_the_reason_beside_the_design() {
        Map<String, String> f = windForm();
        f.put("rotor.maxRotorSpeedRpm", "40");
        Html page = post("/match/wind", f, 422);
        assertTrue(page.id("design-error").text().contains("never delivers power"), page.id("design-error").text());
        assertEquals("40", page.value("rotor.maxRotorSpeedRpm"));
    }

    @Test
    void an_unknown_example_in_a_posted_form_is_named_beside_the_choice() {
        Map<String, String> f = windForm();
        f.put("example", "no-such-design");
        Html page = post("/match/wind", f, 400);
        assertTrue(page.summary().get(0).startsWith("example = \"no-such-design\": must name one of the example designs"),
                page.summary().toString());
    }

    private static Map<String, String> hydroForm() {
        Map<String, String> f = new HashMap<>();
        f.put("example", "radial-hydro-48v");
        f.put("site.grossHeadM", "28");
        f.put("site.designFlowM3s", "12");
        f.put("site.flowDuration", "");
        f.put("site.flowDuration[0].flowM3s", "20");
        f.put("site.flowDuration[0].percentOfTime", "0");
        f.put("site.flowDuration[1].flowM3s", "6");
        f.put("site.flowDuration[1].percentOfTime", "100");
        f.put("penstock.lengthM", "150");
        f.put("penstock.innerDiameterM", "90");
        f.put("penstock.roughnessM", "0.0015");
        f.put("penstock.hazenWilliamsC", "150");
        f.put("penstock.sumMinorLossK", "2.5");
        f.put("runner.kind", "IMPULSE");
        f.put("runner.jetCount", "2");
        f.put("runner.diameterM", "0");
        f.put("runner.targetSpeedRpm", "900");
        f.put("runner.peakEfficiency", "0");
        f.put("driveRatio", "1");
        f.put("drivetrainEfficiency", "0.95");
        f.put("waterTempC", "10");
        return f;
    }

    @Test
    void the_hydro_form_renders_with_its_flow_duration_rows() {
        Html page = Html.of(given().get("/match/hydro").then().statusCode(200).extract().response());
        assertTrue(page.has("site.flowDuration[3].percentOfTime"));
        assertTrue(page.options("runner.kind").contains("CROSSFLOW"));
        assertFalse(page.value("design").isEmpty());
    }

    @Test
    void a_valid_hydro_form_shows_the_runaway_voltage_first() {
        Html page = post("/match/hydro", hydroForm(), 200);
        assertTrue(page.id("runaway").text().startsWith("Runaway: 1800 rpm at the runner"), page.id("runaway").text());
        assertTrue(page.text().contains("Runner at design flow"));
        assertEquals("from the flow-duration curve", page.id("annual-energy").selectFirst(".note").text());
        assertTrue(page.id("matched-speed").selectFirst(".value").text().endsWith("rpm"));
    }

    @Test
    void a_head_too_high_for_the_runner_kind_is_marked_beside_the_head() {
        Map<String, String> f = hydroForm();
        f.put("runner.kind", "CROSSFLOW");
        f.put("runner.jetCount", "1");
        f.put("site.grossHeadM", "300");
        Html page = post("/match/hydro", f, 400);
        assertTrue(page.error("site.grossHeadM").startsWith("site.grossHeadM = 300"), page.error("site.grossHeadM"));
        assertTrue(page.error("site.grossHeadM").contains("CROSSFLOW runner"));
        assertEquals("CROSSFLOW", page.selected("runner.kind"));
    }

    private static Html get(String pathAndQuery) {
        return Html.of(given().urlEncodingEnabled(false).get(pathAndQuery).then().statusCode(200)
                .contentType(startsWith("text/html")).extract().response());
    }

    @Test
    void the_hydro_form_asks_for_the_stream_in_litres_per_second_and_the_pipe_in_millimetres() {
        Html page = get("/match/hydro");
        assertEquals("12", page.value("site.designFlowM3s"));
        assertEquals("L/s", page.unit("site.designFlowM3s"));
        assertEquals("L/s", page.unit("site.flowDuration[0].flowM3s"));
        assertEquals("90", page.value("penstock.innerDiameterM"));
        assertEquals("mm", page.unit("penstock.innerDiameterM"));
        assertEquals("0.0015", page.value("penstock.roughnessM"));
        assertEquals("m", page.unit("site.grossHeadM"));
    }

    @Test
    void in_imperial_the_match_forms_take_feet_miles_per_hour_and_gallons_per_minute() {
        Html hydro = get("/match/hydro?units=imperial");
        // 28 m / 0.3048 = 91.8635 ft; 12 L/s / 0.0630901964 = 190.204 US gpm; 90 mm / 25.4 = 3.54331 in (NIST SP 811)
        assertEquals("91.8635", hydro.value("site.grossHeadM"));
        assertEquals("ft", hydro.unit("site.grossHeadM"));
        assertEquals("190.204", hydro.value("site.designFlowM3s"));
        assertEquals("US gpm", hydro.unit("site.designFlowM3s"));
        assertEquals("3.54331", hydro.value("penstock.innerDiameterM"));
        assertEquals("in", hydro.unit("penstock.innerDiameterM"));
        assertEquals("50", hydro.value("waterTempC"), "10 °C is 50 °F");
        Html wind = get("/match/wind?units=imperial");
        assertEquals("7.87402", wind.value("rotor.diameterM"), "2.4 m rotor in feet");
        assertEquals("11.1847", wind.value("wind.meanWindSpeedMs"), "5 m/s in mph");
        assertEquals("mph", wind.unit("wind.meanWindSpeedMs"));
    }

    @Test
    void an_imperial_hydro_form_is_matched_as_the_same_stream_in_si() {
        Html si = post("/match/hydro", hydroForm(), 200);
        Map<String, String> f = hydroForm();
        f.put("site.grossHeadM", "91.8635");
        f.put("site.designFlowM3s", "190.204");
        f.put("site.flowDuration[0].flowM3s", "317.006");
        f.put("site.flowDuration[1].flowM3s", "95.1019");
        f.put("penstock.lengthM", "492.126");
        f.put("penstock.innerDiameterM", "3.54331");
        f.put("penstock.roughnessM", "0.0000590551");
        f.put("waterTempC", "50");
        Html imperial = Html.of(given().cookie("coilwright-units", "imperial").formParams(f).post("/match/hydro")
                .then().statusCode(200).extract().response());
        String speed = si.id("matched-speed").selectFirst(".value").text();
        assertEquals(speed, imperial.id("matched-speed").selectFirst(".value").text());
        assertTrue(imperial.id("net-head").selectFirst(".value").text().endsWith(" ft"),
                imperial.id("net-head").selectFirst(".value").text());
        assertEquals("190.204", imperial.value("site.designFlowM3s"), "the form keeps what was typed");
    }

    @Test
    void the_units_switch_on_a_hydro_result_converts_what_was_typed_and_keeps_the_result() {
        Html si = post("/match/hydro", hydroForm(), 200);
        String imperialLink = si.doc().select(".units-switch a").get(1).attr("href");
        Html imperial = get(imperialLink);
        assertEquals("190.204", imperial.value("site.designFlowM3s"));
        assertEquals("3.54331", imperial.value("penstock.innerDiameterM"));
        assertEquals(si.id("matched-speed").selectFirst(".value").text(),
                imperial.id("matched-speed").selectFirst(".value").text());
        Html back = get(imperial.doc().select(".units-switch a").get(0).attr("href"));
        assertEquals("12", back.value("site.designFlowM3s"), "and back to L/s as typed");
    }

    @Test
    void a_stream_typed_in_cubic_metres_a_second_gets_a_hint_with_the_litres_probably_meant() {
        Map<String, String> f = hydroForm();
        f.put("site.designFlowM3s", "0.012");
        f.put("penstock.innerDiameterM", "0.09");
        Response r = given().formParams(f).post("/match/hydro");
        Html page = Html.of(r);
        assertEquals("0.012 L/s is unusual here: if it was in m³/s, did you mean 12 L/s?",
                page.id("site.designFlowM3s-hint").text());
        assertEquals("0.09 mm is unusual here: if it was in m, did you mean 90 mm?",
                page.id("penstock.innerDiameterM-hint").text());
        assertEquals("0.012", page.value("site.designFlowM3s"), "nothing is changed behind the user's back");
        Html ordinary = post("/match/hydro", hydroForm(), 200);
        assertTrue(ordinary.all(".unit-hint").isEmpty(), "12 L/s and 90 mm need no hint");
    }

    @Test
    void a_rotor_typed_in_millimetres_gets_a_hint() {
        Map<String, String> f = windForm();
        f.put("rotor.diameterM", "2400");
        Html page = Html.of(given().formParams(f).post("/match/wind"));
        assertEquals("2400 m is unusual here: if it was in mm, did you mean 2.4 m?", page.id("rotor.diameterM-hint").text());
    }

    @Test
    void a_number_too_large_for_a_double_is_refused_under_its_field_in_either_units() {
        Map<String, String> f = hydroForm();
        f.put("site.designFlowM3s", "1e999");
        Html page = post("/match/hydro", f, 400);
        assertTrue(page.error("site.designFlowM3s").startsWith("site.designFlowM3s"), page.error("site.designFlowM3s"));
        Map<String, String> w = windForm();
        w.put("rotor.diameterM", "1e999");
        assertTrue(post("/match/wind", w, 400).error("rotor.diameterM").startsWith("rotor.diameterM"));
        given().urlEncodingEnabled(true).queryParam("rotor.diameterM", "1e999").queryParam("enteredIn", "si")
                .queryParam("units", "imperial").get("/match/wind").then().statusCode(400);
    }
}
