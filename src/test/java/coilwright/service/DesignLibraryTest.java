package coilwright.service;

import coilwright.store.Database;
import coilwright.store.DatabaseSettings;
import coilwright.store.DesignStore;
import coilwright.store.DraftRevision;
import coilwright.store.SaveOutcome;
import coilwright.validation.InfeasibleDesignException;
import coilwright.web.Json;
import coilwright.web.RecordBinder;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.*;

class DesignLibraryTest {
    @TempDir
    Path dir;
    private Database db;
    private DesignLibrary library;
    private final RecordBinder binder = new RecordBinder(Json.mapper());
    private final EvaluationService evaluation = new EvaluationService();
    private static final Map<String, String> EXAMPLES = ExampleFiles.read(DesignLibraryTest.class.getClassLoader());

    @BeforeEach
    void open() {
        db = Database.open(DatabaseSettings.h2File(dir));
        library = new DesignLibrary(evaluation, new DesignStore(db), Json.mapper(), "test-1");
    }

    @AfterEach
    void close() {
        db.close();
    }

    private DesignDocument example(String slug) {
        return binder.bind(EXAMPLES.get(slug), DesignDocument.class);
    }

    @Test
    void the_examples_are_found_on_the_classpath() {
        assertEquals(List.of("axial-wind-48v", "radial-hydro-48v", "rewound-motor-12v"), List.copyOf(EXAMPLES.keySet()));
    }

    @Test
    void saving_stores_canonical_input_the_results_snapshot_and_the_tool_version() throws Exception {
        DesignDocument doc = example("axial-wind-48v");
        SaveReceipt o = library.save(doc);
        SavedRevision r = library.revision(o.revisionId());
        assertEquals(Json.mapper().writeValueAsString(doc.design()), r.inputJson());
        assertEquals("test-1", r.toolVersion());
        assertEquals(Json.mapper().writeValueAsString(evaluation.evaluate(doc.design())), r.resultJson());
        assertEquals(doc, library.document(r), "the design file round-trips through the store");
    }

    @Test
    void the_same_content_saved_twice_gets_two_links_and_two_tokens_over_one_canonical_input() throws Exception {
        String reordered = EXAMPLES.get("rewound-motor-12v").replace("  ", " ");
        ObjectNode tree = (ObjectNode) Json.mapper().readTree(reordered);
        ObjectNode design = (ObjectNode) tree.remove("design");
        design.set("alternator", design.remove("alternator"));
        tree.set("design", design);
        assertTrue(tree.toString().indexOf("\"alternator\"") > tree.toString().indexOf("\"speedRange\""));
        SaveReceipt a = library.save(example("rewound-motor-12v"));
        SaveReceipt b = library.save(binder.bind(tree, DesignDocument.class));
        assertNotEquals(a.designId(), b.designId(), "each save gets its own link");
        assertNotEquals(a.revisionId(), b.revisionId());
        assertTrue(a.created() && b.created());
        assertNotEquals(a.editToken().orElseThrow(), b.editToken().orElseThrow(), "and its own edit token");
        assertEquals(library.revision(a.revisionId()).inputJson(), library.revision(b.revisionId()).inputJson(),
                "the input is stored in one canonical form however it was written");
    }

    @Test
    void revising_needs_the_token_and_a_wrong_one_stores_nothing() {
        SaveReceipt o = library.save(example("radial-hydro-48v"));
        DesignDocument changed = new DesignDocument(1, "Retitled", "n", example("radial-hydro-48v").design());
        assertThrows(EditNotAllowedException.class, () -> library.revise(o.designId(), null, changed));
        assertThrows(EditNotAllowedException.class, () -> library.revise(o.designId(), "A".repeat(43), changed));
        assertEquals(1, library.history(o.designId()).size());
        assertThrows(NoSuchDesignException.class, () -> library.revise("B".repeat(22), o.editToken().get(), changed));
        SaveReceipt second = library.revise(o.designId(), o.editToken().get(), changed);
        assertTrue(second.created());
        assertEquals("Retitled", library.latest(o.designId()).title());
        assertTrue(library.revision(o.revisionId()).isSuperseded());
    }

    @Test
    void the_edit_token_is_checked_before_the_revision_is_evaluated() throws Exception {
        SaveReceipt o = library.save(example("radial-hydro-48v"));
        ObjectNode tree = (ObjectNode) Json.mapper().readTree(EXAMPLES.get("radial-hydro-48v"));
        ((ObjectNode) tree.at("/design/alternator/winding")).put("slots", 12).put("poles", 12);
        DesignDocument unbuildable = binder.bind(tree, DesignDocument.class);
        assertThrows(EditNotAllowedException.class, () -> library.revise(o.designId(), "A".repeat(43), unbuildable),
                "a wrong token is refused before the design is evaluated");
        assertThrows(NoSuchDesignException.class, () -> library.revise("C".repeat(22), "A".repeat(43), unbuildable));
        assertThrows(InfeasibleDesignException.class, () -> library.revise(o.designId(), o.editToken().get(), unbuildable),
                "with the right token the same document is evaluated, and refused as infeasible");
        assertEquals(1, library.history(o.designId()).size());
    }

    @Test
    void a_recomputation_with_the_same_tool_reproduces_every_saved_number() {
        SavedRevision r = library.revision(library.save(example("axial-wind-48v")).revisionId());
        Recomputation again = library.recompute(r);
        assertFalse(again.differs(), () -> again.changes().toString());
        assertFalse(again.toolVersionDiffers());
        assertSame(again, library.recompute(r), "cached per revision");
    }

    @Test
    void a_snapshot_from_another_version_with_other_numbers_is_reported_with_each_changed_number() throws Exception {
        DesignDocument doc = example("axial-wind-48v");
        ObjectNode results = Json.mapper().valueToTree(evaluation.evaluate(doc.design()));
        double cutIn = results.get("cutInSpeedRpm").doubleValue();
        results.put("cutInSpeedRpm", cutIn * (1 + 1e-6));
        results.put("maxSpeedRpm", results.get("maxSpeedRpm").doubleValue() * (1 + 1e-12));
        SaveOutcome o = new DesignStore(db).create(new DraftRevision(doc.title(), doc.notes(), library.canonical(doc.design()),
                results.toString(), "0.0.9", 1));
        Recomputation again = library.recompute(library.revision(o.revisionId()));
        assertTrue(again.differs());
        assertTrue(again.toolVersionDiffers());
        assertEquals(List.of("cutInSpeedRpm"), again.changes().stream().map(TreeDiff.Difference::path).toList(),
                "a change of 1e-6 counts, one of 1e-12 is inside the 1e-9 tolerance");
    }

    @Test
    void demos_load_once_and_an_unchanged_example_is_not_evaluated_again() {
        assertEquals(List.copyOf(EXAMPLES.keySet()), library.loadDemos(EXAMPLES));
        var first = library.demos();
        assertEquals(3, first.size());
        assertEquals(List.copyOf(EXAMPLES.keySet()), library.loadDemos(EXAMPLES));
        assertEquals(first, library.demos());
        Map<String, String> changed = new java.util.TreeMap<>(EXAMPLES);
        changed.put("axial-wind-48v", EXAMPLES.get("axial-wind-48v").replace("Invented demonstration design.", "Invented."));
        library.loadDemos(changed);
        assertEquals(2, library.history(first.get(0).designId()).size(), "a changed example adds one revision");
        assertEquals(first.get(0).designId(), library.demos().get(0).designId(), "its link is kept");
    }

    @Test
    void an_example_that_does_not_parse_is_skipped() {
        assertEquals(List.of("good"), library.loadDemos(Map.of("good", EXAMPLES.get("rewound-motor-12v"), "bad", "{\"title\": 1}")));
    }
}
