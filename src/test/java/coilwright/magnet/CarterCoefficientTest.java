package coilwright.magnet;

import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class CarterCoefficientTest {

    @Test
    void grows_with_the_slot_opening_and_shrinks_with_the_gap() {
        double narrow = CarterCoefficient.of(0.01, 0.001, 0.001);
        double wide = CarterCoefficient.of(0.01, 0.003, 0.001);
        double wideBigGap = CarterCoefficient.of(0.01, 0.003, 0.003);
        assertTrue(wide > narrow && narrow > 1.0);
        assertTrue(wideBigGap < wide);
    }

    @Test
    void equivalent_opening_never_exceeds_the_real_opening() {
        for (double b = 0.0001; b < 0.05; b *= 1.7) {
            assertTrue(CarterCoefficient.gamma(b, 0.001) * 0.001 < b, "b_o = " + b);
        }
    }

    @Test
    void refuses_an_opening_as_wide_as_the_slot_pitch() {
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class,
                () -> CarterCoefficient.of(0.01, 0.01, 0.001));
        assertEquals("slotOpeningM", e.field());
        assertTrue(e.getMessage().contains("slot pitch"), e.getMessage());
    }

    @Test
    void refuses_bad_numbers_naming_each_field() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> CarterCoefficient.of(-0.01, Double.NaN, 0.0));
        assertEquals(3, e.errors().size());
        assertTrue(e.getMessage().contains("slotPitchM = -0.01: must be > 0"), e.getMessage());
        assertTrue(e.getMessage().contains("slotOpeningM = NaN"), e.getMessage());
        assertTrue(e.getMessage().contains("airGapM = 0.0: must be > 0"), e.getMessage());
    }
}
