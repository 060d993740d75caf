package coilwright.web.match;

import coilwright.web.TestApp;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.util.HashMap;
import java.util.Map;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.startsWith;

class MatchPagesTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    private static Map<String, String> windForm() {
        Map<String, String> f = new HashMap<>();
        f.put("example", "axial-wind-24v");
        f.put("rotor.diameterM", "3.6");
        f.put("rotor.bladeCount", "3");
        f.put("rotor.cpMax", "0.42");
        f.put("rotor.tipSpeedRatioOpt", "6.5");
        f.put("rotor.maxRotorSpeedRpm", "450");
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
        given().queryParam("example", "axial-wind-24v").get("/match/wind").then().statusCode(200)
                .contentType(startsWith("text/html"))
                .body(containsString("Axial-flux alternator for a 3 m wind rotor"))
                .body(containsString("id=\"rotor.diameterM\" name=\"rotor.diameterM\" value=\"3.0\""))
                .body(not(containsString("id=\"results\"")));
    }

    @Test
    void an_unknown_example_is_a_404_page() {
        given().queryParam("example", "no-such-design").get("/match/wind").then().statusCode(404)
                .contentType(startsWith("text/html"));
    }

    @Test
    void a_valid_wind_form_shows_charts_the_energy_table_and_the_cautions() {
        given().formParams(windForm()).post("/match/wind").then().statusCode(200)
                .body(containsString("id=\"results\""))
                .body(containsString("<svg"))
                .body(containsString("Alternator demand at the rotor shaft"))
                .body(containsString("id=\"energy\""))
                .body(containsString("Open-circuit"))
                .body(containsString("kWh"));
    }

    @Test
    void a_bad_wind_form_comes_back_with_the_messages_beside_the_fields() {
        Map<String, String> f = windForm();
        f.put("rotor.cpMax", "0.7");
        f.put("rotor.diameterM", "-1");
        given().formParams(f).post("/match/wind").then().statusCode(400)
                .body(containsString("error-summary"))
                .body(containsString("Betz"))
                .body(containsString("rotor.diameterM = -1"))
                .body(containsString("value=\"0.7\""));
    }

    @Test
    void a_rotor_that_never_reaches_cut_in_is_a_422_with_the_reason() {
        Map<String, String> f = windForm();
        f.put("rotor.maxRotorSpeedRpm", "40");
        given().formParams(f).post("/match/wind").then().statusCode(422)
                .body(containsString("never delivers power"));
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
        given().get("/match/hydro").then().statusCode(200)
                .body(containsString("name=\"site.flowDuration[3].percentOfTime\""))
                .body(containsString("<option value=\"CROSSFLOW\">CROSSFLOW</option>"));
    }

    @Test
    void a_valid_hydro_form_shows_the_runaway_voltage_first() {
        given().formParams(hydroForm()).post("/match/hydro").then().statusCode(200)
                .body(containsString("id=\"runaway\""))
                .body(containsString("Runaway: 1800 rpm at the runner"))
                .body(containsString("Runner at design flow"))
                .body(containsString("kWh (flow-duration curve)"));
    }

    @Test
    void a_head_too_high_for_the_runner_kind_is_marked_beside_the_head() {
        Map<String, String> f = hydroForm();
        f.put("runner.kind", "CROSSFLOW");
        f.put("runner.jetCount", "1");
        f.put("site.grossHeadM", "300");
        given().formParams(f).post("/match/hydro").then().statusCode(400)
                .body(containsString("site.grossHeadM = 300"))
                .body(containsString("CROSSFLOW runner"));
    }
}
