package coilwright.store;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
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
    void the_same_content_saved_twice_makes_two_designs_each_with_its_own_link_and_token() {
        SaveOutcome first = store.create(draft("Hydro 3 kW", "n", "{\"headM\":42}"));
        SaveOutcome again = store.create(draft("Hydro 3 kW", "n", "{\"headM\":42}"));
        assertTrue(first.created() && again.created());
        assertNotEquals(first.designId(), again.designId(), "nobody can claim a link by saving its content first");
        assertNotEquals(first.revisionId(), again.revisionId());
        assertNotEquals(first.editToken().orElseThrow(), again.editToken().orElseThrow());
        assertThrows(EditForbiddenException.class, () -> store.addRevision(first.designId(), again.editToken().get(),
                draft("taken over", "", "{}")), "one save's token does not open the other");
        assertEquals(1, store.history(first.designId()).size());
        assertEquals(1, store.history(again.designId()).size());
    }

    @Test
    void the_token_check_alone_refuses_a_wrong_token_and_an_unknown_design_and_changes_nothing() {
        SaveOutcome s = store.create(draft("t", "", "{}"));
        store.checkEditToken(s.designId(), s.editToken().orElseThrow());
        assertThrows(EditForbiddenException.class, () -> store.checkEditToken(s.designId(), EditTokens.newToken()));
        assertThrows(EditForbiddenException.class, () -> store.checkEditToken(s.designId(), null));
        assertThrows(DesignNotFoundException.class, () -> store.checkEditToken("D".repeat(22), s.editToken().get()));
        assertThrows(DesignNotFoundException.class, () -> store.checkEditToken("<script>", s.editToken().get()));
        String demo = store.ensureDemo("demo", draft("demo", "", "{}"));
        assertThrows(EditForbiddenException.class, () -> store.checkEditToken(demo, EditTokens.newToken()));
        assertEquals(1, store.history(s.designId()).size());
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
        assertNotEquals(store.create(draft("design", "", "{\"n\":0}")).designId(),
                DesignIds.digestId("coilwright/design/v1", "design", "", "{\"n\":0}"),
                "a new id is not the content hash that earlier versions used");
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
        openAtVersion("1");
        String token = EditTokens.newToken();
        List<String> ids = legacyDesign(TRICKY_TITLE, TRICKY_NOTES, token, 2, null);
        legacyDesign("demo", "", null, 1, "demo");
        String longVersion = "9.9.9+" + "b".repeat(60);
        try (Connection c = database.dataSource().getConnection(); Statement st = c.createStatement()) {
            assertThrows(SQLException.class, () -> st.executeUpdate("UPDATE revision SET tool_version = '" + longVersion + "'"),
                    "version 1 of the schema holds tool versions of at most 40 characters");
        }

        reopen();
        assertEquals("3", database.schemaVersion());
        StoredRevision first = store.revision(ids.get(1)).orElseThrow();
        assertEquals(TRICKY_TITLE, first.title());
        assertEquals(TRICKY_NOTES, first.notes());
        assertEquals(1, first.number());
        assertEquals(ids.get(2), store.latest(ids.get(0)).orElseThrow().revisionId());
        assertEquals(List.of("demo"), store.demos().stream().map(DemoDesign::slug).toList());
        SaveOutcome wide = store.create(new DraftRevision("v", "", "{}", "{}", longVersion, 1));
        assertEquals(longVersion, store.latest(wide.designId()).orElseThrow().toolVersion());
        store.addRevision(ids.get(0), token, draft("third", "", "{\"r\":3}"));
        assertEquals(List.of(1, 2, 3), store.history(ids.get(0)).stream().map(RevisionSummary::number).toList());
    }

    @Test
    void a_design_saved_under_a_content_derived_id_by_an_earlier_version_keeps_its_link_and_token() throws Exception {
        openAtVersion("2");
        String token = EditTokens.newToken();
        List<String> ids = legacyDesign("old", "kept", token, 1, null);
        assertEquals(DesignIds.digestId("coilwright/design/v1", "old", "kept", "{\"r\":1}"), ids.get(0));
        reopen();
        assertEquals("3", database.schemaVersion());
        StoredRevision old = store.latest(ids.get(0)).orElseThrow();
        assertEquals(ids.get(1), old.revisionId());
        assertEquals("old", old.title());
        SaveOutcome next = store.addRevision(ids.get(0), token, draft("newer", "", "{\"o\":2}"));
        assertEquals(ids.get(0), next.designId());
        assertEquals(List.of(1, 2), store.history(ids.get(0)).stream().map(RevisionSummary::number).toList());
        assertEquals("old", store.revision(ids.get(1)).orElseThrow().title(), "the old revision link still shows it");
    }

    private void openAtVersion(String version) throws Exception {
        database.close();
        dispose(settings);
        settings = newDatabase();
        database = Database.open(settings, Optional.of(version));
        assertEquals(version, database.schemaVersion());
    }

    /**
     * Writes a design as versions before random ids did (schema 1 or 2): ids derived from the content, revisions
     * numbered 1..n with inputs {"r":k}. Returns the design id, then the revision ids oldest first.
     */
    private List<String> legacyDesign(String title, String notes, String token, int revisions, String demoSlug)
            throws SQLException {
        String designId = demoSlug != null ? DesignIds.demoDesignId(demoSlug)
                : DesignIds.digestId("coilwright/design/v1", title, notes, "{\"r\":1}");
        List<String> ids = new ArrayList<>(List.of(designId));
        String parent = "";
        try (Connection c = database.dataSource().getConnection()) {
            for (int k = 1; k <= revisions; k++) {
                String input = "{\"r\":" + k + "}";
                String revisionId = DesignIds.digestId("coilwright/revision/v1", designId, parent, title, notes, input);
                try (var ps = c.prepareStatement("INSERT INTO revision (revision_id, design_id, revision_number,"
                        + " parent_revision_id, title, notes, input_json, result_json, tool_version, schema_version,"
                        + " created_at) VALUES (?, ?, ?, ?, ?, ?, ?, '{}', '0.0.1', 1, CURRENT_TIMESTAMP)")) {
                    if (k == 1) {
                        try (var design = c.prepareStatement("INSERT INTO design (design_id, edit_token_hash, demo_slug,"
                                + " latest_revision_id, latest_number, created_at) VALUES (?, ?, ?, ?, 1, CURRENT_TIMESTAMP)")) {
                            design.setString(1, designId);
                            design.setString(2, token == null ? null : EditTokens.hash(token));
                            design.setString(3, demoSlug);
                            design.setString(4, revisionId);
                            design.executeUpdate();
                        }
                    }
                    ps.setString(1, revisionId);
                    ps.setString(2, designId);
                    ps.setInt(3, k);
                    ps.setString(4, parent.isEmpty() ? null : parent);
                    ps.setString(5, title);
                    ps.setString(6, notes);
                    ps.setString(7, input);
                    ps.executeUpdate();
                }
                try (var head = c.prepareStatement("UPDATE design SET latest_revision_id = ?, latest_number = ? WHERE design_id = ?")) {
                    head.setString(1, revisionId);
                    head.setInt(2, k);
                    head.setString(3, designId);
                    head.executeUpdate();
                }
                ids.add(revisionId);
                parent = revisionId;
            }
        }
        return ids;
    }

    @Test
    void the_schema_itself_refuses_a_repeated_or_a_skipped_revision_number() throws Exception {
        SaveOutcome s = store.create(draft("t", "", "{}"));
        store.addRevision(s.designId(), s.editToken().orElseThrow(), draft("t2", "", "{\"x\":2}"));
        String insert = "INSERT INTO revision (revision_id, design_id, revision_number, parent_revision_id, title, notes,"
                + " input_json, result_json, tool_version, schema_version, created_at, previous_number) VALUES (?, '"
                + s.designId() + "', ?, NULL, 't', '', '{}', '{}', 'x', 1, CURRENT_TIMESTAMP, ?)";
        int[][] refused = {{2, 1}, {4, 3}, {3, 1}, {3, -1}, {1, 0}, {0, -1}};
        for (int[] numbers : refused) {
            try (Connection c = database.dataSource().getConnection(); var ps = c.prepareStatement(insert)) {
                ps.setString(1, DesignIds.random());
                ps.setInt(2, numbers[0]);
                ps.setInt(3, numbers[1]);
                assertThrows(SQLException.class, ps::executeUpdate, "number " + numbers[0] + " after " + numbers[1]);
            }
        }
        assertEquals(List.of(1, 2), store.history(s.designId()).stream().map(RevisionSummary::number).toList());
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
        assertTrue(raceAcks.stream().allMatch(a -> a.outcome().created() && a.outcome().editToken().isPresent()),
                "every racing save of the same content is its own design with its own token");
        assertEquals(threads, raceAcks.stream().map(a -> a.outcome().designId()).distinct().count());
        assertEquals(threads, raceAcks.stream().map(a -> a.outcome().editToken().get()).distinct().count());

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
        assertEquals(threads + threads * createsPerThread + threads * revisionsPerThread, revisionIds.size());

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
