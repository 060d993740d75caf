package coilwright.turbine;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class WindRotorUnloadedTest {
    private final WindRotor rotor = new WindRotor(3.0, 3, new ParametricCp(0.42, 7), 500);

    @Test
    void without_drag_the_rotor_reaches_the_runaway_tip_speed_ratio_and_no_further() {
        assertEquals(ParametricCp.RUNAWAY_RATIO * 7, rotor.runawayTipSpeedRatio(), 1e-12);
        assertEquals(rotor.freeSpinSpeedRpm(6), rotor.unloadedRotorSpeedRpm(6, 1.225, n -> 0.0), 1e-9);
    }

    @Test
    void drag_lowers_the_unloaded_speed_to_where_torques_balance() {
        double n = rotor.unloadedRotorSpeedRpm(6, 1.225, rpm -> 0.5 + 0.002 * rpm);
        assertTrue(n < rotor.freeSpinSpeedRpm(6));
        assertEquals(0.5 + 0.002 * n, rotor.torqueNm(6, n, 1.225), 1e-5);
    }

    @Test
    void drag_larger_than_the_rotor_torque_everywhere_keeps_it_still() {
        assertEquals(0, rotor.unloadedRotorSpeedRpm(2, 1.225, rpm -> 100.0));
        assertEquals(0, rotor.unloadedRotorSpeedRpm(0, 1.225, rpm -> 0.0));
    }
}
