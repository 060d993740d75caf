package coilwright.store;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.time.Instant;
import java.util.ArrayList;
import java.util.concurrent.CyclicBarrier;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.stream.IntStream;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.*;

/**
 * The behaviour every database behind {@link DesignStore} must show. Subclasses say which database; each test
 * starts from an empty one and may reopen it ({@link #reopen()}) to check what survives a restart.
 */
abstract class DesignStoreContract {
    protected DatabaseSettings settings;
    protected Database database;
    protected DesignStore store;

    /** Settings for a new, empty database (a new directory or schema). */
    protected abstract DatabaseSettings newDatabase() throws Exception;

    /** Removes what {@link #newDatabase()} made, after the test. */
    protected abstract void dispose(DatabaseSettings settings) throws Exception;

    @BeforeEach
    void openEmptyDatabase() throws Exception {
        settings = newDatabase();
        database = Database.open(settings);
        store = new DesignStore(database);
    }

    @AfterEach
    void closeDatabase() throws Exception {
        if (database != null) {
            database.close();
        }
        dispose(settings);
    }

    protected void reopen() {
        database.close();
        database = Database.open(settings);
        store = new DesignStore(database);
    }

    static DraftRevision draft(String title, String notes, String inputJson) {
        return new DraftRevision(title, notes, inputJson, "{\"emfLineV\":48.25}", "0.1.0-test", 1);
    }

    static final String TRICKY_TITLE = "Ω 3-phase <script>alert('x')</script> & \"quotes\" — 12s/10p 𝔅 ☃";
    static final String TRICKY_NOTES = "<b>bold</b>\r\nline 2\ttab\n" + "ünïcödé 🌬️💧 \\ backslash ' apostrophe\n";

    @Test
    void a_created_design_reads_back_with_every_field_intact() {
        Instant before = Instant.now().minusSeconds(1);
        DraftRevision d = new DraftRevision(TRICKY_TITLE, TRICKY_NOTES, "{\"slots\":12,\"poles\":10,\"name\":\"n\\u00e9\"}",
                "{\"efficiency\":0.873,\"curve\":[1,2,3]}", "1.2.3+build.7", 3);
        SaveOutcome saved = store.create(d);
        assertTrue(saved.created());
        StoredRevision r = store.latest(saved.designId()).orElseThrow();
        assertEquals(saved.designId(), r.designId());
        assertEquals(saved.revisionId(), r.revisionId());
        assertEquals(1, r.number());
        assertEquals(TRICKY_TITLE, r.title());
        assertEquals(TRICKY_NOTES, r.notes());
        assertEquals(d.inputJson(), r.inputJson());
        assertEquals(d.resultJson(), r.resultJson());
        assertEquals("1.2.3+build.7", r.toolVersion());
        assertEquals(3, r.schemaVersion());
        assertEquals(saved.revisionId(), r.latestRevisionId());
        assertFalse(r.isSuperseded());
        assertTrue(r.createdAt().isAfter(before) && r.createdAt().isBefore(Instant.now().plusSeconds(1)),
                "createdAt " + r.createdAt() + " is the time of saving");
        assertEquals(r, store.revision(saved.revisionId()).orElseThrow());
    }

    @Test
    void a_large_input_at_the_limit_is_stored_whole() {
        String input = "{\"pad\":\"" + "é".repeat((DraftRevision.MAX_INPUT_JSON_BYTES - 12) / 2) + "\"}";
        assertTrue(DraftRevision.utf8Length(input) <= DraftRevision.MAX_INPUT_JSON_BYTES);
        SaveOutcome saved = store.create(draft("big", "", input));
        assertEquals(input, store.latest(saved.designId()).orElseThrow().inputJson());
    }

    @Test
    void saving_the_same_first_revision_twice_returns_the_same_design_without_a_token() {
        SaveOutcome first = store.create(draft("Hydro 3 kW", "n", "{\"headM\":42}"));
        SaveOutcome again = store.create(draft("Hydro 3 kW", "n", "{\"headM\":42}"));
        assertTrue(first.editToken().isPresent());
        assertFalse(again.created());
        assertTrue(again.editToken().isEmpty(), "the token is given only once");
        assertEquals(first.designId(), again.designId());
        assertEquals(first.revisionId(), again.revisionId());
        assertEquals(1, store.history(first.designId()).size());
    }

    @Test
    void revisions_are_numbered_in_order_and_old_links_keep_their_content() {
        SaveOutcome first = store.create(draft("v1", "a", "{\"turns\":40}"));
        String token = first.editToken().orElseThrow();
        SaveOutcome second = store.addRevision(first.designId(), token, draft("v2", "b", "{\"turns\":44}"));
        SaveOutcome third = store.addRevision(first.designId(), token, draft("v3", "c", "{\"turns\":48}"));
        assertTrue(second.created() && third.created());
        assertTrue(second.editToken().isEmpty() && third.editToken().isEmpty(), "only creation hands out a token");
        assertEquals(first.designId(), third.designId());

        List<RevisionSummary> h = store.history(first.designId());
        assertEquals(List.of(1, 2, 3), h.stream().map(RevisionSummary::number).toList());
        assertEquals(List.of(first.revisionId(), second.revisionId(), third.revisionId()),
                h.stream().map(RevisionSummary::revisionId).toList());
        assertEquals(List.of("v1", "v2", "v3"), h.stream().map(RevisionSummary::title).toList());

        StoredRevision old = store.revision(first.revisionId()).orElseThrow();
        assertEquals("{\"turns\":40}", old.inputJson());
        assertEquals("v1", old.title());
        assertEquals(third.revisionId(), old.latestRevisionId());
        assertTrue(old.isSuperseded());
        StoredRevision latest = store.latest(first.designId()).orElseThrow();
        assertEquals(3, latest.number());
        assertEquals("{\"turns\":48}", latest.inputJson());
    }

    @Test
    void a_revision_equal_to_the_latest_is_not_stored_twice() {
        SaveOutcome first = store.create(draft("t", "n", "{\"a\":1}"));
        String token = first.editToken().orElseThrow();
        SaveOutcome same = store.addRevision(first.designId(), token, draft("t", "n", "{\"a\":1}"));
        assertFalse(same.created());
        assertEquals(first.revisionId(), same.revisionId());
        SaveOutcome next = store.addRevision(first.designId(), token, draft("t", "n", "{\"a\":2}"));
        SaveOutcome back = store.addRevision(first.designId(), token, draft("t", "n", "{\"a\":1}"));
        assertTrue(back.created(), "returning to earlier content is a new revision");
        assertNotEquals(first.revisionId(), back.revisionId());
        assertNotEquals(next.revisionId(), back.revisionId());
        assertEquals(3, store.history(first.designId()).size());
    }

    @Test
    void a_wrong_or_missing_token_changes_nothing() {
        SaveOutcome first = store.create(draft("mine", "", "{\"a\":1}"));
        SaveOutcome other = store.create(draft("theirs", "", "{\"b\":1}"));
        String id = first.designId();
        DraftRevision attack = draft("defaced", "", "{\"a\":666}");
        String otherToken = other.editToken().orElseThrow();
        String mine = first.editToken().orElseThrow();
        String flipped = (mine.charAt(0) == 'A' ? 'B' : 'A') + mine.substring(1);
        for (String bad : new String[] {null, "", "x", otherToken, flipped, mine + "A", " " + mine}) {
            assertThrows(EditForbiddenException.class, () -> store.addRevision(id, bad, attack), "token " + bad);
        }
        assertEquals(1, store.history(id).size());
        assertEquals("mine", store.latest(id).orElseThrow().title());
        assertEquals(1, store.history(other.designId()).size());
    }

    @Test
    void unknown_and_malformed_ids_are_not_found() {
        SaveOutcome saved = store.create(draft("t", "", "{}"));
        String token = saved.editToken().orElseThrow();
        String unknown = "AAAAAAAAAAAAAAAAAAAAAA";
        for (String id : new String[] {unknown, "short", "'; DROP TABLE design; --", "", null, saved.designId() + "x"}) {
            assertTrue(store.latest(id).isEmpty(), String.valueOf(id));
            assertTrue(store.revision(id).isEmpty(), String.valueOf(id));
            assertEquals(List.of(), store.history(id));
            assertThrows(DesignNotFoundException.class, () -> store.addRevision(id, token, draft("x", "", "{}")));
        }
        assertTrue(store.latest(saved.revisionId()).isEmpty(), "a revision id is not a design id");
        assertTrue(store.revision(saved.designId()).isEmpty(), "a design id is not a revision id");
    }

    @Test
    void ids_are_22_url_safe_characters_and_unrelated_for_adjacent_content() {
        Set<String> ids = new HashSet<>();
        SaveOutcome previous = null;
        for (int i = 0; i < 20; i++) {
            SaveOutcome s = store.create(draft("design", "", "{\"n\":" + i + "}"));
            for (String id : List.of(s.designId(), s.revisionId())) {
                assertTrue(DesignIds.isWellFormed(id), id);
                assertTrue(ids.add(id), "id repeats: " + id);
            }
            if (previous != null) {
                assertTrue(commonPrefix(previous.designId(), s.designId()) < 6,
                        previous.designId() + " and " + s.designId() + " share a long prefix");
            }
            previous = s;
        }
    }

    @Test
    void demo_designs_appear_once_however_often_they_are_loaded_and_after_a_restart() {
        String a = store.ensureDemo("battery-48v-axial", draft("48 V axial-flux demo", "demo", "{\"v\":48}"));
        String again = store.ensureDemo("battery-48v-axial", draft("48 V axial-flux demo", "demo", "{\"v\":48}"));
        store.ensureDemo("hydro-pelton", draft("Pelton demo", "", "{\"h\":30}"));
        store.create(draft("private", "", "{\"p\":1}"));
        assertEquals(a, again);
        assertEquals(List.of("battery-48v-axial", "hydro-pelton"), store.demos().stream().map(DemoDesign::slug).toList());
        assertEquals(1, store.history(a).size());

        reopen();
        store.ensureDemo("battery-48v-axial", draft("48 V axial-flux demo", "demo", "{\"v\":48}"));
        List<DemoDesign> demos = store.demos();
        assertEquals(2, demos.size(), demos.toString());
        assertEquals(a, demos.get(0).designId());
        assertEquals("48 V axial-flux demo", demos.get(0).title());
        assertEquals(1, store.history(a).size());
    }

    @Test
    void a_changed_demo_gets_a_new_revision_and_cannot_be_edited_by_token() {
        String id = store.ensureDemo("d", draft("old", "", "{\"v\":1}"));
        String oldRevision = store.latest(id).orElseThrow().revisionId();
        store.ensureDemo("d", draft("new", "", "{\"v\":2}"));
        assertEquals(2, store.history(id).size());
        assertEquals("old", store.revision(oldRevision).orElseThrow().title());
        assertEquals("new", store.demos().get(0).title());
        assertThrows(EditForbiddenException.class, () -> store.addRevision(id, EditTokens.newToken(), draft("x", "", "{}")));
        assertThrows(InvalidInputException.class, () -> store.ensureDemo("../etc", draft("x", "", "{}")));
    }

    @Test
    void a_demo_with_the_same_content_as_a_private_design_stays_separate() {
        SaveOutcome mine = store.create(draft("same", "", "{\"same\":true}"));
        String demo = store.ensureDemo("same", draft("same", "", "{\"same\":true}"));
        assertNotEquals(mine.designId(), demo);
        assertNotEquals(mine.revisionId(), store.latest(demo).orElseThrow().revisionId());
        assertEquals(List.of(demo), store.demos().stream().map(DemoDesign::designId).toList());
    }

    @Test
    void saved_designs_survive_a_restart() {
        SaveOutcome s = store.create(draft(TRICKY_TITLE, TRICKY_NOTES, "{\"x\":1}"));
        StoredRevision before = store.latest(s.designId()).orElseThrow();
        reopen();
        assertEquals(before, store.latest(s.designId()).orElseThrow());
        SaveOutcome next = store.addRevision(s.designId(), s.editToken().orElseThrow(), draft("t2", "", "{\"x\":2}"));
        assertEquals(2, store.revision(next.revisionId()).orElseThrow().number());
    }

    @Test
    void a_database_created_at_schema_version_1_migrates_and_keeps_its_designs() throws Exception {
        database.close();
        dispose(settings);
        settings = newDatabase();
        database = Database.open(settings, Optional.of("1"));
        assertEquals("1", database.schemaVersion());
        store = new DesignStore(database);
        SaveOutcome s = store.create(draft(TRICKY_TITLE, TRICKY_NOTES, "{\"m\":1}"));
        store.addRevision(s.designId(), s.editToken().orElseThrow(), draft("second", "", "{\"m\":2}"));
        store.ensureDemo("demo", draft("demo", "", "{\"d\":1}"));
        StoredRevision first = store.revision(s.revisionId()).orElseThrow();
        StoredRevision latest = store.latest(s.designId()).orElseThrow();
        String longVersion = "9.9.9+" + "b".repeat(60);
        assertThrows(StoreException.class, () -> store.create(new DraftRevision("v", "", "{}", "{}", longVersion, 1)),
                "version 1 of the schema holds tool versions of at most 40 characters");

        database.close();
        database = Database.open(settings);
        store = new DesignStore(database);
        assertEquals("2", database.schemaVersion());
        assertEquals(first, store.revision(s.revisionId()).orElseThrow());
        assertEquals(latest, store.latest(s.designId()).orElseThrow());
        assertEquals(1, store.demos().size());
        SaveOutcome wide = store.create(new DraftRevision("v", "", "{}", "{}", longVersion, 1));
        assertEquals(longVersion, store.latest(wide.designId()).orElseThrow().toolVersion());
    }

    record Ack(SaveOutcome outcome, DraftRevision expected) {
    }

    @Test
    void parallel_saves_and_revisions_are_all_kept_intact_with_unique_ids_and_gapless_numbers() throws Exception {
        int threads = 8;
        int createsPerThread = 12;
        int revisionsPerThread = 12;
        SaveOutcome shared = store.create(draft("shared", "", "{\"shared\":0}"));
        String token = shared.editToken().orElseThrow();
        DraftRevision race = draft("same content from every thread", "", "{\"race\":true}");
        CyclicBarrier start = new CyclicBarrier(threads);
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        List<Future<List<Ack>>> futures = new ArrayList<>();
        for (int t = 0; t < threads; t++) {
            int thread = t;
            futures.add(pool.submit(() -> {
                List<Ack> acks = new ArrayList<>();
                start.await();
                acks.add(new Ack(store.create(race), race));
                for (int i = 0; i < Math.max(createsPerThread, revisionsPerThread); i++) {
                    if (i < createsPerThread) {
                        DraftRevision d = draft("thread " + thread + " design " + i, "ü " + i, "{\"t\":" + thread + ",\"i\":" + i + "}");
                        acks.add(new Ack(store.create(d), d));
                    }
                    if (i < revisionsPerThread) {
                        DraftRevision r = draft("revision by " + thread, "#" + i, "{\"rt\":" + thread + ",\"ri\":" + i + "}");
                        acks.add(new Ack(store.addRevision(shared.designId(), token, r), r));
                    }
                }
                return acks;
            }));
        }
        pool.shutdown();
        List<Ack> all = new ArrayList<>();
        for (Future<List<Ack>> f : futures) {
            all.addAll(f.get(180, TimeUnit.SECONDS));
        }

        List<Ack> raceAcks = all.stream().filter(a -> a.expected() == race).toList();
        assertEquals(threads, raceAcks.size());
        assertEquals(1, raceAcks.stream().filter(a -> a.outcome().created()).count(), "one of the racing creates stores it");
        assertEquals(1, raceAcks.stream().filter(a -> a.outcome().editToken().isPresent()).count());
        assertEquals(1, raceAcks.stream().map(a -> a.outcome().designId()).distinct().count());
        assertEquals(1, store.history(raceAcks.get(0).outcome().designId()).size());

        Set<String> revisionIds = new HashSet<>();
        for (Ack a : all) {
            StoredRevision r = store.revision(a.outcome().revisionId()).orElseThrow();
            assertEquals(a.outcome().designId(), r.designId());
            assertEquals(a.expected().title(), r.title());
            assertEquals(a.expected().notes(), r.notes());
            assertEquals(a.expected().inputJson(), r.inputJson());
            assertEquals(a.expected().resultJson(), r.resultJson());
            if (a.outcome().created()) {
                assertTrue(revisionIds.add(a.outcome().revisionId()), "revision id repeats: " + a.outcome().revisionId());
            }
        }
        assertEquals(1 + threads * createsPerThread + threads * revisionsPerThread, revisionIds.size());

        List<RevisionSummary> history = store.history(shared.designId());
        int expected = 1 + threads * revisionsPerThread;
        assertEquals(IntStream.rangeClosed(1, expected).boxed().toList(),
                history.stream().map(RevisionSummary::number).toList(), "numbers 1.." + expected + " without gaps");
        assertEquals(expected, history.stream().map(RevisionSummary::revisionId).distinct().count());
        StoredRevision latest = store.latest(shared.designId()).orElseThrow();
        assertEquals(history.get(expected - 1).revisionId(), latest.revisionId());
        assertEquals(expected, latest.number());
    }

    static int commonPrefix(String a, String b) {
        int i = 0;
        while (i < a.length() && i < b.length() && a.charAt(i) == b.charAt(i)) {
            i++;
        }
        return i;
    }
}
