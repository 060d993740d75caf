package coilwright.turbine;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class CrossflowRunnerTest {

    @Test
    @DisplayName("N = 40 sqrt(H) / D: 10 m head, 300 mm runner runs best at 421.6 rpm (common practice rule)")
    void optimum_speed_by_the_usual_rule() {
        assertEquals(421.6, CrossflowRunner.crossflow(10, 0.1, 0.3).optimumSpeedRpm(), 0.1);
    }

    @Test
    void rim_speed_is_near_half_the_jet_speed() {
        CrossflowRunner c = CrossflowRunner.crossflow(10, 0.1, 0.3);
        double rimMs = c.optimumSpeedRpm() * Math.PI * 0.3 / 60;
        double ratio = rimMs / (0.98 * Math.sqrt(2 * 9.80665 * 10));
        assertEquals(0.48, ratio, 0.01);
    }

    @Test
    void for_target_speed_hits_the_target_and_power_peaks_there() {
        CrossflowRunner c = CrossflowRunner.forTargetSpeed(12, 0.08, 600, 0.7);
        assertEquals(600, c.optimumSpeedRpm(), 1e-9);
        assertEquals(1000 * 9.80665 * 0.08 * 12 * 0.7, c.powerW(600), 1e-9);
        assertEquals(1200, c.runawaySpeedRpm(), 1e-9);
    }

    @Test
    void rejects_zero_diameter_and_efficiency_above_0_9() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new CrossflowRunner(10, 0.1, 0, 0.95));
        assertEquals("runnerDiameterM", e.errors().get(0).field());
        assertEquals("peakEfficiency", e.errors().get(1).field());
    }
}
