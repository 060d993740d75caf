package coilwright.load;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class CableTest {
    @Test
    void pair_resistance_is_twice_the_line_resistance() {
        Cable c = new Cable(25, 10e-6, 20);
        assertEquals(25 / 58e6 / 10e-6, c.lineResistanceOhm(), 1e-15);
        assertEquals(2 * c.lineResistanceOhm(), c.pairResistanceOhm(), 1e-15);
        assertEquals(0, Cable.NONE.pairResistanceOhm(), 0.0);
    }

    @Test
    void rejects_invalid_fields() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new Cable(-1, 0, 400));
        assertEquals(3, e.errors().size());
        assertTrue(e.getMessage().contains("conductorAreaM2 = 0.0: must be between 1.0E-8 and 0.01"), e.getMessage());
    }
}
