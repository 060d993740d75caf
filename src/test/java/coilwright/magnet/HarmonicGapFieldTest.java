package coilwright.magnet;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class HarmonicGapFieldTest {

    @Test
    void remanence_harmonics_of_a_full_pitch_square_wave() {
        assertEquals(4 / Math.PI, HarmonicGapField.remanenceHarmonicT(1, 1.0, 1.0), 1e-15);
        assertEquals(-4 / (3 * Math.PI), HarmonicGapField.remanenceHarmonicT(3, 1.0, 1.0), 1e-15);
    }

    @Test
    void a_two_thirds_pole_arc_has_no_third_harmonic() {
        assertEquals(0.0, HarmonicGapField.normalFluxDensityT(3, 1.2, 1.05, 2.0 / 3, 0.03, 0.005, 0.001, 0), 1e-15);
    }

    @Test
    void field_grows_towards_the_magnets_so_a_layer_average_exceeds_the_surface_value() {
        double surface = HarmonicGapField.normalFluxDensityT(1, 1.2, 1.05, 0.8, 0.03, 0.005, 0.004, 0.0);
        double layer = HarmonicGapField.normalFluxDensityT(1, 1.2, 1.05, 0.8, 0.03, 0.005, 0.004, 0.003);
        double k = Math.PI / 0.03;
        assertEquals(surface * Math.sinh(k * 0.003) / (k * 0.003), layer, 1e-12);
        assertTrue(layer > surface);
    }

    @Test
    void very_high_orders_stay_finite_and_tiny() {
        double b = HarmonicGapField.normalFluxDensityT(999, 1.4, 1.05, 0.9, 0.005, 0.05, 0.05, 0.049);
        assertTrue(Double.isFinite(b) && Math.abs(b) < 1e-6, "b = " + b);
    }

    @Test
    void square_wave_fundamental() {
        assertEquals(4 / Math.PI * 0.9 * Math.sin(0.8 * Math.PI / 2), HarmonicGapField.squareWaveFundamentalT(0.9, 0.8),
                1e-15);
    }
}
