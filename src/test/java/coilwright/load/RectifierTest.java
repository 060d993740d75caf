package coilwright.load;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class RectifierTest {
    @Test
    void default_drop_comes_from_the_diode_family() {
        assertEquals(0.8, new Rectifier(BridgeType.THREE_PHASE_BRIDGE, DiodeType.SILICON).forwardDropV(), 0.0);
        assertEquals(0.45, new Rectifier(BridgeType.SINGLE_PHASE_BRIDGE, DiodeType.SCHOTTKY).forwardDropV(), 0.0);
        assertEquals(1.1, new Rectifier(BridgeType.THREE_PHASE_BRIDGE, DiodeType.SILICON, 1.1).forwardDropV(), 0.0);
    }

    @Test
    void rejects_a_drop_out_of_range_and_missing_fields() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new Rectifier(BridgeType.THREE_PHASE_BRIDGE, DiodeType.SILICON, 6));
        assertTrue(e.getMessage().contains("forwardDropV = 6.0: must be between 0.0 and 5.0"), e.getMessage());
        assertThrows(InvalidInputException.class, () -> new Rectifier(null, DiodeType.SILICON, 0.8));
    }
}
