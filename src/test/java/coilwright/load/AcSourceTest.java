package coilwright.load;

import coilwright.machine.Connection;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class AcSourceTest {
    @Test
    void delta_becomes_the_equivalent_star() {
        AcSource d = new AcSource(3, Connection.DELTA, 30, 50, 0.9, 0.003);
        assertEquals(30 / Math.sqrt(3), d.starEmfRmsV(), 1e-12);
        assertEquals(0.3, d.starResistanceOhm(), 1e-12);
        assertEquals(0.001, d.starInductanceH(), 1e-15);
        assertEquals(30, d.lineEmfRmsV(), 1e-12);
    }

    @Test
    void star_line_emf_is_sqrt3_times_phase() {
        assertEquals(10 * Math.sqrt(3), new AcSource(3, Connection.STAR, 10, 50, 1, 0.01).lineEmfRmsV(), 1e-12);
    }

    @Test
    void rejects_every_invalid_field_naming_the_range() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new AcSource(2, null, -1, 0, Double.NaN, 0));
        String msg = e.getMessage();
        assertTrue(msg.contains("phases = 2: must be 1 or 3"), msg);
        assertTrue(msg.contains("connection is missing"), msg);
        assertTrue(msg.contains("emfPhaseRmsV = -1.0: must be between 0.0 and 1000000.0"), msg);
        assertTrue(msg.contains("frequencyHz = 0.0: must be > 0.0"), msg);
        assertTrue(msg.contains("phaseResistanceOhm = NaN: must be a finite number"), msg);
        assertTrue(msg.contains("phaseInductanceH = 0.0"), msg);
        assertEquals(6, e.errors().size());
    }

    @Test
    void rejects_a_delta_single_phase_source() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new AcSource(1, Connection.DELTA, 10, 50, 1, 0.01));
        assertEquals("connection", e.errors().get(0).field());
    }
}
