package coilwright.web.saved;

import coilwright.FixedSeedUnderCi;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledOnOs;
import org.junit.jupiter.api.condition.OS;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.security.SecureRandom;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * No acknowledged save or revision is lost when the real server is killed with SIGKILL while four writers save
 * and three revisers revise one shared design (see {@link KillLoop}): 50 kills at random moments on the embedded
 * H2 file, 6 on PostgreSQL. The kill moments are reproducible: the seed is fixed under CI (or given by
 * COILWRIGHT_TEST_SEED) and printed with the counts.
 */
@Tag("slow")
@EnabledOnOs({OS.LINUX, OS.MAC})
class SavedDesignCrashTest {
    private static final int WRITERS = 4;
    private static final int REVISERS = 3;

    @TempDir
    Path dataDir;

    static long seed() {
        return FixedSeedUnderCi.chosenSeed(System.getenv()).map(Long::parseLong).orElseGet(() -> new SecureRandom().nextLong());
    }

    @Test
    void no_acknowledged_save_or_revision_is_lost_over_50_sigkills_on_h2() throws Exception {
        long seed = seed();
        KillLoop.Outcome o = new KillLoop(dataDir, List.of(), seed).run(Integer.getInteger("coilwright.crash.kills", 50),
                WRITERS, REVISERS);
        System.out.println("H2 crash test (seed " + seed + "): " + o.summary());
        assertAllKept(o, seed, 50);
    }

    @Test
    void no_acknowledged_save_or_revision_is_lost_over_6_sigkills_on_postgresql() throws Exception {
        long seed = seed();
        try (PostgresSchema schema = new PostgresSchema("cw_crash_")) {
            KillLoop.Outcome o = new KillLoop(dataDir, List.of("--db-url", schema.appUrl()), seed).run(6, WRITERS, REVISERS);
            System.out.println("PostgreSQL crash test (seed " + seed + "): " + o.summary());
            assertAllKept(o, seed, 6);
        }
    }

    private static void assertAllKept(KillLoop.Outcome o, long seed, int kills) {
        String where = " (seed " + seed + "; " + o.summary() + ")";
        assertEquals(List.of(), o.lost(), "acknowledged but lost" + where);
        assertEquals(List.of(), o.numbering(), "revision numbers" + where);
        assertEquals(List.of(), o.refused(), "every save and revision answered 201 while the server ran" + where);
        assertTrue(o.kills() >= Math.min(kills, Integer.getInteger("coilwright.crash.kills", kills)), where);
        assertTrue(o.saves() >= o.kills() && o.revisions() >= o.kills(),
                "on average at least one save and one revision acknowledged per kill" + where);
    }
}
