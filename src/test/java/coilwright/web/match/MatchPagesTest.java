package coilwright.web.match;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.web.Html;
import coilwright.web.TestApp;
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
        f.put("site.designFlowM3s", "0.012");
        f.put("site.flowDuration", "");
        f.put("site.flowDuration[0].flowM3s", "0.02");
        f.put("site.flowDuration[0].percentOfTime", "0");
        f.put("site.flowDuration[1].flowM3s", "0.006");
        f.put("site.flowDuration[1].percentOfTime", "100");
        f.put("penstock.lengthM", "150");
        f.put("penstock.innerDiameterM", "0.09");
        f.put("penstock.roughnessM", "0.0000015");
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
}
