package coilwright.conductor;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class PhaseWindingTest {
    private final WireSpec wire = WireSpec.awg(17, 2);

    @Test
    void series_turns_divide_by_the_parallel_paths() {
        PhaseWinding w = new PhaseWinding(40, 8, 2, 0.25, wire);
        assertEquals(160, w.seriesTurnsPerPhase());
        assertEquals(40 * 8 * 0.25, w.conductorLengthM(), 1e-12);
    }

    @Test
    void rejects_paths_that_do_not_divide_the_coils() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new PhaseWinding(40, 8, 3, 0.25, wire));
        assertEquals("parallelPaths = 3: must divide coilsPerPhase = 8", e.getMessage());
    }

    @Test
    void rejects_every_bad_field_at_once() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new PhaseWinding(0, 0, 0, Double.NaN, null));
        assertEquals(5, e.errors().size());
        assertEquals("turnsPerCoil = 0: must be between 1 and 100000", e.errors().get(0).message());
        assertEquals("meanTurnLengthM", e.errors().get(3).field());
        assertEquals("wire", e.errors().get(4).field());
    }
}
