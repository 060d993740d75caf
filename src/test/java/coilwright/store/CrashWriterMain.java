package coilwright.store;

import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Optional;

/**
 * Child process for {@code CrashDurabilityTest}: opens the H2 store in {@code args[0]} and saves designs
 * number {@code args[1]}, {@code args[1]} + 1, ... in a loop, printing {@code ACK <i> <designId> <revisionId>} after each save has returned (that is, after commit),
 * until it is killed. Every eighth save also adds a revision to design 0, printed as {@code REV ...}.
 * An optional {@code args[2]} is appended to the JDBC URL (e.g. {@code ;WRITE_DELAY=500} to reproduce loss).
 */
public final class CrashWriterMain {
    private CrashWriterMain() {
    }

    public static void main(String[] args) {
        Path dataDir = Path.of(args[0]);
        int start = Integer.parseInt(args[1]);
        DatabaseSettings settings = args.length > 2
                ? new DatabaseSettings(DatabaseSettings.h2File(dataDir).jdbcUrl().replace(DatabaseSettings.H2_OPTIONS, "")
                        + args[2], Optional.empty(), Optional.empty(), Optional.empty())
                : DatabaseSettings.h2File(dataDir);
        PrintStream out = new PrintStream(System.out, true, StandardCharsets.UTF_8);
        out.println("OPEN " + settings.jdbcUrl());
        try (Database db = Database.open(settings)) {
            DesignStore store = new DesignStore(db);
            SaveOutcome first = null;
            String token = null;
            for (int i = start; ; i++) {
                SaveOutcome s = store.create(draftFor(i));
                if (first == null) {
                    first = s;
                    token = s.editToken().orElseThrow();
                }
                out.println("ACK " + i + " " + s.designId() + " " + s.revisionId());
                if (i % 8 == 7) {
                    SaveOutcome r = store.addRevision(first.designId(), token, revisionFor(i));
                    out.println("REV " + i + " " + r.designId() + " " + r.revisionId());
                }
            }
        }
    }

    static DraftRevision draftFor(int i) {
        return new DraftRevision("crash design " + i + " <é>", "notes ✓ " + i,
                "{\"index\":" + i + ",\"pad\":\"" + "x".repeat(i % 50) + "\"}", "{\"r\":" + (i * 0.5) + "}", "crash-test", 1);
    }

    static DraftRevision revisionFor(int i) {
        return new DraftRevision("revision after " + i, "", "{\"after\":" + i + "}", "{}", "crash-test", 1);
    }
}
