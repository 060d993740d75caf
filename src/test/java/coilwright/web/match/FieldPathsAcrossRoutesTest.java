package coilwright.web.match;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;

import coilwright.web.TestApp;
import com.fasterxml.jackson.databind.node.ObjectNode;
import io.restassured.response.Response;
import java.io.IOException;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/**
 * The same bad machine is named by the same path from every route that takes one: a client sends the alternator as
 * {@code alternator} to /evaluate, /match/wind and /match/hydro, and every answer names it so.
 */
class FieldPathsAcrossRoutesTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    /** Each route with a valid body built on the axial (wind) or the radial (hydro) example. */
    private static Map<String, ObjectNode> bodies() throws IOException {
        ObjectNode evaluate = MatchApiTest.example("axial-wind-48v");
        evaluate.putObject("speedRange").put("minRpm", 0).put("maxRpm", 500).put("points", 11);
        evaluate.put("ratedSpeedRpm", 0).put("maxSpeedRpm", 0);
        return Map.of("/api/v1/evaluate", evaluate, "/api/v1/match/wind", MatchApiTest.windBody(),
                "/api/v1/match/hydro", MatchApiTest.hydroBody());
    }

    private static ObjectNode winding(ObjectNode body) {
        return (ObjectNode) body.get("alternator").get("winding");
    }

    private static Response post(String path, String body) {
        return given().contentType("application/json").body(body).post(path);
    }

    @Test
    void an_unbalanced_winding_is_alternator_winding_slots_everywhere() throws IOException {
        for (Map.Entry<String, ObjectNode> e : bodies().entrySet()) {
            winding(e.getValue()).put("slots", 12).put("poles", 12);
            post(e.getKey(), e.getValue().toString()).then().statusCode(422)
                    .contentType(startsWith("application/problem+json"))
                    .body("type", equalTo("/problems/infeasible-design"))
                    .body("field", equalTo("alternator.winding.slots"));
        }
    }

    @Test
    void parallel_paths_the_layout_cannot_take_are_named_in_the_request_everywhere() throws IOException {
        for (Map.Entry<String, ObjectNode> e : bodies().entrySet()) {
            winding(e.getValue()).put("parallelPaths", 7);
            Response r = post(e.getKey(), e.getValue().toString());
            r.then().statusCode(400).body("type", equalTo("/problems/invalid-input"));
            assertEquals("alternator.winding.parallelPaths", r.path("errors[0].field"), e.getKey());
        }
    }

    @Test
    void a_bare_NaN_in_the_machine_is_malformed_json_at_the_same_path_everywhere() throws IOException {
        for (Map.Entry<String, ObjectNode> e : bodies().entrySet()) {
            winding(e.getValue()).put("slots", "__NaN__");
            Response r = post(e.getKey(), e.getValue().toString().replace("\"__NaN__\"", "NaN"));
            r.then().statusCode(400).body("type", equalTo("/problems/malformed-json"))
                    .body("field", equalTo("alternator.winding.slots"));
            String detail = r.path("detail");
            assertEquals(true, detail.endsWith("(in alternator.winding.slots): not a number: use a finite decimal."), detail);
        }
    }
}
