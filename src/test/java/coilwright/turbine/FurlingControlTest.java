package coilwright.turbine;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

class FurlingControlTest {
    private final WindRotor rotor = new WindRotor(3.0, 3, new ParametricCp(0.42, 7), 0);

    @Test
    void a_tail_holds_the_effective_wind_between_its_two_speeds_and_lets_it_rise_past_the_stop() {
        TailFurling tail = new TailFurling(10, 16);
        assertEquals(8, tail.effectiveWindSpeedMs(8, rotor, 1.225));
        assertEquals(10, tail.effectiveWindSpeedMs(13, rotor, 1.225));
        assertEquals(10, tail.effectiveWindSpeedMs(16, rotor, 1.225));
        assertEquals(20 * 10 / 16.0, tail.effectiveWindSpeedMs(20, rotor, 1.225), 1e-12);
        assertEquals(0, tail.furlAngleDeg(9));
        assertEquals(Math.toDegrees(Math.acos(10 / 16.0)), tail.furlAngleDeg(30), 1e-12);
        // cosine model: the yawed rotor sees v cos(gamma)
        assertEquals(13 * Math.cos(Math.toRadians(tail.furlAngleDeg(13))), tail.effectiveWindSpeedMs(13, rotor, 1.225),
                1e-9);
    }

    @Test
    void rotor_power_above_furl_start_follows_the_control() {
        TailFurling tail = new TailFurling(10, 16);
        double atStart = rotor.idealPowerW(tail.effectiveWindSpeedMs(10, rotor, 1.225), 1.225);
        double mid = rotor.idealPowerW(tail.effectiveWindSpeedMs(14, rotor, 1.225), 1.225);
        assertEquals(atStart, mid, 1e-9 * atStart);
    }

    @Test
    void a_power_limit_curve_caps_the_ideal_power() {
        PowerLimitCurve curve = new PowerLimitCurve(List.of(new PowerLimitPoint(9, 2000), new PowerLimitPoint(15, 1500)));
        assertEquals(Double.POSITIVE_INFINITY, curve.limitW(5));
        assertEquals(1750, curve.limitW(12), 1e-9);
        assertEquals(1500, curve.limitW(30), 1e-9);
        double veff = curve.effectiveWindSpeedMs(12, rotor, 1.225);
        assertEquals(1750, rotor.idealPowerW(veff, 1.225), 1e-6);
        assertEquals(5, curve.effectiveWindSpeedMs(5, rotor, 1.225));
        assertEquals(7, new NoFurling().effectiveWindSpeedMs(7, rotor, 1.225));
    }

    @Test
    void bad_settings_name_their_fields() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new TailFurling(12, 10));
        assertEquals("fullyFurledMs", e.errors().get(0).field());
        InvalidInputException f = assertThrows(InvalidInputException.class, () -> new PowerLimitCurve(List.of(
                new PowerLimitPoint(10, 100), new PowerLimitPoint(9, 50))));
        assertEquals("points[1].windSpeedMs", f.errors().get(0).field());
    }

    @Test
    void energy_assumptions_state_their_defaults() {
        EnergyAssumptions direct = EnergyAssumptions.defaults(1.0);
        assertEquals(1.0, direct.drivetrainEfficiency());
        assertTrue(direct.drivetrainBasis().contains("bearing"));
        assertEquals(0.95, direct.availability());
        assertEquals(EnergyAssumptions.GEARED_DRIVETRAIN_EFFICIENCY, EnergyAssumptions.defaults(3).drivetrainEfficiency());
        assertEquals(950, direct.deliveredKWh(1000), 1e-9);
        assertThrows(InvalidInputException.class, () -> new EnergyAssumptions(1.2, "", 0.2, ""));
    }

    @Test
    void a_turgo_runner_takes_its_nozzle_coefficient_and_speed_ratio() {
        TurgoRunner t = TurgoRunner.forTargetSpeed(30, 0.02, 2, 1000, 0.97, 0.45, 0.75);
        assertEquals(1000, t.optimumSpeedRpm(), 1e-9);
        assertEquals(0.97 * Math.sqrt(2 * 9.80665 * 30), t.jetVelocityMs(), 1e-9);
        assertEquals(t.nozzleDiameterM(), t.jetDiameterM());
        assertEquals(ImpulseRunner.pelton(50, 0.01, 1, 0.2).nozzleDiameterM(),
                ImpulseRunner.pelton(50, 0.01, 1, 0.2).jetDiameterM());
    }
}
