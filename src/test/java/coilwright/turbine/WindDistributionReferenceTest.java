package coilwright.turbine;

import org.apache.commons.math3.special.Gamma;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

/** Wind-speed distributions: Manwell, McGowan &amp; Rogers, "Wind Energy Explained" (2nd ed., 2009), section 2.4. */
class WindDistributionReferenceTest {

    @Test
    @DisplayName("Rayleigh: F(v_mean) = 1 - exp(-pi/4) = 0.5441 (Manwell et al. eq. 2.4)")
    void rayleigh_cdf_at_the_mean() {
        for (double mean : new double[] {3, 5.5, 9}) {
            assertEquals(0.5441, new Rayleigh(mean).cdf(mean), 5e-5);
        }
    }

    @Test
    @DisplayName("Weibull with k = 2 is the Rayleigh distribution (Manwell et al. section 2.4)")
    void weibull_k2_equals_rayleigh() {
        Rayleigh r = new Rayleigh(6.3);
        Weibull w = Weibull.fromMean(2.0, 6.3);
        assertEquals(2 * 6.3 / Math.sqrt(Math.PI), w.scaleCMs(), 1e-12);
        for (double v = 0; v <= 25; v += 0.7) {
            assertEquals(r.cdf(v), w.cdf(v), 1e-12);
            assertEquals(r.pdf(v), w.pdf(v), 1e-12);
        }
    }

    @Test
    @DisplayName("Weibull mean = c Gamma(1 + 1/k); Gamma(1.5) = sqrt(pi)/2 (Abramowitz & Stegun 6.1)")
    void weibull_mean_via_gamma() {
        assertEquals(Math.sqrt(Math.PI) / 2, Gamma.gamma(1.5), 1e-14);
        assertEquals(6 * Math.sqrt(Math.PI) / 2, new Weibull(2, 6).meanWindSpeedMs(), 1e-12);
        assertEquals(8.0, new Weibull(1, 8).meanWindSpeedMs(), 1e-12);
    }
}
