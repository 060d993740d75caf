package coilwright.load;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class BridgeCircuitTest {
    @Test
    void threshold_is_battery_plus_two_diode_drops() {
        BridgeCircuit c = new BridgeCircuit(BridgeType.THREE_PHASE_BRIDGE, 10, 50, 0.1, 0, 0.001, 24, 0.8, 0.1, 0.05);
        assertEquals(25.6, c.thresholdV(), 1e-12);
        assertEquals(Math.sqrt(6) * 10, c.peakDrivingEmfV(), 1e-12);
        assertEquals(0.15, c.dcResistanceOhm(), 1e-15);
    }

    @Test
    void rejects_zero_ac_resistance_and_each_bad_field() {
        InvalidInputException zeroR = assertThrows(InvalidInputException.class,
                () -> new BridgeCircuit(BridgeType.THREE_PHASE_BRIDGE, 10, 50, 0, 0, 0.001, 24, 0.8, 0, 0));
        assertTrue(zeroR.getMessage().contains("winding plus AC cable resistance must be > 0"), zeroR.getMessage());
        InvalidInputException bad = assertThrows(InvalidInputException.class,
                () -> new BridgeCircuit(null, -1, -50, 1, 0, 0, 0, 9, -1, 200));
        assertEquals(8, bad.errors().size(), bad.getMessage());
    }
}
