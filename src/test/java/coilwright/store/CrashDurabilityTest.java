package coilwright.store;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;
import org.junit.jupiter.api.condition.EnabledOnOs;
import org.junit.jupiter.api.condition.OS;
import org.junit.jupiter.api.io.TempDir;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Tag;

import static org.junit.jupiter.api.Assertions.*;

/**
 * An acknowledged save survives SIGKILL: a separate JVM ({@link CrashWriterMain}) saves designs into an H2 file
 * and prints each id after its commit; the test kills it mid-stream with SIGKILL
 * ({@link ProcessHandle#destroyForcibly()} on Linux), reopens the file and finds every printed save intact.
 */
@Tag("slow")
@EnabledOnOs({OS.LINUX, OS.MAC})
@Tag("slow")
class CrashDurabilityTest {
    private static final int ACKS_BEFORE_KILL = 300;

    @TempDir
    Path dataDir;

    record Line(String kind, int index, String designId, String revisionId) {
    }

    @Test
    void every_save_acknowledged_before_a_sigkill_is_found_intact_after_reopening() throws Exception {
        for (int round = 0; round < 2; round++) {
            List<Line> acked = runAndKill(dataDir, round * 1_000_000, null);
            assertTrue(acked.size() >= ACKS_BEFORE_KILL, "the writer acknowledged " + acked.size() + " saves");
            List<String> missing = missingAfterReopen(dataDir, acked);
            assertEquals(List.of(), missing, "acknowledged saves lost after SIGKILL (round " + round + ")");
        }
    }

    /**
     * Evidence for the setting chosen in {@link DatabaseSettings}: with H2's default write delay of 500 ms,
     * acknowledged saves are lost. Not run by default because loss is likely but not certain;
     * run with {@code -Dcoilwright.crashEvidence=true}.
     */
    @Test
    @EnabledIfSystemProperty(named = "coilwright.crashEvidence", matches = "true")
    void with_the_default_write_delay_acknowledged_saves_are_lost() throws Exception {
        int lost = 0;
        for (int round = 0; round < 5; round++) {
            List<Line> acked = runAndKill(dataDir.resolve("delay" + round), 0, ";WRITE_DELAY=500;LOCK_TIMEOUT=10000");
            List<String> missing = missingAfterReopen(dataDir.resolve("delay" + round), acked);
            System.out.println("WRITE_DELAY=500 round " + round + ": acknowledged " + acked.size() + ", lost " + missing.size());
            lost += missing.size();
        }
        assertTrue(lost > 0, "expected some acknowledged saves to be lost with WRITE_DELAY=500");
    }

    private static List<Line> runAndKill(Path dir, int start, String urlSuffix) throws IOException, InterruptedException {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), CrashWriterMain.class.getName(), dir.toString(),
                Integer.toString(start)));
        if (urlSuffix != null) {
            command.add(urlSuffix);
        }
        Path stderr = Files.createTempFile("crash-writer", ".err");
        Process p = new ProcessBuilder(command).redirectError(stderr.toFile()).start();
        List<Line> acked = new ArrayList<>();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
            long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
            String line;
            while (acked.size() < ACKS_BEFORE_KILL && System.nanoTime() < deadline && (line = r.readLine()) != null) {
                String[] f = line.split(" ");
                if (f[0].equals("ACK") || f[0].equals("REV")) {
                    acked.add(new Line(f[0], Integer.parseInt(f[1]), f[2], f[3]));
                }
            }
            // SIGKILL through the process handle, which (unlike Process.destroyForcibly) leaves our end of the
            // pipe open, so the lines the writer printed just before dying are read and checked too.
            assertTrue(p.toHandle().destroyForcibly(), "SIGKILL sent");
            assertTrue(p.waitFor(30, TimeUnit.SECONDS), "the writer process ended");
            while ((line = r.readLine()) != null) {
                String[] f = line.split(" ");
                if (f.length == 4 && (f[0].equals("ACK") || f[0].equals("REV"))) {
                    acked.add(new Line(f[0], Integer.parseInt(f[1]), f[2], f[3]));
                }
            }
        } finally {
            p.destroyForcibly();
        }
        assertEquals(137, p.exitValue(), () -> "killed by SIGKILL (128 + 9); writer's stderr: " + read(stderr));
        Files.deleteIfExists(stderr);
        return acked;
    }

    private static String read(Path file) {
        try {
            return Files.readString(file);
        } catch (IOException e) {
            return e.toString();
        }
    }

    private static List<String> missingAfterReopen(Path dir, List<Line> acked) {
        List<String> missing = new ArrayList<>();
        try (Database db = Database.open(DatabaseSettings.h2File(dir))) {
            DesignStore store = new DesignStore(db);
            for (Line a : acked) {
                DraftRevision expected = a.kind().equals("ACK") ? CrashWriterMain.draftFor(a.index())
                        : CrashWriterMain.revisionFor(a.index());
                var stored = store.revision(a.revisionId());
                if (stored.isEmpty()) {
                    missing.add(a.kind() + " " + a.index());
                    continue;
                }
                assertEquals(a.designId(), stored.get().designId());
                assertEquals(expected.title(), stored.get().title());
                assertEquals(expected.notes(), stored.get().notes());
                assertEquals(expected.inputJson(), stored.get().inputJson());
                assertEquals(expected.resultJson(), stored.get().resultJson());
            }
        }
        return missing;
    }
}
