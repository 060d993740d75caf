package coilwright.system;

import coilwright.turbine.ParametricCp;
import coilwright.turbine.WindRotor;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class WindMatcherTest {
    private static final double RHO = 1.225;
    /** The axial alternator cuts in near 107 rpm on 24 V. */
    private static final double CUT_IN_RPM = AlternatorEvaluator.closedFormCutInRpm(MatchFixtures.AXIAL, MatchFixtures.BATTERY_24V);

    private static WindMatcher matcher(WindRotor rotor) {
        return new WindMatcher(new AlternatorCurve(MatchFixtures.AXIAL, MatchFixtures.BATTERY_24V), rotor, RHO, 25);
    }

    @Test
    void still_air_leaves_the_rotor_at_rest() {
        WindMatchPoint p = matcher(MatchFixtures.rotor()).at(0);
        assertEquals(0.0, p.rotorSpeedRpm(), 0.0);
        assertEquals(0.0, p.powerToBatteryW(), 0.0);
        assertTrue(p.flags().isEmpty());
    }

    @Test
    void below_cut_in_the_rotor_spins_freely_at_its_runaway_tip_speed_ratio() {
        WindRotor rotor = MatchFixtures.rotor();
        double v = 1.0; // free-spin speed 1.0 m/s x 6.5 x 1.618 / 1.8 m = 55.8 rpm, under cut-in
        assertTrue(rotor.freeSpinSpeedRpm(v) < CUT_IN_RPM);
        WindMatchPoint p = matcher(rotor).at(v);
        assertEquals(rotor.freeSpinSpeedRpm(v), p.rotorSpeedRpm(), 1e-9);
        assertTrue(p.has(MatchFlag.FREE_SPINNING));
        assertEquals(0.0, p.powerToBatteryW(), 0.0);
        assertEquals(0.0, p.rotorPowerW(), 1e-9);
    }

    @Test
    void a_charging_point_balances_rotor_torque_against_alternator_torque() {
        WindRotor rotor = MatchFixtures.rotor();
        WindMatchPoint p = matcher(rotor).at(6.0);
        assertTrue(p.powerToBatteryW() > 0);
        assertTrue(p.rotorSpeedRpm() > CUT_IN_RPM && p.rotorSpeedRpm() < rotor.freeSpinSpeedRpm(6.0));
        SpeedPoint alt = AlternatorEvaluator.point(MatchFixtures.AXIAL, MatchFixtures.BATTERY_24V, p.alternatorSpeedRpm());
        assertEquals(alt.shaftTorqueNm(), rotor.torqueNm(6.0, p.rotorSpeedRpm(), RHO), 1e-7 * alt.shaftTorqueNm());
        assertEquals(rotor.tipSpeedRatio(6.0, p.rotorSpeedRpm()), p.tipSpeedRatio(), 1e-12);
        assertEquals(p.rotorPowerW(), p.powerToBatteryW() + p.totalLossW(), 1e-6 * p.rotorPowerW());
    }

    @Test
    void a_heavy_alternator_at_high_wind_is_flagged_as_stalling_the_rotor() {
        WindRotor small = new WindRotor(2.4, 3, new ParametricCp(0.42, 6.5), 0, 1.0, 1.0);
        WindMatchPoint p = matcher(small).at(12.0);
        assertTrue(p.tipSpeedRatio() < WindMatcher.STALL_TSR_SHARE * 6.5, "tsr " + p.tipSpeedRatio());
        assertTrue(p.has(MatchFlag.STALL));
        assertTrue(p.captureRatio() < 0.9);
    }

    @Test
    void beyond_the_maximum_speed_the_governor_holds_the_rotor_and_the_unlimited_speed_is_reported() {
        WindRotor rotor = new WindRotor(3.6, 3, new ParametricCp(0.42, 6.5), 200, 1.0, 0.9);
        WindMatchPoint p = matcher(rotor).at(20.0);
        assertTrue(p.has(MatchFlag.OVER_SPEED));
        assertEquals(200.0, p.rotorSpeedRpm(), 1e-9);
        assertTrue(p.unlimitedRotorSpeedRpm() > 200.0);
        SpeedPoint alt = AlternatorEvaluator.point(MatchFixtures.AXIAL, MatchFixtures.BATTERY_24V, 200.0);
        assertEquals(alt.powerToLoadW(), p.powerToBatteryW(), 1e-9);
        assertEquals(alt.shaftPowerW() / 0.9, p.rotorPowerW(), 1e-9);
        assertEquals(p.rotorPowerW(), p.powerToBatteryW() + p.totalLossW(), 1e-9 * p.rotorPowerW());
    }

    @Test
    void a_drive_ratio_turns_the_alternator_faster_than_the_rotor() {
        WindRotor geared = new WindRotor(3.6, 3, new ParametricCp(0.42, 6.5), 0, 2.5, 0.92);
        WindMatchPoint p = matcher(geared).at(7.0);
        assertEquals(2.5 * p.rotorSpeedRpm(), p.alternatorSpeedRpm(), 1e-9);
        assertEquals(0.08 * p.rotorPowerW(), p.drivetrainLossW(), 1e-9);
        assertEquals(p.rotorPowerW(), p.powerToBatteryW() + p.totalLossW(), 1e-6 * p.rotorPowerW());
    }

    @Test
    void the_ideal_battery_power_over_the_matched_one_is_the_capture_ratio_where_charging() {
        WindMatchPoint p = matcher(MatchFixtures.rotor()).at(8.0);
        assertEquals(p.captureRatio(), p.powerToBatteryW() / p.idealBatteryPowerW(), 1e-6);
        assertTrue(p.captureRatio() <= 1.0);
    }

    @Test
    void the_load_curve_refers_the_alternator_to_the_rotor_shaft() {
        WindRotor geared = new WindRotor(3.6, 3, new ParametricCp(0.42, 6.5), 0, 2.0, 0.8);
        var curve = matcher(geared).loadCurve(150);
        var last = curve.get(curve.size() - 1);
        assertEquals(150.0, last.turbineSpeedRpm(), 1e-9);
        SpeedPoint alt = AlternatorEvaluator.point(MatchFixtures.AXIAL, MatchFixtures.BATTERY_24V, 300.0);
        assertEquals(alt.shaftPowerW() / 0.8, last.powerAtTurbineW(), 1e-9);
        assertEquals(alt.shaftTorqueNm() * 2.0 / 0.8, last.torqueAtTurbineNm(), 1e-9);
        assertFalse(curve.isEmpty());
    }

    @Test
    void a_negative_wind_speed_is_refused_by_name() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> matcher(MatchFixtures.rotor()).at(-1));
        assertEquals("windSpeedMs", e.errors().get(0).field());
    }
}
