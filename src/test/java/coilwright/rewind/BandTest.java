package coilwright.rewind;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class BandTest {

    @Test
    void band_spans_the_relative_uncertainty_either_side() {
        Band b = Band.of(2.0, 0.05);
        assertEquals(1.9, b.low(), 1e-12);
        assertEquals(2.1, b.high(), 1e-12);
        assertEquals(0.05, b.relativeUncertainty(), 0);
    }

    @Test
    void relative_uncertainties_of_a_quotient_add_in_quadrature() {
        // source: JCGM 100:2008 (GUM) 5.1.6: for Y = X1 / X2, (u_Y/Y)^2 = (u1/X1)^2 + (u2/X2)^2; 3 % and 4 % give 5 %
        assertEquals(0.05, Band.quadrature(0.03, 0.04), 1e-15);
        assertEquals(0.0, Band.quadrature(), 0);
    }

    @Test
    void scaling_by_an_exact_factor_keeps_the_relative_band() {
        Band b = Band.of(3.0, 0.02).times(0.5);
        assertEquals(1.5, b.value(), 1e-15);
        assertEquals(0.02, b.relativeUncertainty(), 0);
        assertEquals(1.47, b.low(), 1e-12);
    }

    @Test
    void a_non_finite_band_is_refused() {
        assertThrows(IllegalArgumentException.class, () -> Band.of(Double.NaN, 0.01));
        assertThrows(IllegalArgumentException.class, () -> Band.of(1.0, -0.01));
    }
}
