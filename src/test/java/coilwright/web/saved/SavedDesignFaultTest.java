package coilwright.web.saved;

import coilwright.App;
import coilwright.store.TestDatabases;
import coilwright.web.AppConfig;
import coilwright.web.Json;
import io.restassured.response.Response;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.net.ServerSocket;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.notNullValue;
import static org.hamcrest.Matchers.startsWith;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Faults of the database: unreachable at start (the process says so in one line and exits), and lost while the
 * service runs (saved designs answer 503, everything else keeps working, /health says the database is down, and
 * saving works again by itself once the database is back). The database is lost by cutting a TCP proxy between
 * the app and PostgreSQL.
 */
@Tag("slow")
class SavedDesignFaultTest {
    @TempDir
    Path dataDir;

    @Test
    void a_database_lost_while_running_gives_503_for_saved_designs_only_and_recovers_by_itself() throws Exception {
        try (PostgresSchema schema = new PostgresSchema("cw_fault_"); TcpProxy proxy = new TcpProxy(5432)) {
            App app = App.create(new AppConfig(0, dataDir, schema.appUrl("127.0.0.1:" + proxy.port()),
                    AppConfig.DEFAULT_MAX_BODY_BYTES)).start("127.0.0.1", 0);
            try {
                io.restassured.RestAssured.baseURI = "http://127.0.0.1";
                io.restassured.RestAssured.port = app.port();
                Response saved = save("Before the fault");
                saved.then().statusCode(201);
                String id = saved.path("designId");
                String token = saved.path("editToken");
                given().get("/health").then().statusCode(200).body("status", equalTo("up")).body("database", equalTo("up"));

                proxy.cut();
                long cutAt = System.nanoTime();
                Response refused = save("During the fault");
                refused.then().statusCode(503).contentType(startsWith("application/problem+json"))
                        .header("Retry-After", notNullValue())
                        .body("type", equalTo("/problems/service-unavailable")).body("status", equalTo(503))
                        .body("detail", containsString("database cannot be reached"));
                assertTrue(System.nanoTime() - cutAt < TimeUnit.SECONDS.toNanos(15), "answered promptly");
                given().get("/api/v1/designs/" + id).then().statusCode(503).contentType(startsWith("application/problem+json"));
                given().header("X-Edit-Token", token).contentType("application/json")
                        .body(SavedFixtures.document("Revised during the fault", "", 31))
                        .post("/api/v1/designs/" + id + "/revisions").then().statusCode(503);
                given().get("/d/" + id).then().statusCode(503).contentType(startsWith("text/html"))
                        .body(not(containsString("Exception"))).body(not(containsString("at coilwright")));
                given().contentType("application/json").body(designOf(SavedFixtures.document("Evaluated", "", 36)))
                        .post("/api/v1/evaluate").then().statusCode(200);
                given().get("/").then().statusCode(200);
                given().get("/design/new").then().statusCode(200);
                given().get("/health").then().statusCode(200).body("status", equalTo("degraded"))
                        .body("database", equalTo("down"));

                proxy.restore();
                Response after = saveWhenBack("After the fault");
                after.then().statusCode(201);
                given().get("/api/v1/designs/" + id).then().statusCode(200).body("latest.title", equalTo("Before the fault"));
                given().header("X-Edit-Token", token).contentType("application/json")
                        .body(SavedFixtures.document("Revised after the fault", "", 32))
                        .post("/api/v1/designs/" + id + "/revisions").then().statusCode(201);
                given().get("/d/" + id).then().statusCode(200);
                awaitHealthUp();
            } finally {
                app.stop();
            }
            assertEquals(3, schema.count("SELECT count(*) FROM " + schema.name + ".revision r JOIN " + schema.name
                    + ".design d ON d.design_id = r.design_id WHERE d.demo_slug IS NULL"), "nothing refused was stored");
        }
    }

    @Test
    void an_unreachable_database_at_start_is_one_line_on_stderr_and_a_nonzero_exit() throws Exception {
        int closedPort;
        try (ServerSocket s = new ServerSocket(0)) {
            closedPort = s.getLocalPort();
        }
        String unreachable = "jdbc:postgresql://127.0.0.1:" + closedPort + "/test";
        String noSuchDatabase = "jdbc:postgresql://127.0.0.1:5432/no_such_database_cw?user=" + TestDatabases.postgresUser();
        Map<String, String> expected = Map.of(
                unreachable, "coilwright: cannot open the design store at " + unreachable + ": Connection refused",
                noSuchDatabase, "coilwright: cannot open the design store at " + noSuchDatabase + ": FATAL: database",
                "mysql://elsewhere/db", "coilwright: dbUrl = mysql://elsewhere/db: must start with jdbc:h2: or jdbc:postgresql:");
        for (Map.Entry<String, String> e : expected.entrySet()) {
            Path stderr = Files.createTempFile("coilwright-start", ".err");
            List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                    "-cp", System.getProperty("java.class.path"), "coilwright.App", "--port", "0",
                    "--data-dir", dataDir.toString(), "--db-url", e.getKey()));
            Process p = new ProcessBuilder(cmd).redirectOutput(ProcessBuilder.Redirect.DISCARD)
                    .redirectError(stderr.toFile()).start();
            assertTrue(p.waitFor(60, TimeUnit.SECONDS), "the process ends by itself");
            List<String> lines = Files.readAllLines(stderr);
            Files.delete(stderr);
            assertNotEquals(0, p.exitValue(), "a non-zero exit status");
            assertEquals(1, lines.size(), "one line on stderr: " + lines);
            assertTrue(lines.get(0).startsWith(e.getValue()), lines.get(0));
        }
    }

    private static Response save(String title) {
        return given().contentType("application/json").body(SavedFixtures.document(title, "", 36)).post("/api/v1/designs");
    }

    private static Response saveWhenBack(String title) throws InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(30);
        Response r = save(title);
        while (r.statusCode() == 503 && System.nanoTime() < deadline) {
            Thread.sleep(200);
            r = save(title);
        }
        return r;
    }

    private static void awaitHealthUp() throws InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(10);
        while (!"up".equals(given().get("/health").path("status")) && System.nanoTime() < deadline) {
            Thread.sleep(200);
        }
        given().get("/health").then().statusCode(200).body("status", equalTo("up")).body("database", equalTo("up"));
    }

    private static String designOf(String document) throws IOException {
        return Json.mapper().writeValueAsString(Json.mapper().readTree(document).get("design"));
    }
}
