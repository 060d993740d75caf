package coilwright.rewind;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class CutInSpeedTest {

    @Test
    void peak_line_emf_at_cut_in_equals_battery_plus_two_diode_drops() {
        double ke = 0.05;
        double n = CutInSpeed.speedRpm(ke, 24, 0.8);
        assertEquals(24 + 1.6, Math.sqrt(2) * ke * n, 1e-12);
    }

    @Test
    void ke_for_a_cut_in_is_the_inverse_of_the_cut_in_for_a_ke() {
        double ke = CutInSpeed.keLineForCutIn(150, 48, 0.7);
        assertEquals(150, CutInSpeed.speedRpm(ke, 48, 0.7), 1e-10);
    }

    @Test
    void agrees_with_the_load_package_for_both_bridges() {
        for (var type : coilwright.load.BridgeType.values()) {
            assertEquals(coilwright.load.CutIn.speedRpm(0.07, 48, 0.45, type), CutInSpeed.speedRpm(0.07, 48, 0.45), 1e-12);
        }
    }

    @Test
    void zero_ke_or_battery_and_negative_diode_drop_are_refused() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> CutInSpeed.speedRpm(0, -12, -1));
        assertEquals(3, e.errors().size());
        assertTrue(e.getMessage().contains("keLineRmsVPerRpm = 0.0: must be > 0"));
    }
}
