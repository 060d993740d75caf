package coilwright.turbine;

import coilwright.validation.InvalidInputException;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class WindStartingTest {
    private final WindRotor rotor = new WindRotor(3.0, 3, new ParametricCp(0.42, 7), 500);

    @Test
    void starting_wind_balances_standstill_torque_against_the_holding_torque() {
        double cq0 = 0.0065;
        double v = WindStarting.startsTurningAtMs(rotor, 1.225, cq0, 0.5);
        assertEquals(0.5, rotor.standstillTorqueNm(v, 1.225, cq0), 1e-9);
        assertEquals(0, WindStarting.startsTurningAtMs(rotor, 1.225, cq0, 0));
    }

    @Test
    void a_geared_drive_multiplies_the_holding_torque_at_the_rotor() {
        WindRotor geared = new WindRotor(3.0, 3, new ParametricCp(0.42, 7), 500, 4.0, 0.95);
        double direct = WindStarting.startsTurningAtMs(rotor, 1.225, 0.0065, 0.5);
        assertEquals(direct * Math.sqrt(4 / 0.95), WindStarting.startsTurningAtMs(geared, 1.225, 0.0065, 0.5), 1e-9);
    }

    @Test
    void default_coefficient_is_the_blade_estimate_capped_by_the_curve() {
        assertEquals(StartingTorque.optimumBlade(3, 7), StartingTorque.defaultFor(rotor), 1e-12);
        WindRotor lowCp = new WindRotor(3.0, 3, new ParametricCp(0.01, 4), 0);
        assertEquals(0.01 / 4, StartingTorque.defaultFor(lowCp), 1e-12);
    }

    @Test
    void inputs_are_checked() {
        assertThrows(InvalidInputException.class, () -> WindStarting.startsTurningAtMs(rotor, 0, 0, -1));
        assertThrows(InvalidInputException.class, () -> StartingTorque.optimumBlade(0, 20, 0, 30, 0.9));
    }

    @Property(tries = 200)
    void more_friction_never_lowers_the_starting_wind_speed(
            @ForAll @Scale(6) @DoubleRange(min = 0, max = 20) double friction,
            @ForAll @Scale(6) @DoubleRange(min = 0, max = 5) double extra,
            @ForAll @Scale(6) @DoubleRange(min = 0, max = 10) double cogging,
            @ForAll @Scale(6) @DoubleRange(min = 0.001, max = 0.2) double cq0) {
        double before = WindStarting.startsTurningAtMs(rotor, 1.2, cq0, friction + cogging);
        double after = WindStarting.startsTurningAtMs(rotor, 1.2, cq0, friction + extra + cogging);
        assertTrue(after >= before);
    }
}
