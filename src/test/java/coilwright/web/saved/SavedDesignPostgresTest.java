package coilwright.web.saved;

import coilwright.App;
import coilwright.web.AppConfig;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.security.SecureRandom;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.HexFormat;
import org.junit.jupiter.api.Tag;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasSize;

/**
 * The whole app on PostgreSQL (127.0.0.1:5432, database {@code test}, trust auth) in a schema of its own, created
 * and dropped here and named in the URL ({@code currentSchema}). Skipped when PostgreSQL is unreachable, failed
 * instead when CI=true.
 */
@Tag("slow")
class SavedDesignPostgresTest {
    private static final String URL = "jdbc:postgresql://127.0.0.1:5432/test";

    @TempDir
    Path dataDir;

    private static String reachableUser() {
        DriverManager.setLoginTimeout(3);
        StringBuilder problems = new StringBuilder();
        for (String user : new String[] {"postgres", System.getProperty("user.name")}) {
            try (Connection c = DriverManager.getConnection(URL, user, null)) {
                return user;
            } catch (SQLException e) {
                problems.append(user).append(": ").append(e.getMessage()).append("; ");
            }
        }
        String message = "PostgreSQL at " + URL + " is not reachable (" + problems + ")";
        if ("true".equalsIgnoreCase(System.getenv("CI"))) {
            throw new AssertionError(message + "; CI=true, so this fails instead of skipping");
        }
        Assumptions.abort(message + "; skipped (set CI=true to make this a failure)");
        return null;
    }

    private static void sql(String user, String statement) throws SQLException {
        try (Connection c = DriverManager.getConnection(URL, user, null); Statement s = c.createStatement()) {
            s.execute(statement);
        }
    }

    @Test
    void the_app_saves_revises_and_reads_designs_on_postgresql() throws Exception {
        String user = reachableUser();
        byte[] random = new byte[6];
        new SecureRandom().nextBytes(random);
        String schema = "cw_app_" + HexFormat.of().formatHex(random);
        sql(user, "CREATE SCHEMA " + schema);
        try {
            String dbUrl = URL + "?user=" + user + "&currentSchema=" + schema;
            AppConfig config = new AppConfig(0, dataDir, dbUrl, AppConfig.DEFAULT_MAX_BODY_BYTES);
            App app = App.create(config).start("127.0.0.1", 0);
            try {
                io.restassured.RestAssured.baseURI = "http://127.0.0.1";
                io.restassured.RestAssured.port = app.port();
                given().get("/health").then().statusCode(200);
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
            try (Connection c = DriverManager.getConnection(URL, user, null); Statement s = c.createStatement();
                 var rs = s.executeQuery("SELECT count(*) FROM " + schema + ".revision")) {
                rs.next();
                org.junit.jupiter.api.Assertions.assertTrue(rs.getInt(1) >= 2, "revisions stored in the app's own schema");
            }
        } finally {
            sql(user, "DROP SCHEMA IF EXISTS " + schema + " CASCADE");
        }
    }
}
