package coilwright.winding;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class HarmonicFactorTest {

    @Test
    void factors_outside_zero_to_one_are_refused() {
        assertThrows(IllegalArgumentException.class, () -> new HarmonicFactor(1, 1.2, 1.0, 1.2));
        assertThrows(IllegalArgumentException.class, () -> new HarmonicFactor(1, 0.9, Double.NaN, 0.9));
        assertThrows(IllegalArgumentException.class, () -> new HarmonicFactor(0, 0.9, 1.0, 0.9));
    }

    @Test
    void a_valid_factor_keeps_its_values() {
        HarmonicFactor h = new HarmonicFactor(5, 0.067, 0.9, 0.0603);
        assertEquals(0.0603, h.totalFactor(), 0.0);
    }
}
