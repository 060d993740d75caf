package coilwright.web.saved;

import coilwright.App;
import coilwright.service.DemoEntry;
import coilwright.service.DesignDocument;
import coilwright.service.EvaluationService;
import coilwright.service.ExampleFiles;
import coilwright.web.AppConfig;
import coilwright.web.Json;
import coilwright.web.RecordBinder;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Tag;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;

/** Demo designs appear once, and saved links keep working, across restarts on the same data directory. */
@Tag("slow")
class SavedDesignRestartTest {
    @TempDir
    Path dataDir;

    private App start() {
        App app = App.create(AppConfig.defaults().withPort(0).withDataDir(dataDir)).start("127.0.0.1", 0);
        io.restassured.RestAssured.baseURI = "http://127.0.0.1";
        io.restassured.RestAssured.port = app.port();
        return app;
    }

    /** The examples the current tool can evaluate: those are the ones that must become demos. */
    private static List<String> evaluableExamples() {
        RecordBinder binder = new RecordBinder(Json.mapper());
        EvaluationService evaluation = new EvaluationService();
        List<String> slugs = new ArrayList<>();
        for (Map.Entry<String, String> e : ExampleFiles.read(SavedDesignRestartTest.class.getClassLoader()).entrySet()) {
            try {
                evaluation.evaluate(binder.bind(e.getValue(), DesignDocument.class).design());
                slugs.add(e.getKey());
            } catch (RuntimeException fails) {
                // not a demo until the tool can compute it
            }
        }
        return slugs;
    }

    private static List<DemoEntry> demosOnceLoaded(App app, int expected) throws InterruptedException {
        long deadline = System.nanoTime() + 120_000_000_000L;
        List<DemoEntry> demos = app.services().designs().demos();
        while (demos.size() < expected && System.nanoTime() < deadline) {
            Thread.sleep(100);
            demos = app.services().designs().demos();
        }
        return demos;
    }

    @Test
    void demos_appear_once_and_saved_links_keep_working_across_restarts() throws Exception {
        List<String> expected = evaluableExamples();
        App first = start();
        String designId;
        String revisionId;
        List<DemoEntry> demosBefore;
        try {
            var saved = given().contentType("application/json").body(SavedFixtures.document("Kept across restarts"))
                    .post("/api/v1/designs");
            designId = saved.path("designId");
            revisionId = saved.path("revisionId");
            demosBefore = demosOnceLoaded(first, expected.size());
        } finally {
            first.stop();
        }
        assertEquals(expected, demosBefore.stream().map(DemoEntry::slug).toList());
        for (int restart = 0; restart < 2; restart++) {
            App again = start();
            try {
                List<DemoEntry> demos = demosOnceLoaded(again, expected.size());
                Thread.sleep(300);
                assertEquals(demosBefore, again.services().designs().demos(), "demos unchanged, none duplicated");
                assertEquals(demos, again.services().designs().demos());
                given().get("/api/v1/demos").then().statusCode(200).body("size()", equalTo(expected.size()));
                given().get("/d/" + designId).then().statusCode(200);
                given().get("/api/v1/designs/" + designId).then().statusCode(200)
                        .body("latest.revisionId", equalTo(revisionId)).body("latest.title", equalTo("Kept across restarts"));
                given().get("/api/v1/revisions/" + revisionId + "/curves.csv").then().statusCode(200);
            } finally {
                again.stop();
            }
        }
    }
}
