package coilwright.web;

import static io.restassured.RestAssured.given;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.restassured.response.Response;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

class OpenApiContractTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    private static Set<String> appOperations() {
        return APP.app().routes().stream().map(r -> r.method().name() + " " + r.path())
                .collect(Collectors.toCollection(TreeSet::new));
    }

    @Test
    void every_route_of_the_app_is_documented() {
        Set<String> undocumented = new TreeSet<>(appOperations());
        undocumented.removeAll(OpenApiContract.documentedOperations());
        assertEquals(Set.of(), undocumented, "routes missing from openapi.json");
    }

    @Test
    void every_documented_operation_exists_in_the_app() {
        Set<String> phantom = new TreeSet<>(OpenApiContract.documentedOperations());
        phantom.removeAll(appOperations());
        assertEquals(Set.of(), phantom, "documented in openapi.json but not routed");
    }

    @Test
    void every_documented_parameterless_GET_answers_without_404_or_405() {
        for (String op : OpenApiContract.documentedOperations()) {
            if (op.startsWith("GET ") && !op.contains("{")) {
                int status = given().get(op.substring(4)).statusCode();
                assertTrue(status != 404 && status != 405, op + " answered " + status);
            }
        }
    }

    @Test
    void health_response_matches_its_schema() {
        Response r = given().get("/health");
        OpenApiContract.assertMatches(r, "/health", "GET");
    }

    @Test
    void openapi_document_response_matches_its_schema() {
        OpenApiContract.assertMatches(given().get("/api/v1/openapi.json"), "/api/v1/openapi.json", "GET");
    }

    @Test
    void a_real_404_problem_matches_the_problem_schema() {
        OpenApiContract.assertMatchesComponent("Problem", given().get("/api/v1/none").asString());
    }

    @Test
    void the_checker_rejects_bodies_that_break_the_schema() {
        assertThrows(AssertionError.class, () -> OpenApiContract.assertMatches("/health", "GET", 200,
                "application/json", "{\"status\":\"down\"}"));
        assertThrows(AssertionError.class, () -> OpenApiContract.assertMatches("/health", "GET", 200,
                "application/json", "{\"status\":\"up\",\"extra\":1}"));
        assertThrows(AssertionError.class, () -> OpenApiContract.assertMatches("/health", "GET", 418,
                "application/json", "{}"), "an undocumented status fails");
        assertThrows(AssertionError.class, () -> OpenApiContract.assertMatchesComponent("Problem",
                "{\"type\":\"/problems/x\",\"title\":\"X\",\"status\":200,\"detail\":\"d\"}"), "status below 400");
    }
}
