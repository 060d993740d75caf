package coilwright.service;

import coilwright.store.Database;
import coilwright.store.DatabaseSettings;
import coilwright.store.DesignStore;
import coilwright.store.DraftRevision;
import coilwright.store.EditForbiddenException;
import coilwright.store.DesignNotFoundException;
import coilwright.store.SaveOutcome;
import coilwright.store.StoredRevision;
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
        SaveOutcome o = library.save(doc);
        StoredRevision r = library.revision(o.revisionId());
        assertEquals(Json.mapper().writeValueAsString(doc.design()), r.inputJson());
        assertEquals("test-1", r.toolVersion());
        assertEquals(Json.mapper().writeValueAsString(evaluation.evaluate(doc.design())), r.resultJson());
        assertEquals(doc, library.document(r), "the design file round-trips through the store");
    }

    @Test
    void the_same_input_written_differently_gets_the_same_ids() throws Exception {
        String reordered = EXAMPLES.get("rewound-motor-12v").replace("  ", " ");
        ObjectNode tree = (ObjectNode) Json.mapper().readTree(reordered);
        ObjectNode design = (ObjectNode) tree.remove("design");
        design.set("alternator", design.remove("alternator"));
        tree.set("design", design);
        assertTrue(tree.toString().indexOf("\"alternator\"") > tree.toString().indexOf("\"speedRange\""));
        SaveOutcome a = library.save(example("rewound-motor-12v"));
        SaveOutcome b = library.save(binder.bind(tree, DesignDocument.class));
        assertEquals(a.designId(), b.designId());
        assertFalse(b.created());
        assertTrue(b.editToken().isEmpty());
    }

    @Test
    void revising_needs_the_token_and_a_wrong_one_stores_nothing() {
        SaveOutcome o = library.save(example("radial-hydro-48v"));
        DesignDocument changed = new DesignDocument(1, "Retitled", "n", example("radial-hydro-48v").design());
        assertThrows(EditForbiddenException.class, () -> library.revise(o.designId(), null, changed));
        assertThrows(EditForbiddenException.class, () -> library.revise(o.designId(), "A".repeat(43), changed));
        assertEquals(1, library.history(o.designId()).size());
        assertThrows(DesignNotFoundException.class, () -> library.revise("B".repeat(22), o.editToken().get(), changed));
        SaveOutcome second = library.revise(o.designId(), o.editToken().get(), changed);
        assertTrue(second.created());
        assertEquals("Retitled", library.latest(o.designId()).title());
        assertTrue(library.revision(o.revisionId()).isSuperseded());
    }

    @Test
    void a_recomputation_with_the_same_tool_reproduces_every_saved_number() {
        StoredRevision r = library.revision(library.save(example("axial-wind-48v")).revisionId());
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
