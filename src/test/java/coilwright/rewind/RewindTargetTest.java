package coilwright.rewind;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class RewindTargetTest {

    @Test
    void battery_target_wants_the_ke_whose_peak_reaches_battery_plus_two_silicon_drops_at_cut_in() {
        RewindTarget t = RewindTarget.battery(24, 200, 500);
        assertEquals(0.8, t.diodeDropV(), 0);
        assertEquals(25.6 / (Math.sqrt(2) * 200), t.wantedKeLineRmsVPerRpm(), 1e-15);
        assertEquals(200, t.achieved(t.wantedKeLineRmsVPerRpm()), 1e-10);
        assertEquals(200, t.wanted(), 0);
    }

    @Test
    void voltage_target_wants_voltage_over_speed() {
        RewindTarget t = RewindTarget.lineVoltage(230, 1500, 1500);
        assertEquals(230 / 1500.0, t.wantedKeLineRmsVPerRpm(), 1e-15);
        assertEquals(115, t.achieved(230 / 3000.0), 1e-12);
    }

    @Test
    void fields_of_the_other_kind_are_not_checked_but_the_own_kind_are() {
        assertDoesNotThrow(() -> RewindTarget.lineVoltage(230, 1500, 1500));
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new RewindTarget(RewindTarget.Kind.BATTERY_CUT_IN, 0, Double.NaN, -0.1, 0, 0, -5, 60));
        assertEquals(java.util.List.of("batteryVoltageV", "cutInSpeedRpm", "diodeDropV", "targetSpeedRpm"),
                e.errors().stream().map(f -> f.field()).toList());
    }

    @Test
    void a_missing_kind_is_refused() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new RewindTarget(null, 24, 200, 0.8, 0, 0, 500, 60));
        assertEquals("kind", e.errors().get(0).field());
    }

    @Test
    void winding_temperature_can_be_changed() {
        assertEquals(90, RewindTarget.battery(12, 150, 400).withWindingTemperatureC(90).windingTemperatureC(), 0);
    }
}
