package coilwright.web;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItems;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.matchesPattern;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertEquals;

import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.SolverFailedException;
import coilwright.web.units.Units;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

class AppTest {
    record Reading(String name, double valueV) {
    }

    @RegisterExtension
    static final TestApp APP = new TestApp()
            .withConfig(c -> new AppConfig(c.port(), c.dataDir(), c.dbUrl(), 4096))
            .withRoutes(
                    Route.post("/api/v1/test/bind", ctx -> ctx.json(new RecordBinder(Json.mapper()).bind(ctx.body(), SampleDesign.class))),
                    Route.get("/api/v1/test/boom", ctx -> {
                        throw new IllegalStateException("secret internal detail");
                    }),
                    Route.get("/api/v1/test/nan", ctx -> ctx.json(new Reading("emf", Double.NaN))),
                    Route.get("/api/v1/test/missing", ctx -> {
                        throw new NotFoundException("No saved design has the id abc.");
                    }),
                    Route.get("/api/v1/test/forbidden", ctx -> {
                        throw new ForbiddenException("The edit token does not match.");
                    }),
                    Route.get("/api/v1/test/infeasible", ctx -> {
                        throw new InfeasibleDesignException("winding.slots", "12 slots and 12 poles cannot be balanced");
                    }),
                    Route.get("/api/v1/test/solver", ctx -> {
                        throw new SolverFailedException("speedRange.maxRpm",
                                "the bridge solver did not converge at 1450 rpm: lower the top speed");
                    }),
                    Route.get("/test/page-boom", ctx -> {
                        throw new IllegalStateException("secret internal detail");
                    }));

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    @Test
    void health_answers_up_once_started() {
        given().get("/health").then().statusCode(200).contentType(startsWith("application/json")).body("status", equalTo("up"));
    }

    @Test
    void metrics_are_in_prometheus_format_with_routes_and_jvm_memory() {
        given().get("/health").then().statusCode(200);
        given().get("/metrics").then().statusCode(200)
                .contentType(startsWith("text/plain"))
                .body(containsString("http_server_requests_seconds_count{method=\"GET\",route=\"/health\",status=\"200\"}"))
                .body(containsString("jvm_memory_used_bytes"));
    }

    @Test
    void serves_the_openapi_document() {
        given().get("/api/v1/openapi.json").then().statusCode(200).body("openapi", equalTo("3.1.0"));
    }

    @Test
    void unknown_api_route_is_a_404_problem() {
        given().get("/api/v1/nothing-here").then().statusCode(404)
                .contentType(startsWith("application/problem+json"))
                .body("status", equalTo(404)).body("title", equalTo("Not Found"))
                .body("type", equalTo("/problems/not-found")).body("instance", equalTo("/api/v1/nothing-here"));
    }

    @Test
    void not_found_exception_is_a_404_problem_with_its_detail() {
        given().get("/api/v1/test/missing").then().statusCode(404)
                .contentType(startsWith("application/problem+json"))
                .body("detail", equalTo("No saved design has the id abc."));
    }

    @Test
    void forbidden_exception_is_a_403_problem() {
        given().get("/api/v1/test/forbidden").then().statusCode(403)
                .body("title", equalTo("Forbidden")).body("detail", equalTo("The edit token does not match."));
    }

    @Test
    void wrong_method_is_a_405_problem() {
        given().post("/health").then().statusCode(405)
                .contentType(startsWith("application/problem+json"))
                .body("status", equalTo(405)).body("detail", equalTo("POST is not allowed on /health."));
    }

    @Test
    void body_over_the_limit_is_a_413_problem() {
        given().contentType("application/json").body("{\"name\": \"" + "x".repeat(5000) + "\"}")
                .post("/api/v1/test/bind").then().statusCode(413)
                .contentType(startsWith("application/problem+json")).body("status", equalTo(413));
    }

    @Test
    void malformed_json_is_a_400_problem_naming_where() {
        given().contentType("application/json").body("{\"name\": \"x\",\n \"rotor\": }")
                .post("/api/v1/test/bind").then().statusCode(400)
                .contentType(startsWith("application/problem+json"))
                .body("type", equalTo("/problems/malformed-json"))
                .body("detail", startsWith("Malformed JSON at line 2, column"));
    }

    @Test
    void invalid_fields_are_a_400_problem_listing_every_field() {
        String body = SampleDesign.validJson().replace("\"airGapM\": 0.002", "\"airGapM\": -1")
                .replace("\"N42\"", "\"N99\"").replace("\"turns\": 40", "\"turns\": \"forty\"");
        given().contentType("application/json").body(body).post("/api/v1/test/bind").then().statusCode(400)
                .contentType(startsWith("application/problem+json"))
                .body("type", equalTo("/problems/invalid-input"))
                .body("detail", equalTo("3 fields are invalid."))
                .body("errors", hasSize(3))
                .body("errors.field", hasItems("rotor.airGapM", "rotor.magnet.grade", "stator.coils[0].turns"))
                .body("errors.find { it.field == 'rotor.magnet.grade' }.allowed", equalTo("one of N35, N42, N52"));
    }

    @Test
    void a_solver_failure_is_a_422_problem_naming_the_field_and_what_to_change() {
        given().get("/api/v1/test/solver").then().statusCode(422)
                .contentType(startsWith("application/problem+json"))
                .body("type", equalTo("/problems/solver-failed"))
                .body("detail", equalTo("the bridge solver did not converge at 1450 rpm: lower the top speed"))
                .body("field", equalTo("speedRange.maxRpm"));
    }

    @Test
    void infeasible_design_is_a_422_problem_with_reason_and_field() {
        given().get("/api/v1/test/infeasible").then().statusCode(422)
                .body("type", equalTo("/problems/infeasible-design"))
                .body("detail", equalTo("12 slots and 12 poles cannot be balanced"))
                .body("field", equalTo("winding.slots"));
    }

    @Test
    void valid_body_binds_and_round_trips_in_declared_field_order() {
        String json = given().contentType("application/json").body(SampleDesign.validJson())
                .post("/api/v1/test/bind").then().statusCode(200).extract().asString();
        org.junit.jupiter.api.Assertions.assertTrue(json.startsWith("{\"name\":\"test rig\",\"rotor\":{\"airGapM\":0.002,\"poles\":8,"), json);
    }

    @Test
    void unexpected_error_is_a_500_problem_with_an_id_and_no_internals() {
        given().get("/api/v1/test/boom").then().statusCode(500)
                .contentType(startsWith("application/problem+json"))
                .body("id", matchesPattern("[0-9a-f]{8}"))
                .body(not(containsString("secret internal detail")))
                .body(not(containsString("Exception")))
                .body(not(containsString("at coilwright.")));
    }

    @Test
    void a_NaN_in_a_result_is_never_written_but_fails_as_500() {
        given().get("/api/v1/test/nan").then().statusCode(500)
                .body(not(containsString("NaN")));
    }

    @Test
    void unknown_page_is_an_html_404_page_in_the_layout() {
        Html page = Html.of(given().get("/no-such-page").then().statusCode(404)
                .contentType(startsWith("text/html")).extract().response());
        assertEquals("404 Not Found", page.doc().selectFirst("h1").text());
        assertEquals("Coilwright", page.doc().selectFirst("header .brand").text());
        assertEquals("There is nothing at /no-such-page.", page.doc().selectFirst(".detail").text());
    }

    @Test
    void unexpected_error_on_a_page_is_an_html_500_page_without_internals() {
        Html page = Html.of(given().get("/test/page-boom").then().statusCode(500)
                .contentType(startsWith("text/html")).extract().response());
        assertTrue(page.doc().selectFirst(".log-id").text().matches("Reference: [0-9a-f]{8}"), page.text());
        assertFalse(page.text().contains("secret internal detail"));
        assertFalse(page.doc().html().contains("IllegalStateException"));
    }

    @Test
    void serves_the_stylesheet_from_the_classpath() {
        given().get("/static/css/coilwright.css").then().statusCode(200)
                .contentType(startsWith("text/css")).body(containsString("@media print"));
    }

    @Test
    void home_page_renders_with_nav_and_safety_note() {
        Html page = Html.of(given().get("/").then().statusCode(200).contentType(startsWith("text/html")).extract().response());
        List<String> nav = page.all("nav.site-nav a").eachText();
        assertTrue(nav.containsAll(List.of("New design", "Winding layout", "Wind match", "Hydro match", "Rewind",
                "Compare", "Demo designs")), nav.toString());
        assertTrue(page.all("nav.site-nav a").eachAttr("href").containsAll(List.of("/compare", "/demos")));
        assertEquals("/design/new", page.all("nav.site-nav a").get(1).attr("href"));
        assertTrue(page.doc().selectFirst("footer .safety").text()
                .contains("electrical installation must follow local codes and licensed practice"));
        assertEquals(List.of("/static/css/coilwright.css"), page.all("link[rel=stylesheet]").eachAttr("href"));
        assertTrue(page.all("[src^=http], [href^=http]").isEmpty(), "nothing is fetched from elsewhere");
    }

    @Test
    void a_units_choice_is_remembered_in_a_cookie() {
        given().queryParam("units", "imperial").get("/").then().statusCode(200)
                .cookie(Units.COOKIE, "imperial");
        Html page = Html.of(given().cookies(Map.of(Units.COOKIE, "imperial")).get("/").then().extract().response());
        assertEquals("imperial", page.doc().selectFirst(".units-switch a.current").text());
    }
}
