package coilwright.web.api;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.contains;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;

import coilwright.web.OpenApiContract;
import coilwright.web.TestApp;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.restassured.response.Response;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class ExamplesApiTest {
    private static final String LIST = "/api/v1/examples";
    private static final String ONE = "/api/v1/examples/{slug}";

    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    @Test
    void lists_every_example_file_sorted_by_slug_with_its_link() {
        Response r = given().get(LIST);
        OpenApiContract.assertMatches(r, LIST, "GET");
        r.then().statusCode(200).contentType(startsWith("application/json"))
                .body("slug", contains("axial-wind-48v", "radial-hydro-48v", "rewound-motor-12v"))
                .body("href", contains("/api/v1/examples/axial-wind-48v", "/api/v1/examples/radial-hydro-48v",
                        "/api/v1/examples/rewound-motor-12v"))
                .body("find { it.slug == 'axial-wind-48v' }.title",
                        equalTo(Bodies.example("axial-wind-48v").get("title").asText()));
    }

    @ParameterizedTest
    @ValueSource(strings = {"axial-wind-48v", "radial-hydro-48v", "rewound-motor-12v"})
    void each_example_is_served_as_the_same_design_document_as_its_file(String slug) throws Exception {
        Response r = given().get("/api/v1/examples/" + slug);
        OpenApiContract.assertMatches(r, ONE, "GET");
        r.then().statusCode(200);
        assertEquals(Bodies.example(slug), new ObjectMapper().readTree(r.asString()));
    }

    @Test
    void an_unknown_example_is_a_404_problem_listing_the_examples() {
        Response r = given().get("/api/v1/examples/no-such-design");
        OpenApiContract.assertMatches(r, ONE, "GET");
        r.then().statusCode(404).contentType(startsWith("application/problem+json"))
                .body("type", equalTo("/problems/not-found"))
                .body("instance", equalTo("/api/v1/examples/no-such-design"))
                .body("detail", equalTo("There is no example named 'no-such-design'. The examples are: "
                        + "axial-wind-48v, radial-hydro-48v, rewound-motor-12v."));
    }

    @Test
    void a_path_escape_attempt_is_just_an_unknown_example() {
        given().get("/api/v1/examples/..%2F..%2Fpom").then().statusCode(404)
                .contentType(startsWith("application/problem+json"));
    }
}
