package coilwright.web.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.machine.AlternatorSpec;
import coilwright.system.EvaluationRequest;
import coilwright.web.Json;
import coilwright.web.OpenApiContract;
import coilwright.web.TestApp;
import io.restassured.path.json.config.JsonPathConfig;
import io.restassured.response.Response;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/** The ambient air temperature as an input of the JSON API: bound, checked, and optional for older documents. */
class AmbientTemperatureApiTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();
    private static final String PATH = "/api/v1/evaluate";

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    private static double ambientOf(Response r) {
        return r.jsonPath(JsonPathConfig.jsonPathConfig().numberReturnType(JsonPathConfig.NumberReturnType.DOUBLE))
                .getDouble("heatAndLosses.ambientC");
    }

    private static double ratedWindingOf(Response r) {
        return r.jsonPath(JsonPathConfig.jsonPathConfig().numberReturnType(JsonPathConfig.NumberReturnType.DOUBLE))
                .getDouble("heatAndLosses.rated.windingMeanC");
    }

    @Test
    void an_ambient_out_of_the_air_tables_range_is_a_400_naming_the_field_and_range() {
        Response r = ProblemAssertions.post(PATH, Bodies.exampleDesign("radial-hydro-48v")
                .set("alternator.ambientTempC", 61.5).json());
        ProblemAssertions.assertOneInvalidField(r, PATH, "alternator.ambientTempC", "61.5",
                "alternator.ambientTempC = 61.5: must be between -40.0 and 60.0", "-40.0 to 60.0");
    }

    @Test
    void the_ambient_entered_is_the_one_the_heat_block_solves_from_and_a_hotter_one_heats_the_winding() {
        Response mild = ProblemAssertions.post(PATH, Bodies.exampleDesign("radial-hydro-48v")
                .set("alternator.ambientTempC", 10).json());
        Response hot = ProblemAssertions.post(PATH, Bodies.exampleDesign("radial-hydro-48v")
                .set("alternator.ambientTempC", 45).json());
        OpenApiContract.assertMatches(hot, PATH, "POST");
        assertEquals(200, hot.statusCode());
        assertEquals(10, ambientOf(mild), 0);
        assertEquals(45, ambientOf(hot), 0);
        assertTrue(ratedWindingOf(hot) > ratedWindingOf(mild) + 10,
                () -> "winding " + ratedWindingOf(mild) + " -> " + ratedWindingOf(hot));
        assertTrue(hot.asString().contains("still air at 45 C"), "the basis names the ambient used");
    }

    @Test
    void a_document_written_before_the_field_existed_reads_as_the_25_c_every_earlier_result_assumed() throws Exception {
        String old = Bodies.exampleDesign("radial-hydro-48v").remove("alternator.ambientTempC").json();
        Response r = ProblemAssertions.post(PATH, old);
        assertEquals(200, r.statusCode());
        assertEquals(AlternatorSpec.DEFAULT_AMBIENT_TEMP_C, ambientOf(r), 0);
        assertTrue(r.getHeader("Coilwright-Deprecated-Fields") == null, "a default is not a renamed field");
        // stored revisions are read by the service's mapper, not the binder: the same default applies there
        EvaluationRequest stored = Json.mapper().readValue(old, EvaluationRequest.class);
        assertEquals(AlternatorSpec.DEFAULT_AMBIENT_TEMP_C, stored.alternator().ambientTempC(), 0);
    }
}
