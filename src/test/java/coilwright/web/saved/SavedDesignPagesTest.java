package coilwright.web.saved;

import coilwright.store.Database;
import coilwright.store.DatabaseSettings;
import coilwright.store.DesignStore;
import coilwright.store.DraftRevision;
import coilwright.store.SaveOutcome;
import coilwright.web.Json;
import coilwright.web.TestApp;
import com.fasterxml.jackson.databind.node.ObjectNode;
import io.restassured.response.Response;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

class SavedDesignPagesTest {
    private static final String TITLE = "<script>alert('t')</script><b>bold</b> & \"quoted\"";
    private static final String NOTES = "<img src=x onerror=alert(1)>\n<script>document.title='owned'</script></pre><a href=\"javascript:x\">x</a>";

    @RegisterExtension
    static final TestApp APP = new TestApp();

    @BeforeEach
    void pointRestAssured() {
        APP.useRestAssured();
    }

    private static Response saveApi(String doc) {
        return given().contentType("application/json").body(doc).post("/api/v1/designs");
    }

    private static void assertInert(String html, String where) {
        assertFalse(html.contains("<script>alert"), where + " holds a live script from the title");
        assertFalse(html.contains("<script>document"), where + " holds a live script from the notes");
        assertFalse(html.contains("<img src=x"), where + " holds a live img");
        assertFalse(html.contains("<b>bold</b>"), where + " holds live markup");
        assertFalse(html.contains("<a href=\"javascript"), where + " holds a live link");
        assertTrue(html.contains("&lt;script&gt;alert(&#39;t&#39;)&lt;/script&gt;"), where + " shows the title as text");
    }

    @Test
    void a_title_and_notes_holding_html_and_script_are_shown_inert_on_every_page() {
        Response saved = saveApi(SavedFixtures.document(TITLE, NOTES, 36));
        String id = saved.path("designId");
        String rev = saved.path("revisionId");
        String other = saveApi(SavedFixtures.document("Plain", "", 40)).path("revisionId");
        for (String path : List.of("/d/" + id, "/d/" + id + "/r/" + rev, "/d/" + id + "/r/" + rev + "/print",
                "/d/" + id + "/r/" + rev + "/recomputed", "/d/" + id + "/revise", "/compare?a=" + rev + "&b=" + other)) {
            Response r = given().get(path);
            r.then().statusCode(200).contentType(startsWith("text/html"));
            String html = r.asString();
            if (path.contains("/revise")) {
                assertFalse(html.contains("<script>alert"), path);
                assertTrue(html.contains("&lt;script&gt;"), path);
            } else {
                assertInert(html, path);
            }
        }
        String page = given().formParam("document", SavedFixtures.document(TITLE, NOTES, 36)).post("/saved").asString();
        assertInert(page, "POST /saved");
    }

    @Test
    void an_imported_design_file_with_markup_in_title_and_notes_is_shown_inert_on_every_page() {
        String notes = NOTES + "</textarea><script>alert('ta')</script>";
        byte[] file = SavedFixtures.document(TITLE, notes, 37).getBytes(java.nio.charset.StandardCharsets.UTF_8);
        Response imported = given().multiPart("file", "evil.json", file, "application/json").post("/api/v1/designs/import");
        imported.then().statusCode(201);
        String id = imported.path("designId");
        String rev = imported.path("revisionId");
        String page = given().multiPart("file", "evil.json", file, "application/json").post("/saved")
                .then().statusCode(201).extract().asString();
        assertInert(page, "POST /saved with a file");
        String other = saveApi(SavedFixtures.document("Plain", "", 40)).path("revisionId");
        for (String path : List.of("/d/" + id, "/d/" + id + "/r/" + rev, "/d/" + id + "/r/" + rev + "/print",
                "/d/" + id + "/r/" + rev + "/recomputed", "/compare?a=" + rev + "&b=" + other, "/compare?a=" + other + "&b=" + id)) {
            String html = given().get(path).then().statusCode(200).contentType(startsWith("text/html")).extract().asString();
            assertInert(html, path);
            assertFalse(html.contains("<script>alert('ta')"), path + " lets the notes close a textarea and run a script");
        }
        String revise = given().get("/d/" + id + "/revise").then().statusCode(200).extract().asString();
        assertFalse(revise.contains("</textarea><script>"), "the revise form's textarea is not closed by the notes");
        assertTrue(revise.contains("&lt;/textarea&gt;&lt;script&gt;"), "the file is shown as text in the textarea");
    }

    @Test
    void the_save_form_shows_the_edit_token_once_with_a_warning_and_keeps_it_out_of_caches_and_referrers() {
        Response r = given().formParam("document", SavedFixtures.document("Saved from a form")).post("/saved");
        r.then().statusCode(201).contentType(startsWith("text/html"))
                .header("Cache-Control", "no-store").header("Referrer-Policy", "no-referrer")
                .body(containsString("Keep this token now: it is shown only this once"))
                .body(containsString("id=\"edit-token\""));
        Matcher m = Pattern.compile("id=\"edit-token\" class=\"token\" type=\"text\" readonly value=\"([A-Za-z0-9_-]{43})\"").matcher(r.asString());
        assertTrue(m.find(), r.asString());
        Response again = given().formParam("document", SavedFixtures.document("Saved from a form")).post("/saved");
        again.then().statusCode(201).body(containsString("id=\"edit-token\"")).body(not(containsString(m.group(1))));
    }

    @Test
    void an_uploaded_file_is_saved_and_an_invalid_one_answers_400_with_the_field() {
        given().multiPart("file", "d.json", SavedFixtures.document("Uploaded page").getBytes(), "application/json")
                .post("/saved").then().statusCode(201).body(containsString("Uploaded page"));
        given().multiPart("file", "d.json", SavedFixtures.document("Bad", "", -1).getBytes(), "application/json")
                .post("/saved").then().statusCode(400).contentType(startsWith("text/html"))
                .body(containsString("design.alternator.turnsPerCoil"));
        given().get("/saved/new").then().statusCode(200).body(containsString("enctype=\"multipart/form-data\""));
    }

    @Test
    void each_revision_keeps_its_link_and_says_when_a_newer_one_exists() {
        Response saved = saveApi(SavedFixtures.document("Two revisions", "", 36));
        String id = saved.path("designId");
        String first = saved.path("revisionId");
        given().get("/d/" + id + "/r/" + first).then().statusCode(200).body(not(containsString("A newer revision")));
        Response revised = given().redirects().follow(false).formParam("editToken", saved.<String>path("editToken"))
                .formParam("document", SavedFixtures.document("Two revisions", "second", 39)).post("/d/" + id + "/revise");
        revised.then().statusCode(303);
        String location = revised.header("Location");
        assertTrue(location.startsWith("/d/" + id + "/r/") && !location.endsWith(first), location);
        given().get("/d/" + id + "/r/" + first).then().statusCode(200).body(containsString("A newer revision of this design exists"));
        given().get(location).then().statusCode(200).body(not(containsString("A newer revision")))
                .body(containsString("Revision <strong>2</strong>"));
        given().get("/d/" + id).then().statusCode(200).body(containsString("Revision <strong>2</strong>"))
                .body(containsString("/compare?a=" + first));
        given().get("/d/AAAAAAAAAAAAAAAAAAAAAA/r/" + first).then().statusCode(404).contentType(startsWith("text/html"));
    }

    @Test
    void a_wrong_token_in_the_revise_form_is_a_403_page_and_changes_nothing() {
        Response saved = saveApi(SavedFixtures.document("Form guarded"));
        String id = saved.path("designId");
        for (String token : List.of("", "wrong", "A".repeat(43))) {
            given().formParam("editToken", token).formParam("document", SavedFixtures.document("Form guarded", "x", 30))
                    .post("/d/" + id + "/revise").then().statusCode(403).contentType(startsWith("text/html"))
                    .body(containsString("nothing was changed"));
        }
        given().get("/api/v1/designs/" + id).then().body("revisions", hasSize(1));
    }

    @Test
    void when_the_current_tool_computes_other_numbers_the_saved_ones_are_shown_with_a_link_to_the_recomputation() {
        SaveOutcome o;
        String doc = SavedFixtures.document("Old numbers");
        try (Database db = Database.open(DatabaseSettings.h2File(APP.dataDir()))) {
            var library = APP.app().services().designs();
            var document = new coilwright.web.RecordBinder(Json.mapper()).bind(doc, coilwright.service.DesignDocument.class);
            String input = library.canonical(document.design());
            ObjectNode results = (ObjectNode) Json.mapper().valueToTree(APP.app().services().evaluation().evaluate(document.design()));
            results.put("cutInSpeedRpm", 123.456);
            ((ObjectNode) results.get("rated")).put("powerToLoadW", 999.0);
            o = new DesignStore(db).create(new DraftRevision("Old numbers", "", input, results.toString(), "0.0.1-old", 1));
        }
        String page = given().get("/d/" + o.designId()).then().statusCode(200).extract().asString();
        assertTrue(page.contains("The current tool computes different numbers from this input."), page);
        assertTrue(page.contains("computed by version 0.0.1-old"), page);
        assertTrue(page.contains("/d/" + o.designId() + "/r/" + o.revisionId() + "/recomputed"), page);
        assertTrue(page.contains("<span class=\"value\">999</span>"), "the saved power is shown");
        assertTrue(page.contains("Drawn from the saved input as this server computes it today"),
                "the charts say they are not the saved numbers");
        given().get("/d/" + o.designId() + "/r/" + o.revisionId() + "/recomputed").then().statusCode(200)
                .body(containsString("You are looking at a recomputation")).body(not(containsString("<span class=\"value\">999</span>")));
        given().get("/api/v1/revisions/" + o.revisionId() + "/recomputed").then().statusCode(200)
                .body("differs", equalTo(true)).body("toolVersionDiffers", equalTo(true))
                .body("changes.path", equalTo(List.of("cutInSpeedRpm", "rated.powerToLoadW")));
    }

    @Test
    void the_compare_page_marks_differences() {
        String a = saveApi(SavedFixtures.document("Cmp", "", 30)).path("revisionId");
        String b = saveApi(SavedFixtures.document("Cmp", "", 33)).path("revisionId");
        given().get("/compare?a=" + a + "&b=" + b).then().statusCode(200)
                .body(containsString("<code>design.alternator.turnsPerCoil</code>"))
                .body(containsString("<mark>30</mark>")).body(containsString("<mark>33</mark>"))
                .body(containsString("(differs)"));
        coilwright.web.Html page = coilwright.web.Html.of(given().get("/compare?a=" + a + "&b=" + b).then().extract().response());
        String overlay = page.id("compare-curves").text();
        assertTrue(overlay.contains("Power to load, first") && overlay.contains("Power to load, second")
                && overlay.contains("Open-circuit EMF, second"), overlay);
        given().get("/compare?a=" + a + "&b=" + a).then().statusCode(200).body(containsString("No differences"));
        given().get("/compare").then().statusCode(200).body(containsString("name=\"a\""));
    }

    @Test
    void the_saved_page_and_its_print_view_show_the_charts_and_the_winding_layout_before_the_long_table() {
        Response saved = saveApi(SavedFixtures.document("Drawn for the client", "", 36));
        String id = saved.path("designId");
        String rev = saved.path("revisionId");
        for (String path : List.of("/d/" + id, "/d/" + id + "/r/" + rev + "/print")) {
            coilwright.web.Html page = coilwright.web.Html.of(given().get(path).then().statusCode(200).extract().response());
            assertEquals(3, page.all("#design-charts .chart svg").size(), path);
            assertFalse(page.all(path.endsWith("/print") ? "#design-winding .unrolled svg" : "#design-winding .unrolled img")
                    .isEmpty(), path + ": the unrolled winding (inline when printed, an image on the page)");
            assertTrue(page.has("design-inputs"), path);
            String html = page.doc().html();
            assertTrue(html.indexOf("id=\"design-inputs\"") < html.indexOf("id=\"design-charts\"")
                    && html.indexOf("id=\"design-charts\"") < html.indexOf("id=\"saved-points\""),
                    path + ": inputs, then charts, then the operating-point table");
            assertFalse(page.text().contains("Drawn from the saved input as this server computes it today"),
                    path + ": the saved numbers are this server's");
        }
    }
}
