package coilwright.turbine;

import coilwright.validation.InvalidInputException;
import org.apache.commons.math3.analysis.integration.SimpsonIntegrator;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class WeibullTest {

    @Test
    void from_mean_reproduces_the_mean() {
        assertEquals(5.5, Weibull.fromMean(1.7, 5.5).meanWindSpeedMs(), 1e-12);
    }

    @Test
    void mean_by_integration_matches_the_gamma_formula() {
        Weibull w = new Weibull(2.4, 7.0);
        double mean = new SimpsonIntegrator().integrate(100_000, v -> v * w.pdf(v), 0, 60);
        assertEquals(w.meanWindSpeedMs(), mean, 1e-6);
    }

    @Test
    void cdf_is_one_minus_exp_at_the_scale() {
        assertEquals(1 - Math.exp(-1), new Weibull(3, 8).cdf(8), 1e-15);
    }

    @Test
    void rejects_shape_out_of_range_and_zero_scale() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new Weibull(0.5, 0));
        assertEquals("shapeK", e.errors().get(0).field());
        assertEquals("scaleCMs", e.errors().get(1).field());
        assertEquals("meanWindSpeedMs", assertThrows(InvalidInputException.class,
                () -> Weibull.fromMean(2, -3)).errors().get(0).field());
    }
}
