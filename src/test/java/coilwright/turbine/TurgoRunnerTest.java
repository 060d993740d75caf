package coilwright.turbine;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class TurgoRunnerTest {

    @Test
    void optimum_runner_speed_is_0_47_of_jet_speed() {
        TurgoRunner t = TurgoRunner.turgo(30, 0.03, 2, 0.25);
        double rimMs = t.optimumSpeedRpm() * Math.PI * 0.25 / 60;
        assertEquals(0.47 * 0.98 * Math.sqrt(2 * 9.80665 * 30), rimMs, 1e-9);
        assertEquals(t.peakShaftPowerW(), t.powerW(t.optimumSpeedRpm()), 1e-9);
    }

    @Test
    void for_target_speed_hits_the_target() {
        assertEquals(1000, TurgoRunner.forTargetSpeed(25, 0.02, 1, 1000).optimumSpeedRpm(), 1e-9);
    }

    @Test
    void nozzle_carries_its_share_of_the_flow() {
        TurgoRunner t = TurgoRunner.turgo(30, 0.03, 2, 0.25);
        double d = t.nozzleDiameterM();
        assertEquals(0.015, Math.PI / 4 * d * d * t.jetVelocityMs(), 1e-12);
    }

    @Test
    void rejects_four_jets_and_zero_diameter() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> TurgoRunner.turgo(30, 0.03, 4, 0));
        assertEquals("jetCount", e.errors().get(0).field());
        assertEquals("pitchCircleDiameterM", e.errors().get(1).field());
    }
}
