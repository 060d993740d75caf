package coilwright.conductor;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class MeanTurnLengthTest {

    @Test
    void slotted_turn_is_two_stacks_plus_two_semicircular_end_turns_plus_extensions() {
        double mlt = MeanTurnLength.radialSlotted(0.10, 0.04, 0.01);
        assertEquals(0.2 + Math.PI * 0.04 + 0.04, mlt, 1e-12);
    }

    @Test
    void rectangular_hole_gives_rectangle_perimeter_plus_pi_times_leg_width() {
        // hole 0.05 wide, 0.06 long; leg 0.02: mean turn = 2*(0.05+0.06) + pi*0.02
        assertEquals(0.22 + Math.PI * 0.02, MeanTurnLength.axialCoil(0.06, 0.05, 0.05, 0.02), 1e-12);
    }

    @Test
    void trapezoidal_hole_uses_the_slanted_sides() {
        double slant = Math.hypot(0.08, 0.01);
        assertEquals(0.03 + 0.05 + 2 * slant + Math.PI * 0.015,
                MeanTurnLength.axialCoil(0.08, 0.03, 0.05, 0.015), 1e-12);
    }

    @Test
    void a_round_coil_around_a_point_is_a_circle_of_half_the_leg_width() {
        double tiny = 1e-9;
        assertEquals(Math.PI * 0.02, MeanTurnLength.axialCoil(tiny, 0, 0, 0.02), 1e-8);
    }

    @Test
    void from_parts_adds_legs_and_end_turns() {
        assertEquals(0.35, MeanTurnLength.fromParts(0.1, 0.06, 0.09), 1e-12);
    }

    @Test
    void rejects_bad_geometry_naming_each_field() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> MeanTurnLength.radialSlotted(0, Double.NaN, -1));
        assertEquals(3, e.errors().size());
        assertEquals("stackLengthM = 0.0: must be > 0", e.errors().get(0).message());
        assertThrows(InvalidInputException.class, () -> MeanTurnLength.axialCoil(0.05, -0.01, 0.02, 0.01));
        assertThrows(InvalidInputException.class, () -> MeanTurnLength.fromParts(0.1, -1, 0));
    }
}
