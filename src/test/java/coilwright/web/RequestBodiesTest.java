package coilwright.web;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import io.restassured.response.Response;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.Socket;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/** Bodies and the server's own refusals: media types, multipart, limits, Allow, UTF-8, low-level errors. */
class RequestBodiesTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    @Test
    void a_json_route_refuses_a_text_body_with_415_naming_the_media_type_it_takes() {
        given().contentType("text/plain").body("{}").post("/api/v1/evaluate").then().statusCode(415)
                .contentType(startsWith("application/problem+json"))
                .body("detail", containsString("application/json"));
    }

    @Test
    void a_json_route_refuses_multipart_with_415() {
        given().multiPart("file", "x.json", "{}".getBytes(StandardCharsets.UTF_8)).post("/api/v1/evaluate")
                .then().statusCode(415).contentType(startsWith("application/problem+json"));
    }

    @Test
    void a_form_page_refuses_a_json_body_with_an_html_415_page() {
        given().contentType("application/json").body("{}").post("/design").then().statusCode(415)
                .contentType(startsWith("text/html")).body(not(containsString("Exception")));
    }

    @Test
    void malformed_multipart_is_a_400_problem_on_the_import_and_a_400_page_on_the_save_form() {
        given().contentType("multipart/form-data; boundary=zz").body("x".getBytes(StandardCharsets.UTF_8))
                .post("/api/v1/designs/import")
                .then().statusCode(400).contentType(startsWith("application/problem+json"))
                .body("type", equalTo("/problems/malformed-multipart"));
        given().contentType("multipart/form-data").body("x".getBytes(StandardCharsets.UTF_8)).post("/saved")
                .then().statusCode(400).contentType(startsWith("text/html")).body(not(containsString("Exception")));
    }

    @Test
    void a_multipart_upload_over_the_body_limit_is_a_413_problem() {
        byte[] big = new byte[(int) AppConfig.DEFAULT_MAX_BODY_BYTES + 10_000];
        java.util.Arrays.fill(big, (byte) ' ');
        given().multiPart("file", "big.json", big).post("/api/v1/designs/import").then().statusCode(413)
                .contentType(startsWith("application/problem+json"));
    }

    @Test
    void a_charset_the_server_does_not_know_is_a_415_not_a_500() {
        given().contentType("application/json; charset=latin-1").body("{}".getBytes(StandardCharsets.UTF_8))
                .post("/api/v1/evaluate").then().statusCode(415).body("type", equalTo("/problems/unsupported-charset"));
        given().header("Content-Type", "application/json; charset=latin-1").get("/api/v1/examples")
                .then().statusCode(415).contentType(startsWith("application/problem+json"));
    }

    @Test
    void a_405_names_the_allowed_methods() {
        given().delete("/api/v1/evaluate").then().statusCode(405).header("Allow", equalTo("POST"))
                .contentType(startsWith("application/problem+json"));
        given().put("/api/v1/examples").then().statusCode(405).header("Allow", equalTo("GET, HEAD"));
        given().delete("/d/abc/revise").then().statusCode(405).header("Allow", equalTo("GET, POST, HEAD"));
    }

    @Test
    void a_problem_echoing_non_ascii_text_is_valid_utf8_json() throws IOException {
        Response r = given().contentType("application/json; charset=utf-8")
                .body("{\"load\":{\"type\":\"Bätterie😀\"}}".getBytes(StandardCharsets.UTF_8)).post("/api/v1/evaluate");
        r.then().statusCode(400).contentType(containsString("charset=utf-8"));
        JsonNode tree = Json.mapper().readTree(new String(r.asByteArray(), StandardCharsets.UTF_8));
        assertTrue(tree.toString().contains("Bätterie😀"), tree.toString());
    }

    @Test
    void a_malformed_address_under_the_api_is_a_400_problem_not_the_servers_page() throws IOException {
        String answer = raw("GET /api/v1/%zz HTTP/1.1\r\nHost: x\r\nConnection: close\r\n\r\n");
        assertTrue(answer.startsWith("HTTP/1.1 400"), answer);
        assertTrue(answer.contains("Content-Type: application/problem+json;charset=utf-8"), answer);
        assertTrue(answer.contains("X-Content-Type-Options: nosniff"), answer);
        assertFalse(answer.contains("<html"), answer);
    }

    @Test
    void headers_too_large_under_the_api_are_a_431_problem() throws IOException {
        String answer = raw("GET /api/v1/examples HTTP/1.1\r\nHost: x\r\nX-Big: " + "a".repeat(20_000)
                + "\r\nConnection: close\r\n\r\n");
        assertTrue(answer.startsWith("HTTP/1.1 431"), answer.substring(0, Math.min(300, answer.length())));
        assertTrue(answer.contains("application/problem+json"), answer);
        assertTrue(answer.contains("\"status\":431"), answer);
    }

    @Test
    void a_control_character_in_the_address_is_a_400_problem() throws IOException {
        String answer = raw("GET /api/v1/a\u0001b HTTP/1.1\r\nHost: x\r\nConnection: close\r\n\r\n");
        assertEquals("HTTP/1.1 400", answer.substring(0, 12), answer);
        assertTrue(answer.contains("application/problem+json"), answer);
    }

    /** Sends raw bytes (a request no client library would write) and reads the whole answer. */
    private static String raw(String request) throws IOException {
        try (Socket s = new Socket("127.0.0.1", APP.port())) {
            s.setSoTimeout(10_000);
            OutputStream out = s.getOutputStream();
            out.write(request.getBytes(StandardCharsets.ISO_8859_1));
            out.flush();
            InputStream in = s.getInputStream();
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }
}
