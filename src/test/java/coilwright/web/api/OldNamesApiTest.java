package coilwright.web.api;

import static io.restassured.RestAssured.given;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.service.TreeDiff;
import coilwright.web.Json;
import coilwright.web.OldNamesNotice;
import coilwright.web.OpenApiContract;
import coilwright.web.TestApp;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import io.restassured.response.Response;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

/** The axial-flux inputs under their names before API version 1.1: they still bind, and the response says so. */
class OldNamesApiTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    /** An evaluate request written before the rename (the stored fixture's input). */
    private static String oldBody() throws IOException {
        try (InputStream in = OldNamesApiTest.class.getClassLoader()
                .getResourceAsStream("stored/before-axial-rename/input.json")) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    /** The same request written by hand under the new names. */
    private static String newBody() throws IOException {
        ObjectNode body = (ObjectNode) Json.mapper().readTree(oldBody());
        ObjectNode rotor = (ObjectNode) body.at("/alternator/rotor");
        rotor.remove(List.of("statorThicknessM", "runningClearanceM"));
        rotor.put("coilLayerThicknessM", 0.018).put("clearancePerSideM", 0.0015);
        ObjectNode stator = (ObjectNode) body.at("/alternator/stator");
        stator.removeAll();
        // the old hole: 24 mm at the inner end, 34 mm at the outer end; so 29 mm halfway and 10 mm of taper
        stator.put("type", "AirCoredStator").put("conductorBandWidthM", 0.022).put("openingMidWidthM", 0.029)
                .put("openingTaperM", 0.010);
        return body.toString();
    }

    private static Response post(String path, String body) {
        return given().contentType("application/json").body(body).post(path);
    }

    @Test
    void old_names_evaluate_to_the_same_numbers_and_the_response_names_their_replacements() throws IOException {
        Response old = post("/api/v1/evaluate", oldBody());
        old.then().statusCode(200);
        OpenApiContract.assertMatches(old, "/api/v1/evaluate", "POST");
        assertEquals("alternator.rotor.statorThicknessM -> alternator.rotor.coilLayerThicknessM, "
                        + "alternator.rotor.runningClearanceM -> alternator.rotor.clearancePerSideM, "
                        + "alternator.stator.coilLegWidthM -> alternator.stator.conductorBandWidthM, "
                        + "alternator.stator.coilHoleInnerWidthM+alternator.stator.coilHoleOuterWidthM -> "
                        + "alternator.stator.openingMidWidthM+alternator.stator.openingTaperM",
                old.header(OldNamesNotice.HEADER));
        Response current = post("/api/v1/evaluate", newBody());
        current.then().statusCode(200);
        assertNull(current.header(OldNamesNotice.HEADER), "no notice for the current names");
        JsonNode a = Json.mapper().readTree(old.asString());
        JsonNode b = Json.mapper().readTree(current.asString());
        // 29 mm and 10 mm written by hand against (24 + 34)/2 and 34 - 24 computed: equal to rounding
        assertEquals(List.of(), TreeDiff.differences(a, b, 1e-12));
    }

    @Test
    void a_design_saved_under_old_names_is_stored_and_shown_under_the_new_ones() throws IOException {
        ObjectNode doc = Json.mapper().createObjectNode().put("schemaVersion", 1).put("title", "Old names").put("notes", "");
        doc.set("design", Json.mapper().readTree(oldBody()));
        Response saved = post("/api/v1/designs", doc.toString());
        saved.then().statusCode(201);
        assertTrue(saved.header(OldNamesNotice.HEADER).startsWith("design.alternator.rotor.statorThicknessM -> "),
                saved.header(OldNamesNotice.HEADER));
        String revision = saved.jsonPath().getString("revisionId");
        Response shown = given().get("/api/v1/revisions/" + revision);
        shown.then().statusCode(200);
        assertFalse(shown.asString().contains("statorThicknessM"));
        assertEquals(0.018, shown.jsonPath().getDouble("design.alternator.rotor.coilLayerThicknessM"), 0.0);
    }

    @Test
    void an_old_name_beside_its_new_name_is_refused_as_unknown() throws IOException {
        ObjectNode body = (ObjectNode) Json.mapper().readTree(newBody());
        ((ObjectNode) body.at("/alternator/rotor")).put("statorThicknessM", 0.02);
        post("/api/v1/evaluate", body.toString()).then().statusCode(400);
        assertEquals("alternator.rotor.statorThicknessM",
                post("/api/v1/evaluate", body.toString()).jsonPath().getString("errors[0].field"));
    }

    @Test
    void the_notice_header_is_documented_in_the_openapi_document() throws IOException {
        JsonNode api = Json.mapper().readTree(given().get("/api/v1/openapi.json").asString());
        assertTrue(api.at("/components/headers/" + OldNamesNotice.HEADER + "/description").asText().contains("statorThicknessM"));
        for (String path : List.of("~1api~1v1~1evaluate", "~1api~1v1~1designs")) {
            JsonNode responses = api.at("/paths/" + path + "/post/responses");
            boolean referenced = false;
            for (JsonNode response : responses) {
                referenced |= response.at("/headers/" + OldNamesNotice.HEADER + "/$ref").asText()
                        .equals("#/components/headers/" + OldNamesNotice.HEADER);
            }
            assertTrue(referenced, path);
        }
    }
}
