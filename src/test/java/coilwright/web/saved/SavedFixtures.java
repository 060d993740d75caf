package coilwright.web.saved;

import coilwright.web.Json;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;

/**
 * Design files for the saved-design tests: the axial-flux example with a resistive load (a load whose evaluation
 * does not depend on the bridge solver's cut-in search), with a chosen title, notes and turns per coil.
 */
final class SavedFixtures {
    private SavedFixtures() {
    }

    static String document(String title, String notes, int turnsPerCoil) {
        try (InputStream in = SavedFixtures.class.getClassLoader().getResourceAsStream("examples/axial-wind-48v.json")) {
            ObjectNode doc = (ObjectNode) Json.mapper().readTree(new String(in.readAllBytes(), StandardCharsets.UTF_8));
            doc.put("title", title);
            doc.put("notes", notes);
            ObjectNode design = (ObjectNode) doc.get("design");
            ((ObjectNode) design.get("alternator")).put("turnsPerCoil", turnsPerCoil);
            design.set("load", Json.mapper().readTree("{\"type\":\"ResistiveLoad\",\"resistancePerPhaseOhm\":2.0,"
                    + "\"acCable\":{\"lengthM\":30.0,\"conductorAreaM2\":6.0E-6,\"temperatureC\":30.0}}"));
            ((ObjectNode) design.get("speedRange")).put("points", 21);
            return Json.mapper().writeValueAsString(doc);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Fewest turns per coil the crash and two-instance loops vary over; the example's coil window holds them all. */
    static final int LOOP_TURNS_MIN = 20;
    /** Number of turns-per-coil values the loops vary over (20 to 39); 43 and more overfill the example's window. */
    static final int LOOP_TURNS_CHOICES = 20;

    /** The turns per coil for the k-th save or revision of a loop; always one the example's window holds. */
    static int loopTurns(int k) {
        return LOOP_TURNS_MIN + Math.floorMod(k, LOOP_TURNS_CHOICES);
    }

    static String document(String title) {
        return document(title, "Test notes.", 36);
    }
}
