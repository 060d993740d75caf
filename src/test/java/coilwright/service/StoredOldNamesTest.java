package coilwright.service;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.machine.AirCoredStator;
import coilwright.magnet.AxialDualRotor;
import coilwright.store.Database;
import coilwright.store.DatabaseSettings;
import coilwright.store.DesignStore;
import coilwright.store.DraftRevision;
import coilwright.store.SaveOutcome;

import coilwright.web.Json;
import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A revision stored before the axial-flux inputs were renamed must open, recompute and compare for ever. The fixture
 * {@code stored/before-axial-rename/} holds the canonical input and the results snapshot exactly as Coilwright wrote
 * them before the rename (commit 9ef998e, the former axial demo with 11 speed points): the input names
 * {@code statorThicknessM}, {@code runningClearanceM}, {@code coilLegWidthM} and the coil hole's two end widths.
 */
class StoredOldNamesTest {
    private static final String FIXTURE = "stored/before-axial-rename/";
    @TempDir
    Path dir;
    private Database db;
    private DesignStore store;
    private DesignLibrary library;

    @BeforeEach
    void open() {
        db = Database.open(DatabaseSettings.h2File(dir));
        store = new DesignStore(db);
        library = new DesignLibrary(new EvaluationService(), store, Json.mapper(), "test-2");
    }

    @AfterEach
    void close() {
        db.close();
    }

    private static String fixture(String name) throws IOException {
        try (InputStream in = StoredOldNamesTest.class.getClassLoader().getResourceAsStream(FIXTURE + name)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    private SaveOutcome storeTheOldRevision() throws IOException {
        String input = fixture("input.json");
        assertTrue(input.contains("\"statorThicknessM\":0.018") && input.contains("\"coilHoleOuterWidthM\":0.034"),
                "the fixture uses the old names");
        return store.create(new DraftRevision("Stored before the rename", "", input, fixture("result.json"), "0.9", 1));
    }

    @Test
    void the_old_revision_opens_with_the_same_geometry_under_the_new_names() throws IOException {
        SavedRevision r = library.revision(storeTheOldRevision().revisionId());
        DesignDocument doc = library.document(r);
        AxialDualRotor rotor = (AxialDualRotor) doc.design().alternator().rotor();
        AirCoredStator stator = (AirCoredStator) doc.design().alternator().stator();
        assertEquals(0.018, rotor.coilLayerThicknessM(), 0.0);
        assertEquals(0.0015, rotor.clearancePerSideM(), 0.0);
        assertEquals(0.022, stator.conductorBandWidthM(), 0.0);
        assertEquals(0.024, stator.openingInnerEndWidthM(), 1e-16, "the old inner end width, to rounding");
        assertEquals(0.034, stator.openingOuterEndWidthM(), 1e-16, "the old outer end width, to rounding");
        assertEquals(r.inputJson(), fixture("input.json"), "the stored revision itself is never rewritten");
    }

    @Test
    void recomputing_the_old_revision_finds_every_saved_number_under_its_path() throws IOException {
        SavedRevision r = library.revision(storeTheOldRevision().revisionId());
        Recomputation again = library.recompute(r);
        assertTrue(again.failure().isEmpty(), () -> again.failure().orElse(""));
        List<TreeDiff.Difference> renamed = again.changes().stream()
                .filter(d -> d.a().equals(TreeDiff.ABSENT) || d.b().equals(TreeDiff.ABSENT)).toList();
        assertTrue(renamed.isEmpty(), renamed::toString);
        JsonNode saved = library.tree(r.resultJson());
        JsonNode now = again.results().orElseThrow();
        // the coil geometry is pure geometry: the mean turn, the copper and the magnets of the old snapshot again
        for (String pointer : List.of("/alternator/meanTurnLengthM", "/alternator/copperMassKg", "/alternator/magnetMassKg",
                "/alternator/spec/stator/openingMidWidthM", "/alternator/spec/rotor/coilLayerThicknessM")) {
            assertEquals(saved.at(pointer).doubleValue(), now.at(pointer).doubleValue(),
                    1e-12 * Math.abs(saved.at(pointer).doubleValue()), pointer);
        }
        // and the mean turn is the one the old end widths give: inner + outer + 2 * slanted side + pi * band
        double old = 0.024 + 0.034 + 2 * Math.hypot(0.05, (0.034 - 0.024) / 2) + Math.PI * 0.022;
        assertEquals(old, now.at("/alternator/meanTurnLengthM").doubleValue(), 0.0);
    }

    @Test
    void the_old_revision_compares_equal_to_the_same_design_saved_under_the_new_names() throws IOException {
        SaveOutcome first = storeTheOldRevision();
        SavedRevision old = library.revision(first.revisionId());
        DesignDocument same = new DesignDocument(1, old.title(), old.notes(), library.document(old).design());
        SavedRevision renewed = library.revision(library.revise(first.designId(), first.editToken().orElseThrow(), same)
                .revisionId());
        assertFalse(renewed.inputJson().contains("statorThicknessM"), "a new revision is stored under the new names");
        assertEquals(List.of(), TreeDiff.differences(library.tree(old.inputJson()), library.tree(renewed.inputJson()), 0));
        assertEquals(library.recompute(old).results(), library.recompute(renewed).results());
    }
}
