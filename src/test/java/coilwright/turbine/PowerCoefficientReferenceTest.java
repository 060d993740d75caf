package coilwright.turbine;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

/** The Betz limit (Betz, "Das Maximum der theoretisch moeglichen Ausnuetzung des Windes durch Windmotoren", 1920). */
class PowerCoefficientReferenceTest {

    @Test
    @DisplayName("Betz limit 16/27 = 0.5926")
    void betz_limit_is_16_over_27() {
        assertEquals(0.5926, PowerCoefficientCurve.BETZ_LIMIT, 5e-5);
    }

    @Test
    @DisplayName("A Cp curve may reach but not exceed the Betz limit (Betz 1920)")
    void curves_at_the_limit_are_accepted_and_above_it_refused() {
        assertEquals(16.0 / 27.0, new ParametricCp(16.0 / 27.0, 5).maxCp(), 0);
        assertThrows(InvalidInputException.class, () -> new ParametricCp(0.593, 5));
        assertThrows(InvalidInputException.class,
                () -> new TableCp(new double[] {2, 5, 8}, new double[] {0.2, 0.593, 0.1}));
    }
}
