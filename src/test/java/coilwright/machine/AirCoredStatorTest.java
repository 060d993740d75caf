package coilwright.machine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

class AirCoredStatorTest {
    @Test
    void the_opening_ends_follow_from_the_mid_width_and_the_taper() {
        AirCoredStator s = new AirCoredStator(0.02, 0.03, 0.01);
        assertEquals(0.025, s.openingInnerEndWidthM(), 1e-15);
        assertEquals(0.035, s.openingOuterEndWidthM(), 1e-15);
    }

    @Test
    void a_stator_given_by_its_end_widths_keeps_them() {
        AirCoredStator s = AirCoredStator.ofOpeningEnds(0.022, 0.024, 0.034);
        assertEquals(0.029, s.openingMidWidthM(), 1e-15);
        assertEquals(0.010, s.openingTaperM(), 1e-15);
        assertEquals(0.024, s.openingInnerEndWidthM(), 1e-15);
        assertEquals(0.034, s.openingOuterEndWidthM(), 1e-15);
    }

    @Test
    void a_closed_or_too_wide_opening_is_refused_naming_the_taper() {
        InvalidInputException closed = assertThrows(InvalidInputException.class, () -> new AirCoredStator(0.02, 0.01, 0.03));
        assertEquals("openingTaperM", closed.errors().get(0).field());
        assertTrue(closed.errors().get(0).message().startsWith("openingTaperM = 0.03: must be at most twice openingMidWidthM"),
                closed.errors().get(0).message());
        InvalidInputException wide = assertThrows(InvalidInputException.class, () -> new AirCoredStator(0.02, 0.29, 0.04));
        assertTrue(wide.errors().get(0).message().contains("outer end would be 0.31 m wide"), wide.errors().get(0).message());
    }

    @Test
    void every_out_of_range_field_is_named_at_once() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new AirCoredStator(0, -0.01, Double.NaN));
        assertEquals(3, e.errors().size());
        assertEquals("conductorBandWidthM = 0.0: must be between 0.001 and 0.2", e.errors().get(0).message());
    }
}
