package coilwright.conductor;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class AirCoredInductanceInputTest {

    @Test
    void accepts_a_plausible_disc_coil() {
        assertDoesNotThrow(() -> new AirCoredInductanceInput(80, 3, 1, 0.28, 0.02, 0.013));
    }

    @Test
    void rejects_a_mean_turn_too_short_for_its_leg_width() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new AirCoredInductanceInput(80, 3, 1, 0.05, 0.02, 0.013));
        assertEquals("meanTurnLengthM", e.errors().get(0).field());
    }

    @Test
    void rejects_paths_not_dividing_coils_and_bad_sizes() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new AirCoredInductanceInput(0, 3, 2, 0.28, -0.02, 0));
        assertEquals(4, e.errors().size());
        assertTrue(e.getMessage().contains("parallelPaths = 2: must divide coilsPerPhase = 3"));
    }
}
