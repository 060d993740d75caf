package coilwright.rewind;

import coilwright.machine.Connection;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class TerminalsTest {

    @Test
    void star_line_voltage_is_root_three_times_phase_and_delta_equal() {
        assertEquals(Math.sqrt(3), Terminals.lineVoltageFactor(3, Connection.STAR), 1e-15);
        assertEquals(1.0, Terminals.lineVoltageFactor(3, Connection.DELTA), 0);
        assertEquals(1.0, Terminals.lineVoltageFactor(1, Connection.STAR), 0);
    }

    @Test
    void line_to_line_resistance_is_two_phases_in_star_and_two_thirds_of_one_in_delta() {
        assertEquals(2.0, Terminals.lineResistanceFactor(3, Connection.STAR), 0);
        // delta between two terminals: one phase R in parallel with two in series, R * 2R / 3R
        double r = 1.7;
        double parallel = r * (2 * r) / (r + 2 * r);
        assertEquals(parallel / r, Terminals.lineResistanceFactor(3, Connection.DELTA), 1e-15);
        assertEquals(1.0, Terminals.lineResistanceFactor(1, Connection.STAR), 0);
    }

    @Test
    void single_phase_delta_is_refused() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> Terminals.lineVoltageFactor(1, Connection.DELTA));
        assertEquals("connection", e.errors().get(0).field());
        assertThrows(InvalidInputException.class, () -> Terminals.lineResistanceFactor(2, Connection.STAR));
    }
}
