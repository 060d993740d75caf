package coilwright.web.saved;

import coilwright.App;
import coilwright.web.AppConfig;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasSize;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The whole app on PostgreSQL (127.0.0.1:5432, database {@code test}, trust auth) in a schema of its own, created
 * and dropped here and named in the URL ({@code currentSchema}). Skipped when PostgreSQL is unreachable, failed
 * instead when CI=true.
 */
@Tag("slow")
class SavedDesignPostgresTest {
    @TempDir
    Path dataDir;

    @Test
    void the_app_saves_revises_and_reads_designs_on_postgresql() throws Exception {
        try (PostgresSchema schema = new PostgresSchema("cw_app_")) {
            AppConfig config = new AppConfig(0, dataDir, schema.appUrl(), AppConfig.DEFAULT_MAX_BODY_BYTES);
            App app = App.create(config).start("127.0.0.1", 0);
            try {
                io.restassured.RestAssured.baseURI = "http://127.0.0.1";
                io.restassured.RestAssured.port = app.port();
                given().get("/health").then().statusCode(200).body("database", equalTo("up"));
                var saved = given().contentType("application/json").body(SavedFixtures.document("On PostgreSQL"))
                        .post("/api/v1/designs");
                saved.then().statusCode(201);
                String id = saved.path("designId");
                given().header("X-Edit-Token", saved.<String>path("editToken")).contentType("application/json")
                        .body(SavedFixtures.document("On PostgreSQL", "second", 40)).post("/api/v1/designs/" + id + "/revisions")
                        .then().statusCode(201);
                given().header("X-Edit-Token", "wrong").contentType("application/json")
                        .body(SavedFixtures.document("On PostgreSQL", "third", 41)).post("/api/v1/designs/" + id + "/revisions")
                        .then().statusCode(403);
                given().get("/api/v1/designs/" + id).then().statusCode(200).body("revisions", hasSize(2))
                        .body("latest.notes", equalTo("second"));
                given().get("/d/" + id).then().statusCode(200);
            } finally {
                app.stop();
            }
            assertTrue(schema.count("SELECT count(*) FROM " + schema.name + ".revision") >= 2,
                    "revisions stored in the app's own schema");
        }
    }
}
