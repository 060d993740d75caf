package coilwright.web.saved;

import coilwright.App;
import coilwright.service.DemoEntry;
import coilwright.web.AppConfig;
import coilwright.web.Json;
import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.net.URI;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.stream.IntStream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Two instances of the service on loopback ports over one PostgreSQL schema, as when the service is scaled out
 * behind a reverse proxy: a design saved through one is served and revised through the other, and revisions of one
 * design sent concurrently to both get unique, gap-free numbers with nothing lost.
 */
@Tag("slow")
class TwoInstancesTest {
    private static final int THREADS_PER_INSTANCE = 4;
    private static final int REVISIONS_PER_THREAD = 6;

    @TempDir
    Path dirA;
    @TempDir
    Path dirB;

    record Ack(String revisionId, String notes, int turns) {
    }

    @Test
    void two_instances_on_one_database_serve_each_others_designs_and_number_revisions_without_gaps() throws Exception {
        try (PostgresSchema schema = new PostgresSchema("cw_two_")) {
            App a = App.create(new AppConfig(0, dirA, schema.appUrl(), AppConfig.DEFAULT_MAX_BODY_BYTES)).start("127.0.0.1", 0);
            App b = App.create(new AppConfig(0, dirB, schema.appUrl(), AppConfig.DEFAULT_MAX_BODY_BYTES)).start("127.0.0.1", 0);
            try {
                JsonNode saved = json(post(a, "/api/v1/designs", SavedFixtures.document("Shared", "from A", 36), null), 201);
                String id = saved.get("designId").asText();
                String token = saved.get("editToken").asText();
                JsonNode seen = json(get(b, "/api/v1/designs/" + id), 200);
                assertEquals("from A", seen.at("/latest/notes").asText(), "B serves what A saved");
                JsonNode revised = json(post(b, "/api/v1/designs/" + id + "/revisions",
                        SavedFixtures.document("Shared", "from B", 37), token), 201);
                assertEquals(revised.get("revisionId").asText(), json(get(a, "/api/v1/designs/" + id), 200)
                        .at("/latest/revisionId").asText(), "A serves what B revised");
                assertEquals(200, get(b, "/d/" + id).statusCode());

                List<Ack> acks = reviseFromBoth(a, b, id, token);
                JsonNode lines = json(get(a, "/api/v1/designs/" + id), 200).get("revisions");
                int expected = 2 + 2 * THREADS_PER_INSTANCE * REVISIONS_PER_THREAD;
                List<Integer> numbers = new ArrayList<>();
                Map<String, Integer> byId = new HashMap<>();
                lines.forEach(l -> {
                    numbers.add(l.get("number").asInt());
                    byId.put(l.get("revisionId").asText(), l.get("number").asInt());
                });
                assertEquals(IntStream.rangeClosed(1, expected).boxed().toList(), numbers, "unique and gap-free");
                assertEquals(expected, byId.size(), "each revision listed once");
                for (Ack ack : acks) {
                    JsonNode r = json(get(b, "/api/v1/revisions/" + ack.revisionId()), 200);
                    assertEquals(ack.notes(), r.get("notes").asText());
                    assertEquals(ack.turns(), r.at("/design/alternator/turnsPerCoil").asInt());
                    assertEquals(byId.get(ack.revisionId()).intValue(), r.get("number").asInt());
                }

                JsonNode same1 = json(post(a, "/api/v1/designs", SavedFixtures.document("Same"), null), 201);
                JsonNode same2 = json(post(b, "/api/v1/designs", SavedFixtures.document("Same"), null), 201);
                assertNotEquals(same1.get("designId").asText(), same2.get("designId").asText());

                List<DemoEntry> demosA = demosLoaded(a);
                assertEquals(demosA, demosLoaded(b), "both instances list the same demos");
                assertEquals(demosA.size(), demosA.stream().map(DemoEntry::slug).distinct().count(), "each demo once");
            } finally {
                a.stop();
                b.stop();
            }
        }
    }

    /** Revisions of one design from several threads on each instance at once; returns the acknowledged ones. */
    private static List<Ack> reviseFromBoth(App a, App b, String id, String token) throws Exception {
        ExecutorService pool = Executors.newFixedThreadPool(2 * THREADS_PER_INSTANCE);
        List<Future<List<Ack>>> futures = new ArrayList<>();
        for (int t = 0; t < 2 * THREADS_PER_INSTANCE; t++) {
            App target = t % 2 == 0 ? a : b;
            int thread = t;
            futures.add(pool.submit(() -> {
                List<Ack> acks = new ArrayList<>();
                for (int i = 0; i < REVISIONS_PER_THREAD; i++) {
                    String notes = "thread " + thread + " revision " + i;
                    int turns = SavedFixtures.loopTurns(thread * REVISIONS_PER_THREAD + i);
                    JsonNode r = json(post(target, "/api/v1/designs/" + id + "/revisions",
                            SavedFixtures.document("Shared", notes, turns), token), 201);
                    acks.add(new Ack(r.get("revisionId").asText(), notes, turns));
                }
                return acks;
            }));
        }
        pool.shutdown();
        List<Ack> all = new ArrayList<>();
        for (Future<List<Ack>> f : futures) {
            all.addAll(f.get(300, TimeUnit.SECONDS));
        }
        assertEquals(2 * THREADS_PER_INSTANCE * REVISIONS_PER_THREAD, all.size());
        return all;
    }

    private static List<DemoEntry> demosLoaded(App app) throws InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
        List<DemoEntry> demos = app.services().designs().demos();
        while (demos.size() < 3 && System.nanoTime() < deadline) {
            Thread.sleep(200);
            demos = app.services().designs().demos();
        }
        assertTrue(demos.size() >= 3, "demos loaded: " + demos);
        return demos;
    }

    private static HttpResponse<String> get(App app, String path) throws Exception {
        return ServerProcess.HTTP.send(HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + app.port() + path))
                .timeout(Duration.ofSeconds(60)).build(), HttpResponse.BodyHandlers.ofString());
    }

    private static HttpResponse<String> post(App app, String path, String body, String token) throws Exception {
        HttpRequest.Builder r = HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + app.port() + path))
                .timeout(Duration.ofSeconds(60)).header("Content-Type", "application/json")
                .POST(HttpRequest.BodyPublishers.ofString(body));
        if (token != null) {
            r.header("X-Edit-Token", token);
        }
        return ServerProcess.HTTP.send(r.build(), HttpResponse.BodyHandlers.ofString());
    }

    private static JsonNode json(HttpResponse<String> r, int status) throws Exception {
        assertEquals(status, r.statusCode(), r.body());
        return Json.mapper().readTree(r.body());
    }
}
