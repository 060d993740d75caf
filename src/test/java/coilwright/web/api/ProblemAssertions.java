package coilwright.web.api;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.startsWith;

import coilwright.web.OpenApiContract;
import io.restassured.response.Response;
import io.restassured.response.ValidatableResponse;

/** Posting bodies to the API and checking the problem+json answers against their documented schema. */
final class ProblemAssertions {
    private ProblemAssertions() {
    }

    static Response post(String path, String body) {
        return given().contentType("application/json").body(body).post(path);
    }

    /**
     * A 400 invalid-input problem with exactly one field error, checked field by field, and valid against the
     * operation's documented 400 response.
     */
    static ValidatableResponse assertOneInvalidField(Response r, String path, String field, String value,
                                                     String message, String allowed) {
        OpenApiContract.assertMatches(r, path, "POST");
        return r.then().statusCode(400).contentType(startsWith("application/problem+json"))
                .body("type", equalTo("/problems/invalid-input"))
                .body("title", equalTo("Bad Request"))
                .body("status", equalTo(400))
                .body("detail", equalTo("1 field is invalid."))
                .body("instance", equalTo(path))
                .body("errors.size()", equalTo(1))
                .body("errors[0].field", equalTo(field))
                .body("errors[0].value", equalTo(value))
                .body("errors[0].message", equalTo(message))
                .body("errors[0].allowed", equalTo(allowed));
    }

    /** A 400 malformed-json problem whose detail starts as given. */
    static void assertMalformed(Response r, String path, String detailStart) {
        OpenApiContract.assertMatches(r, path, "POST");
        r.then().statusCode(400).contentType(startsWith("application/problem+json"))
                .body("type", equalTo("/problems/malformed-json"))
                .body("status", equalTo(400))
                .body("instance", equalTo(path))
                .body("detail", startsWith(detailStart));
    }

    /** A 422 infeasible-design problem naming the field. */
    static ValidatableResponse assertInfeasible(Response r, String path, String field) {
        OpenApiContract.assertMatches(r, path, "POST");
        return r.then().statusCode(422).contentType(startsWith("application/problem+json"))
                .body("type", equalTo("/problems/infeasible-design"))
                .body("title", equalTo("Unprocessable Content"))
                .body("status", equalTo(422))
                .body("instance", equalTo(path))
                .body("field", equalTo(field));
    }

    /** A 413 problem for a body over the 1 MiB default limit. */
    static void assertTooLarge(String path) {
        String big = "{\"notes\": \"" + "x".repeat(1_100_000) + "\"}";
        Response r = post(path, big);
        OpenApiContract.assertMatches(r, path, "POST");
        r.then().statusCode(413).contentType(startsWith("application/problem+json"))
                .body("type", equalTo("/problems/content-too-large"))
                .body("status", equalTo(413))
                .body("detail", equalTo("The request body is larger than the limit of this service."));
    }
}
