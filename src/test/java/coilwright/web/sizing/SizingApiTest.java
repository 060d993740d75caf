package coilwright.web.sizing;

import coilwright.web.OpenApiContract;
import coilwright.web.TestApp;
import com.fasterxml.jackson.databind.node.ObjectNode;
import io.restassured.path.json.JsonPath;
import io.restassured.response.Response;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.util.List;
import java.util.Map;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.greaterThan;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.matchesPattern;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

class SizingApiTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();
    private static final String PATH = "/api/v1/sizing";
    private static final String JOB = "/api/v1/sizing/jobs/{jobId}";

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    private static Response post(Object body, String... prefer) {
        var spec = given().contentType("application/json").body(body.toString());
        if (prefer.length > 0) {
            spec = spec.header("Prefer", prefer[0]);
        }
        return spec.post(PATH);
    }

    /** The result of a search, inline or, when the machine is slow, from its job. */
    private static JsonPath sized(ObjectNode body) throws InterruptedException {
        Response r = post(body);
        if (r.statusCode() == 200) {
            OpenApiContract.assertMatches(r, PATH, "POST");
            return r.jsonPath();
        }
        assertEquals(202, r.statusCode(), r.asString());
        return finished(r.jsonPath().getString("id")).setRootPath("result");
    }

    private static JsonPath finished(String id) throws InterruptedException {
        for (int i = 0; i < 1200; i++) {
            Response r = given().get(JOB, id);
            OpenApiContract.assertMatches(r, JOB, "GET");
            if (!r.jsonPath().getString("status").equals("RUNNING")) {
                return r.jsonPath();
            }
            Thread.sleep(250);
        }
        throw new AssertionError("the job did not finish in 5 minutes");
    }

    @Test
    void a_small_search_is_answered_inline_with_ranked_designs_that_meet_the_limits() throws InterruptedException {
        JsonPath r = sized(SizingBodies.small());
        assertEquals(3, r.getList("designs").size());
        assertEquals(72L, r.getLong("counts.candidatesInSpace"));
        assertTrue(r.getBoolean("provenBest"));
        List<Map<String, Object>> designs = r.getList("designs");
        for (int i = 0; i < designs.size(); i++) {
            assertEquals(i + 1, r.getInt("designs[" + i + "].rank"));
            assertTrue(r.getDouble("designs[" + i + "].figures.cutInWindSpeedMs") <= 3.5, "the cut-in limit holds");
            assertTrue(r.getDouble("designs[" + i + "].figures.ratedCurrentDensityAPerMm2") <= 5.0);
        }
        // the worked example's choice: 18 coils under 16 poles, 19 turns of two AWG 13 strands in delta
        assertEquals(19, r.getInt("designs[0].alternator.turnsPerCoil"));
        assertEquals("DELTA", r.getString("designs[0].alternator.connection"));
        assertEquals("AxialDualRotor", r.getString("designs[0].alternator.rotor.type"));
        assertTrue(r.getDouble("designs[0].figures.annualEnergyKWh") >= r.getDouble("designs[1].figures.annualEnergyKWh"));
    }

    @Test
    void a_returned_design_evaluates_like_any_design_with_the_same_cut_in() throws Exception {
        JsonPath r = sized(SizingBodies.small());
        com.fasterxml.jackson.databind.ObjectMapper json = new com.fasterxml.jackson.databind.ObjectMapper();
        ObjectNode body = json.createObjectNode();
        body.set("alternator", json.valueToTree(r.getMap("designs[0].alternator")));
        ObjectNode load = SizingBodies.small().get("load").deepCopy();
        body.set("load", load.put("type", "BatteryLoad"));
        body.putObject("speedRange").put("minRpm", 0).put("maxRpm", 500).put("points", 51);
        body.put("ratedSpeedRpm", r.getDouble("designs[0].figures.ratedSpeedRpm"));
        body.put("maxSpeedRpm", 500);
        Response evaluated = given().contentType("application/json").body(body.toString()).post("/api/v1/evaluate");
        evaluated.then().statusCode(200);
        assertEquals(r.getDouble("designs[0].figures.cutInSpeedRpm"), evaluated.jsonPath().getDouble("cutInSpeedRpm"),
                1e-6 * r.getDouble("designs[0].figures.cutInSpeedRpm"));
        assertFalse(r.getList("designs[0].cautions").isEmpty(), "each design carries its cautions");
    }

    @Test
    void a_requested_job_reports_the_same_result_as_the_inline_answer() throws InterruptedException {
        Response started = post(SizingBodies.small(), "respond-async");
        OpenApiContract.assertMatches(started, PATH, "POST");
        started.then().statusCode(202).body("status", equalTo("RUNNING")).body("candidates", equalTo(72))
                .header("Location", startsWith("/api/v1/sizing/jobs/"))
                .body("id", matchesPattern("[0-9a-f]{32}"));
        String id = started.jsonPath().getString("id");
        assertEquals("/api/v1/sizing/jobs/" + id, started.header("Location"));
        JsonPath done = finished(id);
        assertEquals("DONE", done.getString("status"));
        assertEquals(1.0, done.getDouble("fraction"));
        assertTrue(done.getLong("expiresInS") > 0);
        JsonPath inline = sized(SizingBodies.small());
        assertEquals(inline.getList("designs.candidate"), done.getList("result.designs.candidate"));
        assertEquals(inline.getList("designs.figures.ratedPowerW"), done.getList("result.designs.figures.ratedPowerW"));
    }

    @Test
    void a_large_search_runs_as_a_job_that_can_be_cancelled() throws InterruptedException {
        Response started = post(SizingBodies.axialWind24V());
        OpenApiContract.assertMatches(started, PATH, "POST");
        started.then().statusCode(202).body("candidates", equalTo(863136));
        String id = started.jsonPath().getString("id");
        Response cancelled = given().delete(JOB, id);
        OpenApiContract.assertMatches(cancelled, JOB, "DELETE");
        cancelled.then().statusCode(200).body("status", equalTo("CANCELLED")).body("result", equalTo(null));
        assertEquals("CANCELLED", finished(id).getString("status"));
    }

    @Test
    void a_job_s_progress_streams_as_server_sent_events_until_it_ends() throws InterruptedException {
        String id = post(SizingBodies.small(), "respond-async").then().statusCode(202).extract().path("id");
        Response events = given().accept("text/event-stream").get(JOB + "/events", id);
        events.then().statusCode(200).contentType(startsWith("text/event-stream"));
        String stream = events.asString();
        assertTrue(stream.contains("event: progress"), stream);
        assertTrue(stream.contains("\"id\":\"" + id + "\""), stream);
        assertTrue(stream.contains("event: end\ndata: DONE"), stream);
        assertFalse(stream.contains("\"designs\""), "the result is read with the job, not streamed");
        assertEquals("DONE", finished(id).getString("status"));
        given().get(JOB + "/events", "0123456789abcdef0123456789abcdef").then().statusCode(404)
                .contentType(startsWith("application/problem+json"));
    }

    @Test
    void an_unknown_job_is_404_problem_json() {
        Response r = given().get(JOB, "0123456789abcdef0123456789abcdef");
        OpenApiContract.assertMatches(r, JOB, "GET");
        r.then().statusCode(404).contentType(startsWith("application/problem+json"))
                .body("detail", containsString("no design search job"));
        given().delete(JOB, "nope").then().statusCode(404).contentType(startsWith("application/problem+json"));
    }

    @Test
    void a_requirement_no_design_meets_answers_no_designs_and_the_nearest_miss_in_words() throws InterruptedException {
        ObjectNode body = SizingBodies.small();
        ((ObjectNode) body.get("limits")).put("maxCurrentDensityAPerMm2", 2.0);
        JsonPath r = sized(body);
        assertEquals(0, r.getList("designs").size());
        assertFalse(r.getList("nearMisses").isEmpty());
        assertEquals("currentDensity", r.getString("nearMisses[0].limit"));
        assertEquals("limits.maxCurrentDensityAPerMm2", r.getString("nearMisses[0].field"));
        assertEquals(2.0, r.getDouble("nearMisses[0].allowed"));
        assertTrue(r.getDouble("nearMisses[0].needed") > 2.0);
        assertTrue(r.getString("nearMisses[0].message").startsWith("nothing that stays within 2.0 A/mm^2"),
                r.getString("nearMisses[0].message"));
    }

    private static void assertInvalid(ObjectNode body, String field, String allowedPart) {
        Response r = post(body);
        OpenApiContract.assertMatches(r, PATH, "POST");
        r.then().statusCode(400).contentType(startsWith("application/problem+json"))
                .body("type", equalTo("/problems/invalid-input"))
                .body("errors", hasSize(1))
                .body("errors[0].field", equalTo(field))
                .body("errors[0].allowed", containsString(allowedPart));
    }

    @Test
    void every_bad_input_is_a_400_naming_the_field_under_the_request_and_the_allowed_range() {
        ObjectNode b = SizingBodies.small();
        b.put("resultCount", 0);
        assertInvalid(b, "resultCount", "1");
        b = SizingBodies.small();
        ((ObjectNode) b.get("drive")).put("ratedWindSpeedMs", 7.3);
        assertInvalid(b, "drive.ratedWindSpeedMs", "multiples of 0.5");
        b = SizingBodies.small();
        ((ObjectNode) b.get("drive").get("rotor")).put("diameterM", -3);
        assertInvalid(b, "drive.rotor.diameterM", "");
        b = SizingBodies.small();
        ((ObjectNode) b.get("build").get("magnets").get(0)).put("gradeName", "N99");
        assertInvalid(b, "build.magnets[0].gradeName", "N42");
        b = SizingBodies.small();
        ((ObjectNode) b.get("winding").get("wire")).put("maxStrands", 13);
        assertInvalid(b, "winding.wire.maxStrands", "12");
        b = SizingBodies.small();
        ((ObjectNode) b.get("limits")).put("maxFill", 0.9);
        assertInvalid(b, "limits.maxFill", "0.785");
        b = SizingBodies.small();
        ((ObjectNode) b.get("limits")).put("maxWindingTempC", 300);
        assertInvalid(b, "limits.maxWindingTempC", "250");
        b = SizingBodies.small();
        ((ObjectNode) b.get("limits")).put("maxCoggingPercent", 0);
        assertInvalid(b, "limits.maxCoggingPercent", "0.1");
        b = SizingBodies.small();
        ((ObjectNode) b.get("limits")).put("maxCoggingPercent", "lots");
        Response text = post(b);
        text.then().statusCode(400).body("errors[0].field", equalTo("limits.maxCoggingPercent"));
        b = SizingBodies.small();
        ((ObjectNode) b.get("drive")).put("type", "SteamDrive");
        Response r = post(b);
        OpenApiContract.assertMatches(r, PATH, "POST");
        r.then().statusCode(400).body("errors[0].field", startsWith("drive"));
    }

    @Test
    void a_space_over_the_cap_is_a_400_naming_its_size_the_cap_and_what_to_narrow() {
        ObjectNode b = SizingBodies.axialWind24V();
        ((ObjectNode) b.get("winding")).put("minTurnsPerCoil", 1).put("maxTurnsPerCoil", 2000);
        ((ObjectNode) b.get("winding").get("wire")).put("thickestAwg", 8).put("thinnestAwg", 30).put("maxStrands", 12);
        Response r = post(b);
        OpenApiContract.assertMatches(r, PATH, "POST");
        r.then().statusCode(400).body("errors", hasSize(1))
                .body("errors[0].field", startsWith("winding"))
                .body("errors[0].allowed", equalTo("at most 20000000 candidates"))
                .body("errors[0].message", containsString("Narrow it"));
    }

    @Test
    void the_sizing_schemas_validate_a_real_result() throws InterruptedException {
        JsonPath r = sized(SizingBodies.small());
        assertTrue(r.getList("paretoFront").size() > 0);
        assertTrue(r.getLong("counts.screened") > 0);
        assertTrue(r.getList("limits").size() >= 4, "the applied limits are listed");
        given().get("/api/v1/openapi.json").then().statusCode(200)
                .body("paths.'/api/v1/sizing'.post.responses.'202'.description", equalTo("A job was started"))
                .body("components.schemas.SizingRequest.required.size()", greaterThan(5));
    }
}
