package coilwright.turbine;

import coilwright.validation.InvalidInputException;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class WindRotorTest {
    static final double RHO = 1.225;
    private final WindRotor rotor = new WindRotor(3.0, 3, new ParametricCp(0.40, 6.0), 600.0);

    @Test
    void power_at_the_optimum_speed_is_half_rho_a_v_cubed_cp_max() {
        double v = 8.0;
        double expected = 0.5 * RHO * Math.PI * 1.5 * 1.5 * 512.0 * 0.40;
        assertEquals(expected, rotor.powerW(v, rotor.optimumRotorSpeedRpm(v), RHO), 1e-9 * expected);
    }

    @Test
    void optimum_speed_follows_lambda_opt_v_over_r() {
        assertEquals(6.0 * 8.0 / 1.5 * 30.0 / Math.PI, rotor.optimumRotorSpeedRpm(8.0), 1e-9);
        assertEquals(6.0, rotor.tipSpeedRatio(8.0, rotor.optimumRotorSpeedRpm(8.0)), 1e-12);
    }

    @Test
    void torque_times_angular_speed_is_power() {
        double n = 250.0;
        assertEquals(rotor.powerW(7, n, RHO), rotor.torqueNm(7, n, RHO) * n * Math.PI / 30.0, 1e-9);
    }

    @Test
    void a_still_rotor_has_starting_torque_and_no_power() {
        assertTrue(rotor.torqueNm(5, 0, RHO) > 0);
        assertEquals(0.0, rotor.powerW(5, 0, RHO));
        assertEquals(0.0, rotor.torqueNm(0, 100, RHO));
    }

    @Test
    void free_spin_speed_gives_zero_power() {
        double n = rotor.freeSpinSpeedRpm(10);
        assertEquals(0.0, rotor.powerW(10, n, RHO), 1e-9);
        assertTrue(rotor.powerW(10, 0.99 * n, RHO) > 0);
    }

    @Test
    void drive_ratio_and_drivetrain_efficiency_scale_alternator_torque() {
        WindRotor geared = new WindRotor(3.0, 3, new ParametricCp(0.40, 6.0), 0, 4.0, 0.9);
        double altRpm = 1000;
        assertEquals(rotor.torqueNm(8, 250, RHO) * 0.9 / 4.0, geared.alternatorShaftTorqueNm(8, altRpm, RHO), 1e-9);
        assertEquals(rotor.powerW(8, 250, RHO) * 0.9, geared.alternatorShaftPowerW(8, altRpm, RHO), 1e-9);
        assertEquals(250.0, geared.rotorSpeedRpm(altRpm), 1e-12);
        assertEquals(1000.0, geared.alternatorSpeedRpm(250), 1e-12);
    }

    @Test
    void ideal_power_is_held_at_the_speed_limit() {
        double v = 18.0;
        assertTrue(rotor.optimumRotorSpeedRpm(v) > 600);
        assertEquals(rotor.powerW(v, 600, RHO), rotor.idealPowerW(v, RHO), 1e-9);
        assertTrue(rotor.isOverSpeed(601));
        assertFalse(rotor.isOverSpeed(599));
        assertFalse(new WindRotor(3.0, 3, new ParametricCp(0.4, 6), 0).isOverSpeed(1e5));
    }

    @Test
    void rejects_zero_diameter_and_bad_blade_count_at_once() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new WindRotor(0.0, 0, new ParametricCp(0.4, 6), -1));
        assertEquals(3, e.errors().size());
        assertEquals("diameterM", e.errors().get(0).field());
        assertEquals("bladeCount", e.errors().get(1).field());
        assertEquals("maxRotorSpeedRpm", e.errors().get(2).field());
    }

    @Test
    void rejects_missing_curve_and_bad_efficiency() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new WindRotor(2, 3, null, 0, 1, 1.2));
        assertEquals("curve", e.errors().get(0).field());
        assertEquals("drivetrainEfficiency", e.errors().get(1).field());
    }

    @Test
    void rejects_a_negative_wind_speed_and_zero_air_density() {
        assertThrows(InvalidInputException.class, () -> rotor.powerW(-1, 100, RHO));
        assertEquals("airDensityKgM3", assertThrows(InvalidInputException.class,
                () -> rotor.torqueNm(5, 100, 0)).errors().get(0).field());
    }

    @Property
    void power_never_exceeds_betz_times_the_wind_power(@ForAll @DoubleRange(min = 0.5, max = 30) double v,
                                                       @ForAll @DoubleRange(min = 0, max = 3000) double rpm) {
        WindRotor r = new WindRotor(2.0, 3, new ParametricCp(16.0 / 27.0, 7), 0);
        double p = r.powerW(v, rpm, RHO);
        assertTrue(p >= 0 && p <= PowerCoefficientCurve.BETZ_LIMIT * r.windPowerW(v, RHO) * (1 + 1e-12));
    }

    @Property
    void free_spin_speed_exceeds_the_optimum_speed(@ForAll @DoubleRange(min = 0.5, max = 30) double v) {
        assertTrue(rotor.freeSpinSpeedRpm(v) > rotor.optimumRotorSpeedRpm(v));
    }

    @Property
    void more_wind_gives_more_optimum_power(@ForAll @DoubleRange(min = 0.5, max = 29) double v,
                                           @ForAll @DoubleRange(min = 0.01, max = 1) double dv) {
        WindRotor r = new WindRotor(2.0, 3, new TableCp(TableCpTest.LAMBDA, TableCpTest.CP), 0);
        assertTrue(r.powerW(v + dv, r.optimumRotorSpeedRpm(v + dv), RHO) > r.powerW(v, r.optimumRotorSpeedRpm(v), RHO));
    }
}
