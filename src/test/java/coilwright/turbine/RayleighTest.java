package coilwright.turbine;

import coilwright.validation.InvalidInputException;
import org.apache.commons.math3.analysis.integration.SimpsonIntegrator;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class RayleighTest {
    private final Rayleigh r = new Rayleigh(6.0);

    @Test
    void pdf_integrates_to_the_cdf() {
        double integral = new SimpsonIntegrator().integrate(100_000, r::pdf, 0, 9);
        assertEquals(r.cdf(9), integral, 1e-6);
    }

    @Test
    void cdf_starts_at_zero_and_tends_to_one() {
        assertEquals(0.0, r.cdf(0));
        assertEquals(1.0, r.cdf(60), 1e-12);
    }

    @Test
    void rejects_zero_mean_and_negative_speed() {
        assertEquals("meanWindSpeedMs", assertThrows(InvalidInputException.class, () -> new Rayleigh(0))
                .errors().get(0).field());
        assertEquals("windSpeedMs", assertThrows(InvalidInputException.class, () -> r.cdf(-1))
                .errors().get(0).field());
    }
}
