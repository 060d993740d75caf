package coilwright.web.saved;

import coilwright.web.Json;
import com.fasterxml.jackson.databind.JsonNode;

import java.io.IOException;
import java.net.http.HttpResponse;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.atomic.AtomicBoolean;

/**
 * Saves and revises designs over HTTP from several threads while the real server ({@link ServerProcess}) is
 * killed with SIGKILL at random moments, round after round on the same database. After every restart each save
 * and revision that the previous server had acknowledged (answered 201) is read back and compared; at the end
 * all of them are read again, and the revisions of the shared design must be numbered 1, 2, 3, ... with no gap,
 * no repeat and no number that changed since it was first seen.
 *
 * <p>Writers each save new designs; revisers all add revisions to one shared design, so they also contend for
 * its revision numbers. Each kill comes at a random moment (from {@code seed}) within 1.5 s after the round's first
 * acknowledgement, so that it always lands among commits.
 */
final class KillLoop {
    /** A save or revision the server acknowledged, with what it must read back as. */
    record Ack(boolean revision, String designId, String revisionId, String title, String notes, int turns) {
    }

    /** What a run did and found. */
    record Outcome(int kills, int saves, int revisions, int killsWithoutAcks, List<String> lost, List<String> numbering,
                   List<String> refused, long wallMillis) {
        String summary() {
            return "kills " + kills + ", acknowledged saves " + saves + ", acknowledged revisions " + revisions
                    + ", lost " + lost.size() + ", numbering faults " + numbering.size() + ", kills before any ack "
                    + killsWithoutAcks + ", wall " + wallMillis / 1000.0 + " s";
        }
    }

    /** The kill comes at a uniformly random moment up to this long after the round's first acknowledgement. */
    private static final int MAX_KILL_DELAY_MS = 1500;
    private final Path dataDir;
    private final List<String> serverOptions;
    private final Random random;
    private final List<Ack> acked = new CopyOnWriteArrayList<>();
    private final Map<String, Integer> numberSeen = new HashMap<>();
    private final List<String> lost = new ArrayList<>();
    private final List<String> refused = new CopyOnWriteArrayList<>();
    private final List<String> numbering = new ArrayList<>();
    private String sharedDesignId;
    private String sharedToken;
    private int verified;

    KillLoop(Path dataDir, List<String> serverOptions, long seed) {
        this.dataDir = dataDir;
        this.serverOptions = serverOptions;
        this.random = new Random(seed);
    }

    Outcome run(int kills, int writers, int revisers) throws Exception {
        long start = System.nanoTime();
        int killsWithoutAcks = 0;
        for (int round = 0; round < kills; round++) {
            ServerProcess server = ServerProcess.start(dataDir, ServerProcess.QUICK_START, serverOptions);
            try {
                if (sharedDesignId == null) {
                    createSharedDesign(server);
                }
                verifyNew(server);
                int before = acked.size();
                AtomicBoolean stop = new AtomicBoolean();
                List<Thread> threads = new ArrayList<>();
                for (int t = 0; t < writers + revisers; t++) {
                    String tag = round + "-" + t;
                    boolean reviser = t >= writers;
                    Thread thread = new Thread(() -> writeUntilDead(server, tag, reviser, stop), "kill-loop-" + tag);
                    thread.start();
                    threads.add(thread);
                }
                awaitFirstAck(before, threads);
                Thread.sleep(random.nextInt(MAX_KILL_DELAY_MS));
                server.kill();
                stop.set(true);
                for (Thread thread : threads) {
                    thread.join(70_000);
                }
                if (server.process.exitValue() != 137) {
                    throw new AssertionError("round " + round + ": the server was not killed by SIGKILL but exited with "
                            + server.process.exitValue());
                }
                killsWithoutAcks += acked.size() == before ? 1 : 0;
                System.out.printf("round %d: %d acknowledged, %d lost so far, %.1f s%n", round, acked.size() - before,
                        lost.size(), (System.nanoTime() - start) / 1e9);
            } finally {
                server.close();
            }
        }
        try (ServerProcess server = ServerProcess.start(dataDir, ServerProcess.QUICK_START, serverOptions)) {
            verified = 0;
            verifyNew(server);
        }
        int revisions = (int) acked.stream().filter(Ack::revision).count();
        return new Outcome(kills, acked.size() - revisions, revisions, killsWithoutAcks, List.copyOf(lost),
                List.copyOf(numbering), List.copyOf(refused), (System.nanoTime() - start) / 1_000_000);
    }

    /** Waits until this round's first acknowledgement, so that every kill lands while saves are being written. */
    private void awaitFirstAck(int before, List<Thread> threads) throws InterruptedException {
        long deadline = System.nanoTime() + 120_000_000_000L;
        while (acked.size() == before && System.nanoTime() < deadline && threads.stream().anyMatch(Thread::isAlive)) {
            Thread.sleep(5);
        }
    }

    private void createSharedDesign(ServerProcess server) throws Exception {
        HttpResponse<String> r = server.postJson("/api/v1/designs", SavedFixtures.document("shared", "first", 30));
        if (r.statusCode() != 201) {
            throw new AssertionError("creating the shared design: " + r.statusCode() + " " + r.body());
        }
        JsonNode body = Json.mapper().readTree(r.body());
        sharedDesignId = body.get("designId").asText();
        sharedToken = body.get("editToken").asText();
        acked.add(new Ack(false, sharedDesignId, body.get("revisionId").asText(), "shared", "first", 30));
    }

    /** Saves (writer) or revises the shared design (reviser) until the server stops answering. */
    private void writeUntilDead(ServerProcess server, String tag, boolean reviser, AtomicBoolean stop) {
        for (int i = 0; !stop.get(); i++) {
            String title = (reviser ? "revision " : "save ") + tag + "-" + i;
            String notes = "notes " + tag + "-" + i + " ✓";
            int turns = SavedFixtures.loopTurns((tag + i).hashCode());
            String doc = SavedFixtures.document(title, notes, turns);
            try {
                HttpResponse<String> r = reviser
                        ? server.postJson("/api/v1/designs/" + sharedDesignId + "/revisions", doc, "X-Edit-Token", sharedToken)
                        : server.postJson("/api/v1/designs", doc);
                if (r.statusCode() != 201) {
                    refused.add(title + ": answered " + r.statusCode() + " " + r.body());
                    return;
                }
                JsonNode body = Json.mapper().readTree(r.body());
                acked.add(new Ack(reviser, body.get("designId").asText(), body.get("revisionId").asText(), title, notes, turns));
            } catch (IOException | InterruptedException serverGone) {
                return;
            }
        }
    }

    /** Reads back every acknowledgement not yet checked, then the shared design's numbering. */
    private void verifyNew(ServerProcess server) throws Exception {
        List<Ack> all = List.copyOf(acked);
        for (Ack a : all.subList(verified, all.size())) {
            HttpResponse<String> r = server.get("/api/v1/revisions/" + a.revisionId());
            if (r.statusCode() != 200) {
                lost.add(a + " answered " + r.statusCode());
                continue;
            }
            JsonNode body = Json.mapper().readTree(r.body());
            if (!a.designId().equals(body.get("designId").asText()) || !a.title().equals(body.get("title").asText())
                    || !a.notes().equals(body.get("notes").asText())
                    || a.turns() != body.at("/design/alternator/turnsPerCoil").asInt()
                    || body.at("/results/points").size() != 21) {
                lost.add(a + " reads back altered: " + r.body().substring(0, Math.min(300, r.body().length())));
            }
        }
        verified = all.size();
        checkNumbering(server, all);
    }

    private void checkNumbering(ServerProcess server, List<Ack> all) throws Exception {
        HttpResponse<String> r = server.get("/api/v1/designs/" + sharedDesignId);
        if (r.statusCode() != 200) {
            numbering.add("the shared design answered " + r.statusCode());
            return;
        }
        JsonNode lines = Json.mapper().readTree(r.body()).get("revisions");
        Map<String, Integer> now = new HashMap<>();
        for (int i = 0; i < lines.size(); i++) {
            int number = lines.get(i).get("number").asInt();
            String id = lines.get(i).get("revisionId").asText();
            if (number != i + 1) {
                numbering.add("line " + i + " of the shared design has number " + number);
            }
            if (now.put(id, number) != null) {
                numbering.add("revision " + id + " listed twice");
            }
            Integer before = numberSeen.putIfAbsent(id, number);
            if (before != null && before != number) {
                numbering.add("revision " + id + " was number " + before + ", now " + number);
            }
        }
        for (Ack a : all) {
            if (a.designId().equals(sharedDesignId) && !now.containsKey(a.revisionId())) {
                numbering.add("acknowledged revision " + a.revisionId() + " missing from the history");
            }
        }
    }
}
