package coilwright.web.saved;

import coilwright.web.OpenApiContract;
import coilwright.web.TestApp;
import io.restassured.response.Response;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.io.StringReader;
import java.util.List;
import java.util.Map;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasKey;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.matchesPattern;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class SavedDesignApiTest {
    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    static Response save(String document) {
        return given().contentType("application/json").body(document).post("/api/v1/designs");
    }

    @Test
    void saving_a_design_answers_201_with_ids_links_and_an_edit_token() {
        Response r = save(SavedFixtures.document("Created once"));
        r.then().statusCode(201).contentType(startsWith("application/json"))
                .body("designId", matchesPattern("[A-Za-z0-9_-]{22}"))
                .body("revisionId", matchesPattern("[A-Za-z0-9_-]{22}"))
                .body("created", equalTo(true))
                .body("editToken", matchesPattern("[A-Za-z0-9_-]{43}"))
                .header("Cache-Control", "no-store").header("Referrer-Policy", "no-referrer");
        String id = r.path("designId");
        assertEquals("/d/" + id, r.path("links.design"));
        assertEquals("/d/" + id + "/r/" + r.path("revisionId"), r.path("links.revision"));
        OpenApiContract.assertMatches(r, "/api/v1/designs", "POST");
    }

    @Test
    void saving_the_same_content_again_gives_a_link_and_a_token_of_its_own() {
        String doc = SavedFixtures.document("Saved twice");
        Response first = save(doc);
        Response second = save(doc);
        second.then().statusCode(201).body("created", equalTo(true)).body("editToken", matchesPattern("[A-Za-z0-9_-]{43}"));
        assertNotEquals(first.path("designId"), second.<String>path("designId"));
        assertNotEquals(first.path("revisionId"), second.<String>path("revisionId"));
        assertNotEquals(first.path("editToken"), second.<String>path("editToken"));
        given().header("X-Edit-Token", second.<String>path("editToken")).contentType("application/json")
                .body(SavedFixtures.document("Taken over?", "", 30)).post("/api/v1/designs/" + first.path("designId") + "/revisions")
                .then().statusCode(403);
        OpenApiContract.assertMatches(second, "/api/v1/designs", "POST");
    }

    @Test
    void the_edit_token_is_checked_before_the_revision_is_evaluated() {
        Response saved = save(SavedFixtures.document("Guarded before work"));
        String id = saved.path("designId");
        // 12 slots and 12 poles bind as input but cannot be wound (no balanced winding): evaluating it is a 422
        String unbuildable = SavedFixtures.document("Guarded before work", "x", 30).replaceAll("\"poles\":\\d+", "\"poles\":12");
        given().header("X-Edit-Token", "A".repeat(43)).contentType("application/json").body(unbuildable)
                .post("/api/v1/designs/" + id + "/revisions").then().statusCode(403)
                .body("type", equalTo("/problems/forbidden"));
        given().header("X-Edit-Token", saved.<String>path("editToken")).contentType("application/json").body(unbuildable)
                .post("/api/v1/designs/" + id + "/revisions").then().statusCode(422);
        given().get("/api/v1/designs/" + id).then().body("revisions", hasSize(1));
    }

    @Test
    void a_design_shows_its_input_the_saved_results_and_its_revisions() {
        Response saved = save(SavedFixtures.document("Read back", "Notes kept.", 40));
        String id = saved.path("designId");
        Response r = given().get("/api/v1/designs/" + id);
        r.then().statusCode(200)
                .body("designId", equalTo(id))
                .body("revisions", hasSize(1))
                .body("latest.title", equalTo("Read back"))
                .body("latest.notes", equalTo("Notes kept."))
                .body("latest.number", equalTo(1))
                .body("latest.newerRevisionExists", equalTo(false))
                .body("latest.design.alternator.turnsPerCoil", equalTo(40))
                .body("latest.results.points", hasSize(21))
                .body("latest.toolVersion", equalTo(APP.app().services().designs().toolVersion()));
        OpenApiContract.assertMatches(r, "/api/v1/designs/{designId}", "GET");
    }

    @Test
    void the_edit_token_adds_revisions_with_their_own_permanent_ids() {
        Response saved = save(SavedFixtures.document("Revised", "", 36));
        String id = saved.path("designId");
        String token = saved.path("editToken");
        String first = saved.path("revisionId");
        Response second = given().header("Authorization", "Bearer " + token).contentType("application/json")
                .body(SavedFixtures.document("Revised", "", 38)).post("/api/v1/designs/" + id + "/revisions");
        second.then().statusCode(201).body("designId", equalTo(id)).body("created", equalTo(true))
                .body("$", not(hasKey("editToken")));
        OpenApiContract.assertMatches(second, "/api/v1/designs/{designId}/revisions", "POST");
        Response third = given().header("X-Edit-Token", token).contentType("application/json")
                .body(SavedFixtures.document("Revised", "", 40)).post("/api/v1/designs/" + id + "/revisions");
        third.then().statusCode(201);
        given().get("/api/v1/designs/" + id).then().statusCode(200).body("revisions", hasSize(3))
                .body("latest.revisionId", equalTo(third.path("revisionId")))
                .body("latest.design.alternator.turnsPerCoil", equalTo(40));
        Response old = given().get("/api/v1/revisions/" + first);
        old.then().statusCode(200).body("number", equalTo(1)).body("newerRevisionExists", equalTo(true))
                .body("latestRevisionId", equalTo(third.path("revisionId")))
                .body("design.alternator.turnsPerCoil", equalTo(36));
        OpenApiContract.assertMatches(old, "/api/v1/revisions/{revisionId}", "GET");
    }

    @Test
    void a_wrong_or_missing_token_is_a_403_problem_and_changes_nothing() {
        Response saved = save(SavedFixtures.document("Guarded"));
        String id = saved.path("designId");
        String other = save(SavedFixtures.document("Someone else's")).path("editToken");
        String token = saved.path("editToken");
        String flipped = (token.charAt(0) == 'A' ? "B" : "A") + token.substring(1);
        for (Map<String, String> headers : List.of(Map.<String, String>of(), Map.of("Authorization", "Bearer " + other),
                Map.of("X-Edit-Token", flipped), Map.of("Authorization", "Bearer "), Map.of("X-Edit-Token", "x".repeat(5000)),
                Map.of("Authorization", "Basic " + token))) {
            Response r = given().headers(headers).contentType("application/json")
                    .body(SavedFixtures.document("Guarded", "changed", 30)).post("/api/v1/designs/" + id + "/revisions");
            r.then().statusCode(403).contentType(startsWith("application/problem+json"))
                    .body("type", equalTo("/problems/forbidden"))
                    .body("detail", equalTo("The edit token does not allow changing design " + id + "; nothing was changed."));
            OpenApiContract.assertMatches(r, "/api/v1/designs/{designId}/revisions", "POST");
        }
        given().get("/api/v1/designs/" + id).then().body("revisions", hasSize(1))
                .body("latest.revisionId", equalTo(saved.path("revisionId"))).body("latest.notes", equalTo("Test notes."));
    }

    @Test
    void unknown_and_malformed_ids_are_404_problems() {
        String unknown = "AAAAAAAAAAAAAAAAAAAAAA";
        for (String path : List.of("/api/v1/designs/" + unknown, "/api/v1/revisions/" + unknown,
                "/api/v1/designs/" + unknown + "/export", "/api/v1/revisions/" + unknown + "/curves.csv",
                "/api/v1/revisions/" + unknown + "/recomputed", "/api/v1/designs/not-an-id")) {
            given().get(path).then().statusCode(404).contentType(startsWith("application/problem+json"))
                    .body("type", equalTo("/problems/not-found")).body("status", equalTo(404))
                    .body("detail", startsWith("No saved design has the id "));
        }
        Response r = given().get("/api/v1/designs/" + unknown);
        assertEquals("No saved design has the id " + unknown + ".", r.path("detail"));
        OpenApiContract.assertMatches(r, "/api/v1/designs/{designId}", "GET");
        given().header("X-Edit-Token", "t").contentType("application/json").body(SavedFixtures.document("x"))
                .post("/api/v1/designs/" + unknown + "/revisions").then().statusCode(404);
    }

    @Test
    void invalid_input_is_a_400_problem_naming_every_field() {
        String bad = SavedFixtures.document("Bad", "", -3).replace("\"schemaVersion\":1", "\"schemaVersion\":7");
        Response r = save(bad);
        r.then().statusCode(400).body("type", equalTo("/problems/invalid-input"))
                .body("errors.field", hasItem("design.alternator.turnsPerCoil"))
                .body("errors.field", hasItem("schemaVersion"));
        OpenApiContract.assertMatches(r, "/api/v1/designs", "POST");
        save("{\"title\": ").then().statusCode(400).body("type", equalTo("/problems/malformed-json"));
    }

    @Test
    void an_oversize_body_is_a_413_problem() {
        String huge = SavedFixtures.document("Huge", "n".repeat(1_100_000), 36);
        Response r = save(huge);
        r.then().statusCode(413).contentType(startsWith("application/problem+json")).body("status", equalTo(413));
        OpenApiContract.assertMatches(r, "/api/v1/designs", "POST");
    }

    @Test
    void export_is_a_design_file_download_that_imports_back_as_a_new_design_with_the_same_content() {
        Response saved = save(SavedFixtures.document("Exported", "Round trip.", 37));
        String id = saved.path("designId");
        Response export = given().get("/api/v1/designs/" + id + "/export");
        export.then().statusCode(200).contentType(startsWith("application/json"))
                .header("Content-Disposition", startsWith("attachment; filename=\"coilwright-"))
                .body("schemaVersion", equalTo(1)).body("title", equalTo("Exported")).body("notes", equalTo("Round trip."))
                .body("design.alternator.turnsPerCoil", equalTo(37));
        OpenApiContract.assertMatches(export, "/api/v1/designs/{designId}/export", "GET");
        Response back = given().contentType("application/json").body(export.asString()).post("/api/v1/designs/import");
        back.then().statusCode(201).body("designId", not(equalTo(id))).body("created", equalTo(true))
                .header("Cache-Control", "no-store");
        given().get("/api/v1/designs/" + back.path("designId") + "/export").then().statusCode(200)
                .body("title", equalTo("Exported")).body("notes", equalTo("Round trip."))
                .body("design", equalTo(export.path("design")));
        Response multipart = given().multiPart("file", "design.json",
                SavedFixtures.document("Uploaded").getBytes(java.nio.charset.StandardCharsets.UTF_8), "application/json")
                .post("/api/v1/designs/import");
        multipart.then().statusCode(201).body("editToken", matchesPattern("[A-Za-z0-9_-]{43}"));
        OpenApiContract.assertMatches(multipart, "/api/v1/designs/import", "POST");
        given().multiPart("file", "bad.json", SavedFixtures.document("Bad", "", 0).getBytes(), "application/json")
                .post("/api/v1/designs/import").then().statusCode(400)
                .body("errors.field", hasItem("design.alternator.turnsPerCoil"));
    }

    @Test
    void curves_are_rfc4180_csv_with_units_in_the_header_and_one_row_per_speed() throws Exception {
        Response saved = save(SavedFixtures.document("Curves"));
        String rev = saved.path("revisionId");
        Response csv = given().get("/api/v1/revisions/" + rev + "/curves.csv");
        csv.then().statusCode(200).contentType(startsWith("text/csv"))
                .header("Content-Disposition", equalTo("attachment; filename=\"coilwright-" + rev + "-curves.csv\""));
        String text = csv.asString();
        List<String> about = text.lines().takeWhile(l -> l.startsWith("# ")).toList();
        assertEquals("# Coilwright operating points", about.get(0));
        assertTrue(about.contains("# Title: Curves"), about.toString());
        assertTrue(about.stream().anyMatch(l -> l.matches("# Link: http://127\\.0\\.0\\.1:\\d+/d/" + saved.path("designId")
                + "/r/" + rev)), about.toString());
        assertTrue(about.contains("# Revision: 1 (" + rev + ")") && about.contains("# Units: SI, as each column header names them"),
                about.toString());
        assertTrue(about.stream().anyMatch(l -> l.matches("# Saved: \\d{4}-\\d\\d-\\d\\d \\d\\d:\\d\\d UTC")), about.toString());
        assertTrue(about.stream().anyMatch(l -> l.startsWith("# Machine: ") && l.contains("turns per coil")), about.toString());
        String table = text.substring(text.indexOf("Speed (rpm)"));
        assertTrue(table.startsWith("Speed (rpm),Frequency (Hz),Phase EMF (V rms),Line EMF (V rms),"), text);
        assertTrue(table.contains("Power to load (W)") && table.contains("Current density (A/mm^2)"), text);
        assertEquals(22, table.split("\r\n", -1).length - 1, "CRLF after the header and each of 21 rows");
        List<CSVRecord> rows = CSVFormat.RFC4180.builder().setCommentMarker('#').setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(text)).getRecords();
        assertEquals(21, rows.size());
        List<Double> speeds = given().get("/api/v1/revisions/" + rev).path("results.points.speedRpm");
        for (int i = 0; i < rows.size(); i++) {
            assertEquals(speeds.get(i), Double.parseDouble(rows.get(i).get("Speed (rpm)")), 0.0);
        }
        assertEquals(600.0, Double.parseDouble(rows.get(20).get("Speed (rpm)")), 0.0);
        given().get("/api/v1/designs/" + saved.path("designId") + "/curves.csv").then().statusCode(200)
                .body(equalTo(text));
    }

    @Test
    void a_recomputation_by_the_same_tool_reproduces_the_saved_numbers() {
        String rev = save(SavedFixtures.document("Recomputed")).path("revisionId");
        Response r = given().get("/api/v1/revisions/" + rev + "/recomputed");
        r.then().statusCode(200).body("differs", equalTo(false)).body("toolVersionDiffers", equalTo(false))
                .body("changes", hasSize(0)).body("results.points", hasSize(21));
        OpenApiContract.assertMatches(r, "/api/v1/revisions/{revisionId}/recomputed", "GET");
    }

    @Test
    void compare_marks_the_input_fields_and_key_results_that_differ() {
        String a = save(SavedFixtures.document("Compare A", "", 20)).path("revisionId");
        String b = save(SavedFixtures.document("Compare B", "", 30)).path("revisionId");
        Response r = given().queryParam("a", a).queryParam("b", b).get("/api/v1/compare");
        r.then().statusCode(200).body("a.revisionId", equalTo(a)).body("b.revisionId", equalTo(b))
                .body("inputDifferences.path", equalTo(List.of("title", "design.alternator.turnsPerCoil")))
                .body("inputDifferences[1].a", equalTo("20")).body("inputDifferences[1].b", equalTo("30"))
                .body("results.find { it.key == 'keLineRmsVPerRpm' }.differs", equalTo(true))
                .body("results.find { it.key == 'maxSpeedRpm' }.differs", equalTo(false));
        OpenApiContract.assertMatches(r, "/api/v1/compare", "GET");
        double keA = r.path("results.find { it.key == 'keLineRmsVPerRpm' }.a");
        double keB = r.path("results.find { it.key == 'keLineRmsVPerRpm' }.b");
        assertEquals(30.0 / 20.0, keB / keA, 1e-9, "Ke is proportional to turns per coil");
        Response missing = given().queryParam("a", a).get("/api/v1/compare");
        missing.then().statusCode(400).body("errors[0].field", equalTo("b"));
        OpenApiContract.assertMatches(missing, "/api/v1/compare", "GET");
        given().queryParam("a", a).queryParam("b", "AAAAAAAAAAAAAAAAAAAAAA").get("/api/v1/compare").then().statusCode(404);
    }

    @Test
    void the_contract_checker_rejects_a_body_that_breaks_the_saved_schemas() {
        org.junit.jupiter.api.Assertions.assertThrows(AssertionError.class, () -> OpenApiContract.assertMatches(
                "/api/v1/designs", "POST", 201, "application/json", "{\"designId\":\"short\",\"revisionId\":\"x\"}"));
        org.junit.jupiter.api.Assertions.assertThrows(AssertionError.class, () -> OpenApiContract.assertMatches(
                "/api/v1/designs/{designId}", "GET", 404, "application/problem+json", "{\"status\":404}"));
    }

    @Test
    void ids_cannot_be_enumerated_no_route_lists_saved_designs() {
        String a = save(SavedFixtures.document("Enum", "note 1", 36)).path("designId");
        String b = save(SavedFixtures.document("Enum", "note 2", 36)).path("designId");
        assertNotEquals(a, b);
        int same = 0;
        for (int i = 0; i < a.length(); i++) {
            same += a.charAt(i) == b.charAt(i) ? 1 : 0;
        }
        assertTrue(same < 6, "ids of nearly equal designs share " + same + " of 22 characters: " + a + " " + b);
        given().get("/api/v1/designs").then().statusCode(not(equalTo(200)));
        given().get("/d").then().statusCode(404);
        given().get("/api/v1/demos").then().statusCode(200).body(not(containsString(a))).body(not(containsString(b)));
        String neighbour = a.substring(0, 21) + (a.charAt(21) == 'A' ? 'B' : 'A');
        given().get("/api/v1/designs/" + neighbour).then().statusCode(404);
    }
}
