package coilwright.turbine;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

/**
 * An impulse-turbine design example worked by hand from first principles (jet velocity Cv sqrt(2gH),
 * continuity for the jet, bucket speed 0.46 of jet speed), since no published example's exact figures
 * could be cited. Cv = 0.98 and the speed ratio 0.46 are textbook values, from memory. Scenario: 50 m
 * net head, 10 L/s, one jet, 200 mm pitch-circle diameter.
 */
class ImpulseRunnerReferenceTest {
    private final ImpulseRunner r = ImpulseRunner.pelton(50, 0.010, 1, 0.200);

    @Test
    @DisplayName("Jet velocity 0.98 sqrt(2 x 9.80665 x 50) = 30.69 m/s (Torricelli with nozzle coefficient)")
    void jet_velocity() {
        assertEquals(30.69, r.jetVelocityMs(), 0.01);
    }

    @Test
    @DisplayName("Jet diameter sqrt(4 x 0.010 / (pi x 30.69)) = 20.4 mm")
    void nozzle_diameter() {
        assertEquals(0.0204, r.nozzleDiameterM(), 0.0001);
    }

    @Test
    @DisplayName("Optimum speed 60 x 0.46 x 30.69 / (pi x 0.2) = 1348 rpm; runaway about 2700 rpm")
    void runner_speed() {
        assertEquals(1348, r.optimumSpeedRpm(), 1);
        assertEquals(2696, r.runawaySpeedRpm(), 2);
    }

    @Test
    @DisplayName("Water power 1000 x 9.80665 x 0.010 x 50 = 4903 W; shaft power at 80 % = 3923 W")
    void power() {
        assertEquals(4903, r.hydraulicPowerW(), 1);
        assertEquals(3923, r.peakShaftPowerW(), 1);
    }

    @Test
    @DisplayName("Ideal impulse theory: with bucket force proportional to (jet - bucket speed), power peaks at half the runaway speed (Dixon & Hall, ch. 9)")
    void power_peaks_at_half_runaway() {
        double nr = r.runawaySpeedRpm();
        double best = 0;
        double bestN = 0;
        for (double n = 0; n <= nr; n += nr / 1000) {
            if (r.powerW(n) > best) {
                best = r.powerW(n);
                bestN = n;
            }
        }
        assertEquals(0.5 * nr, bestN, nr / 1000);
    }
}
