package coilwright.turbine;

import coilwright.validation.InvalidInputException;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class ParametricCpTest {
    private final ParametricCp curve = new ParametricCp(0.42, 6.0);

    @Test
    void peaks_at_cp_max_at_the_optimum_tip_speed_ratio() {
        assertEquals(0.42, curve.cp(6.0), 1e-12);
        assertTrue(curve.cp(5.9) < 0.42);
        assertTrue(curve.cp(6.1) < 0.42);
    }

    @Test
    void is_zero_at_rest_and_at_runaway_and_beyond() {
        assertEquals(0.0, curve.cp(0.0));
        assertEquals(0.0, curve.cp(curve.runawayTipSpeedRatio()), 1e-12);
        assertEquals(0.0, curve.cp(20.0));
        assertEquals(6.0 * 1.6180339887, curve.runawayTipSpeedRatio(), 1e-8);
    }

    @Test
    void has_a_finite_starting_torque_coefficient_cp_max_over_lambda_opt() {
        assertEquals(0.42 / 6.0, curve.torqueCoefficient(0.0), 1e-12);
        assertEquals(curve.cp(2.0) / 2.0, curve.torqueCoefficient(2.0), 1e-12);
    }

    @Test
    void torque_coefficient_peaks_at_half_the_optimum() {
        assertTrue(curve.torqueCoefficient(3.0) > curve.torqueCoefficient(2.5));
        assertTrue(curve.torqueCoefficient(3.0) > curve.torqueCoefficient(3.5));
    }

    @Test
    void rejects_cp_max_above_betz_naming_the_field() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new ParametricCp(0.6, 6));
        assertEquals("cpMax", e.errors().get(0).field());
        assertEquals("cpMax = 0.6: must be <= 0.5926 (Betz limit)", e.errors().get(0).message());
    }

    @Test
    void rejects_zero_cp_max_and_absurd_tip_speed_ratio_together() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new ParametricCp(0.0, 40));
        assertEquals(2, e.errors().size());
        assertEquals("tipSpeedRatioOpt", e.errors().get(1).field());
    }

    @Test
    void rejects_a_negative_tip_speed_ratio() {
        assertThrows(InvalidInputException.class, () -> curve.cp(-1));
    }

    @Property
    void cp_stays_between_zero_and_cp_max(@ForAll @DoubleRange(min = 0.05, max = 0.59) double cpMax,
                                         @ForAll @DoubleRange(min = 1, max = 12) double opt,
                                         @ForAll @DoubleRange(min = 0, max = 30) double lambda) {
        double cp = new ParametricCp(cpMax, opt).cp(lambda);
        assertTrue(cp >= 0 && cp <= cpMax + 1e-12, "cp " + cp);
    }
}
