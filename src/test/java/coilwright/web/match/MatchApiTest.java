package coilwright.web.match;

import coilwright.web.OpenApiContract;
import coilwright.web.TestApp;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import io.restassured.response.Response;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.io.IOException;
import java.io.InputStream;
import java.util.List;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.greaterThan;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasItems;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.lessThanOrEqualTo;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

public class MatchApiTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();
    private static final ObjectMapper JSON = new ObjectMapper();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    static ObjectNode example(String slug) throws IOException {
        try (InputStream in = MatchApiTest.class.getClassLoader().getResourceAsStream("examples/" + slug + ".json")) {
            ObjectNode design = (ObjectNode) JSON.readTree(in).get("design");
            ObjectNode out = JSON.createObjectNode();
            out.set("alternator", design.get("alternator"));
            out.set("load", design.get("load"));
            return out;
        }
    }

    public static ObjectNode windBody() throws IOException {
        ObjectNode b = example("axial-wind-48v");
        ObjectNode rotor = b.putObject("rotor");
        rotor.put("diameterM", 3.6).put("bladeCount", 3);
        rotor.putObject("curve").put("type", "ParametricCp").put("cpMax", 0.42).put("tipSpeedRatioOpt", 6.5);
        rotor.put("maxRotorSpeedRpm", 450).put("driveRatio", 1.0).put("drivetrainEfficiency", 1.0);
        b.putObject("site").put("altitudeM", 300).put("temperatureC", 12).put("airDensityKgM3", 0);
        b.putObject("wind").put("meanWindSpeedMs", 5.0).put("weibullShapeK", 2.0);
        b.put("maxWindSpeedMs", 25);
        return b;
    }

    public static ObjectNode hydroBody() throws IOException {
        ObjectNode b = example("radial-hydro-48v");
        ObjectNode site = b.putObject("site").put("grossHeadM", 28).put("designFlowM3s", 0.012);
        site.putArray("flowDuration").addObject().put("flowM3s", 0.02).put("percentOfTime", 0);
        ((com.fasterxml.jackson.databind.node.ArrayNode) site.get("flowDuration")).addObject().put("flowM3s", 0.006).put("percentOfTime", 100);
        b.putObject("penstock").put("lengthM", 150).put("innerDiameterM", 0.09).put("roughnessM", 1.5e-6)
                .put("hazenWilliamsC", 150).put("sumMinorLossK", 2.5);
        b.putObject("runner").put("kind", "IMPULSE").put("jetCount", 2).put("diameterM", 0).put("targetSpeedRpm", 900)
                .put("peakEfficiency", 0);
        b.put("driveRatio", 1.0).put("drivetrainEfficiency", 0.95).put("waterTempC", 10);
        return b;
    }

    private static Response post(String path, Object body) {
        return given().contentType("application/json").body(body.toString()).post(path);
    }

    @Test
    void a_wind_match_answers_the_documented_result() throws IOException {
        Response r = post("/api/v1/match/wind", windBody());
        r.then().statusCode(200)
                .body("points", hasSize(51))
                .body("rotor", equalTo(null))
                .body("annualEnergy.annualEnergyKWh", greaterThan(0.0))
                .body("matchingPercent", lessThanOrEqualTo(100.0))
                .body("windClass.windClass", equalTo("IV"))
                .body("cautions[0].code", equalTo("OPEN_CIRCUIT_VOLTAGE"));
        OpenApiContract.assertMatches(r, "/api/v1/match/wind", "POST");
    }

    @Test
    void tail_furling_and_availability_travel_with_the_request_and_are_shown_in_the_result() throws IOException {
        ObjectNode b = windBody();
        ((ObjectNode) b.get("rotor")).put("maxRotorSpeedRpm", 0);
        b.putObject("furling").put("type", "TailFurling").put("furlStartMs", 11).put("fullyFurledMs", 16);
        b.put("availability", 0.9);
        Response r = post("/api/v1/match/wind", b);
        r.then().statusCode(200)
                .body("overSpeedControl", containsString("tail furling from 11.0 m/s"))
                .body("energyAssumptions.availability", equalTo(0.9))
                .body("starting.startsTurningAtMs", greaterThan(0.0))
                .body("starting.coggingPeakNm", equalTo(0.0));
        OpenApiContract.assertMatches(r, "/api/v1/match/wind", "POST");
    }

    @Test
    void a_furling_control_out_of_order_is_a_400_naming_its_field() throws IOException {
        ObjectNode b = windBody();
        b.putObject("furling").put("type", "TailFurling").put("furlStartMs", 12).put("fullyFurledMs", 10);
        b.put("availability", 1.5);
        Response r = post("/api/v1/match/wind", b);
        r.then().statusCode(400).body("errors.field", hasItems("furling.fullyFurledMs", "availability"));
        OpenApiContract.assertMatches(r, "/api/v1/match/wind", "POST");
    }

    @Test
    void a_cp_table_travels_with_its_type_and_is_matched() throws IOException {
        ObjectNode b = windBody();
        ObjectNode curve = ((ObjectNode) b.get("rotor")).putObject("curve").put("type", "TableCp");
        curve.putArray("tipSpeedRatios").add(2).add(4).add(6).add(8).add(10).add(11);
        curve.putArray("cps").add(0.1).add(0.3).add(0.42).add(0.35).add(0.1).add(0);
        post("/api/v1/match/wind", b).then().statusCode(200).body("maxCp", greaterThan(0.41));
    }

    @Test
    void bad_wind_input_is_a_400_naming_every_field() throws IOException {
        ObjectNode b = windBody();
        ((ObjectNode) b.get("rotor")).put("diameterM", 0);
        ((ObjectNode) b.get("rotor").get("curve")).put("cpMax", 0.7);
        ((ObjectNode) b.get("wind")).put("meanWindSpeedMs", -2);
        Response r = post("/api/v1/match/wind", b);
        r.then().statusCode(400).contentType(containsString("application/problem+json"))
                .body("errors.field", hasItems("rotor.diameterM", "rotor.curve.cpMax", "wind.meanWindSpeedMs"))
                .body("errors.find { it.field == 'rotor.curve.cpMax' }.message", containsString("Betz"));
        OpenApiContract.assertMatches(r, "/api/v1/match/wind", "POST");
    }

    @Test
    void a_cp_table_out_of_order_names_the_point() throws IOException {
        ObjectNode b = windBody();
        ObjectNode curve = ((ObjectNode) b.get("rotor")).putObject("curve").put("type", "TableCp");
        curve.putArray("tipSpeedRatios").add(2).add(6).add(4);
        curve.putArray("cps").add(0.1).add(0.4).add(0.3);
        post("/api/v1/match/wind", b).then().statusCode(400)
                .body("errors.field", hasItem("rotor.curve.cpTable[2].tipSpeedRatio"));
    }

    @Test
    void a_rotor_governed_below_cut_in_is_a_422() throws IOException {
        ObjectNode b = windBody();
        ((ObjectNode) b.get("rotor")).put("maxRotorSpeedRpm", 50);
        Response r = post("/api/v1/match/wind", b);
        r.then().statusCode(422).body("detail", containsString("never delivers power"));
        OpenApiContract.assertMatches(r, "/api/v1/match/wind", "POST");
    }

    @Test
    void a_hydro_match_answers_the_documented_result_with_the_runaway_voltage() throws IOException {
        Response r = post("/api/v1/match/hydro", hydroBody());
        r.then().statusCode(200)
                .body("runnerKind", equalTo("IMPULSE"))
                .body("optimumRunnerSpeedRpm", org.hamcrest.Matchers.closeTo(900.0, 1e-6))
                .body("runawayRunnerSpeedRpm", greaterThan(1799.0))
                .body("openCircuitLineRmsVAtRunaway", greaterThan(0.0))
                .body("annualEnergyKWh", greaterThan(0.0))
                .body("cautions[0].code", equalTo("OPEN_CIRCUIT_VOLTAGE"));
        OpenApiContract.assertMatches(r, "/api/v1/match/hydro", "POST");
        double runnerW = r.path("matched.runnerPowerW");
        double battery = r.path("matched.powerToBatteryW");
        assertTrue(battery > 0 && battery < runnerW);
    }

    @Test
    void bad_hydro_input_is_a_400_naming_the_fields() throws IOException {
        ObjectNode b = hydroBody();
        ((ObjectNode) b.get("site")).put("grossHeadM", -5);
        ((ObjectNode) b.get("penstock")).put("innerDiameterM", 0);
        ((ObjectNode) b.get("runner")).put("kind", "WATERWHEEL");
        Response r = post("/api/v1/match/hydro", b);
        r.then().statusCode(400).body("errors.field", hasItems("site.grossHeadM", "penstock.innerDiameterM", "runner.kind"));
        OpenApiContract.assertMatches(r, "/api/v1/match/hydro", "POST");
        List<String> messages = r.path("errors.message");
        assertTrue(messages.stream().anyMatch(m -> m.startsWith("site.grossHeadM = -5")), messages.toString());
    }

    @Test
    void a_penstock_that_uses_up_the_head_is_a_422_on_the_pipe() throws IOException {
        ObjectNode b = hydroBody();
        ((ObjectNode) b.get("penstock")).put("innerDiameterM", 0.03);
        Response r = post("/api/v1/match/hydro", b);
        r.then().statusCode(422);
        assertEquals("penstock.innerDiameterM", r.path("field"));
    }

    @Test
    void a_missing_body_field_is_reported() throws IOException {
        ObjectNode b = windBody();
        b.remove("site");
        post("/api/v1/match/wind", b).then().statusCode(400).body("errors.field", hasItem("site"));
    }
}
