package coilwright.web.saved;

import coilwright.web.Json;
import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledOnOs;
import org.junit.jupiter.api.condition.OS;
import org.junit.jupiter.api.io.TempDir;

import java.net.http.HttpResponse;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.atomic.AtomicBoolean;
import org.junit.jupiter.api.Tag;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The real server in its own JVM saves designs over HTTP and is killed with SIGKILL while saves are still arriving;
 * after a restart on the same data directory every save it had acknowledged (answered 201) is there, intact.
 */
@EnabledOnOs({OS.LINUX, OS.MAC})
@Tag("slow")
class SavedDesignCrashTest {
    private static final int ACKS_BEFORE_KILL = 25;

    record Ack(int index, String designId, String revisionId) {
    }

    @TempDir
    Path dataDir;

    @Test
    void every_save_acknowledged_before_a_sigkill_is_found_after_a_restart() throws Exception {
        List<Ack> acked = new CopyOnWriteArrayList<>();
        ServerProcess server = ServerProcess.start(dataDir);
        AtomicBoolean stop = new AtomicBoolean();
        Thread writer = new Thread(() -> {
            for (int i = 0; !stop.get(); i++) {
                try {
                    HttpResponse<String> r = server.postJson("/api/v1/designs", SavedFixtures.document("Crash save " + i, "n" + i, 30 + i % 20));
                    if (r.statusCode() == 201) {
                        JsonNode body = Json.mapper().readTree(r.body());
                        acked.add(new Ack(i, body.get("designId").asText(), body.get("revisionId").asText()));
                    }
                } catch (Exception dead) {
                    return;
                }
            }
        });
        writer.start();
        long deadline = System.nanoTime() + 180_000_000_000L;
        while (acked.size() < ACKS_BEFORE_KILL && System.nanoTime() < deadline) {
            Thread.sleep(20);
        }
        server.kill();
        stop.set(true);
        writer.join(70_000);
        assertEquals(137, server.process.exitValue(), "killed by SIGKILL");
        assertTrue(acked.size() >= ACKS_BEFORE_KILL, "acknowledged " + acked.size());
        try (ServerProcess again = ServerProcess.start(dataDir)) {
            for (Ack a : acked) {
                HttpResponse<String> r = again.get("/api/v1/revisions/" + a.revisionId());
                assertEquals(200, r.statusCode(), "acknowledged save " + a.index() + " lost");
                JsonNode body = Json.mapper().readTree(r.body());
                assertEquals(a.designId(), body.get("designId").asText());
                assertEquals("Crash save " + a.index(), body.get("title").asText());
                assertEquals("n" + a.index(), body.get("notes").asText());
                assertEquals(30 + a.index() % 20, body.at("/design/alternator/turnsPerCoil").asInt());
                assertEquals(21, body.at("/results/points").size());
            }
        }
    }
}
