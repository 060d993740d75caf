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

    @Test
    void the_quick_validity_test_lets_nothing_through_that_the_checks_refuse() {
        double[] good = {10, 50, 0.1, 0.02, 0.001, 24, 0.8, 0.1, 0.05};
        double[][] bad = {{-1e-12, 1e6 * 1.0000001, Double.NaN, Double.POSITIVE_INFINITY}, {0, 1e5 * 1.0000001, Double.NaN},
                {-1e-9, 1e4 * 1.0000001, Double.NaN}, {-1e-9, 1e4 * 1.0000001, Double.NEGATIVE_INFINITY},
                {0, 100.0001, Double.NaN}, {0, 2000.001, Double.NaN}, {-1e-9, 5.000001, Double.NaN},
                {-1e-9, 1e4 * 1.0000001, Double.NaN}, {-1e-9, 100.0001, Double.NaN}};
        for (int field = 0; field < good.length; field++) {
            for (double v : bad[field]) {
                double[] x = good.clone();
                x[field] = v;
                InvalidInputException e = assertThrows(InvalidInputException.class, () -> new BridgeCircuit(
                        BridgeType.SINGLE_PHASE_BRIDGE, x[0], x[1], x[2], x[3], x[4], x[5], x[6], x[7], x[8]),
                        "field " + field + " = " + v);
                assertEquals(1, e.errors().size(), e.getMessage());
            }
        }
        BridgeCircuit edge = new BridgeCircuit(BridgeType.SINGLE_PHASE_BRIDGE, 1e6, 1e5, 1e4, 0, 100, 2000, 5, 1e4, 100);
        assertEquals(1e6, edge.emfPhaseRmsV());
    }
}
