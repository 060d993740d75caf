package coilwright.magnet;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

class HarmonicAmplitudeTest {

    @Test
    void amplitude_is_the_magnitude_of_the_signed_coefficient() {
        HarmonicAmplitude h = HarmonicAmplitude.of(5, -0.02);
        assertEquals(0.02, h.amplitudeT(), 0.0);
        assertEquals(-0.02, h.cosineCoefficientT(), 0.0);
    }

    @Test
    void refuses_even_or_non_positive_orders_and_inconsistent_values() {
        assertThrows(IllegalArgumentException.class, () -> HarmonicAmplitude.of(2, 0.1));
        assertThrows(IllegalArgumentException.class, () -> HarmonicAmplitude.of(-1, 0.1));
        assertThrows(IllegalArgumentException.class, () -> new HarmonicAmplitude(1, 0.2, 0.1));
        assertThrows(IllegalArgumentException.class, () -> HarmonicAmplitude.of(1, Double.NaN));
    }
}
