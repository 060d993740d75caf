package coilwright.magnet;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** Carter's coefficient against hand calculations and the published forms (Carter 1901; Pyrhönen et al. 2008). */
class CarterCoefficientReferenceTest {

    @Test
    @DisplayName("hand calculation: tau_s 10 mm, b_o 2 mm, g 1 mm: gamma = (4/pi)(pi/4 - ln sqrt 2) = 0.558729, k_c = 1.059179")
    void hand_calculated_case_with_opening_twice_the_gap() {
        // by hand: b_o/2g = 1, atan 1 = 0.785398, ln sqrt 2 = 0.346574, difference 0.438825, times 4/pi = 0.558729
        assertEquals(0.558729, CarterCoefficient.gamma(0.002, 0.001), 1e-6);
        assertEquals(1.059179, CarterCoefficient.of(0.010, 0.002, 0.001), 1e-6);
    }

    @Test
    @DisplayName("hand calculation: tau_s 12 mm, b_o 4 mm, g 1 mm: gamma = (4/pi)(2 atan 2 - ln sqrt 5) = 1.794731, k_c = 1.175863")
    void hand_calculated_case_with_opening_four_times_the_gap() {
        // by hand: 2 * 1.107149 = 2.214297, ln sqrt 5 = 0.804719, difference 1.409578, times 4/pi = 1.794731
        assertEquals(1.794731, CarterCoefficient.gamma(0.004, 0.001), 1e-6);
        assertEquals(1.175863, CarterCoefficient.of(0.012, 0.004, 0.001), 1e-6);
    }

    @Test
    @DisplayName("Pyrhönen, Jokinen & Hrabovcová (2008) form k_c = tau_s/(tau_s - kappa b_o) gives the same value")
    void agrees_with_the_form_written_in_slot_opening_units() {
        for (double ratio : new double[] {0.5, 1, 2, 4, 8, 16}) {
            double g = 0.001;
            double b = ratio * g;
            double u = b / (2 * g);
            double kappa = 2 / Math.PI * (Math.atan(u) - (1 / u) * Math.log(Math.sqrt(1 + u * u)));
            double tau = 3 * b + 0.005;
            assertEquals(tau / (tau - kappa * b), CarterCoefficient.of(tau, b, g), 1e-12, "b_o/g = " + ratio);
        }
    }

    @Test
    @DisplayName("the usual approximation gamma = (b_o/g)^2 / (5 + b_o/g) (from memory) is within 3 % for b_o/g 2..20")
    void close_to_the_common_approximation_for_open_slots() {
        for (double ratio = 2; ratio <= 20; ratio += 0.5) {
            double approx = ratio * ratio / (5 + ratio);
            assertEquals(approx, CarterCoefficient.gamma(ratio * 0.001, 0.001), 0.03 * approx, "b_o/g = " + ratio);
        }
    }

    @Test
    @DisplayName("limits: no slot opening gives exactly 1; a very narrow opening gives 1 within 1e-6")
    void limiting_cases() {
        assertEquals(1.0, CarterCoefficient.of(0.01, 0.0, 0.001), 0.0);
        assertEquals(1.0, CarterCoefficient.of(0.01, 1e-6, 0.001), 1e-6);
    }
}
