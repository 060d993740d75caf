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
    void rectangular_opening_gives_rectangle_perimeter_plus_pi_times_band_width() {
        // opening 0.05 wide, 0.06 long; band 0.02: mean turn = 2*(0.05+0.06) + pi*0.02
        assertEquals(0.22 + Math.PI * 0.02, MeanTurnLength.axialCoilAroundOpening(0.06, 0.05, 0, 0.02), 1e-12);
    }

    @Test
    void tapered_opening_uses_the_slanted_sides() {
        // ends 0.03 and 0.05 wide, 0.08 apart: mid width 0.04, taper 0.02, each slanted side sqrt(0.08^2 + 0.01^2)
        double slant = Math.hypot(0.08, 0.01);
        assertEquals(0.03 + 0.05 + 2 * slant + Math.PI * 0.015,
                MeanTurnLength.axialCoilAroundOpening(0.08, 0.04, 0.02, 0.015), 1e-12);
    }

    @Test
    void an_opening_given_by_its_end_widths_gives_the_same_turn_to_the_last_bit() {
        // the older input named the two end widths; mid = (inner + outer)/2 and taper = outer - inner reproduce
        // the perimeter inner + outer + 2*sqrt(L^2 + ((outer - inner)/2)^2) exactly
        double[][] cases = {{0.05, 0.024, 0.034, 0.022}, {0.08, 0.03, 0.05, 0.015}, {0.037, 0, 0.3, 0.2},
                {0.1, 0.0123456789, 0.0987654321, 0.001}};
        for (double[] c : cases) {
            double old = c[1] + c[2] + 2.0 * Math.hypot(c[0], (c[2] - c[1]) / 2.0) + Math.PI * c[3];
            assertEquals(old, MeanTurnLength.axialCoilAroundOpening(c[0], (c[1] + c[2]) / 2, c[2] - c[1], c[3]), 0.0);
        }
    }

    @Test
    void a_round_coil_around_a_point_is_a_circle_of_half_the_band_width() {
        double tiny = 1e-9;
        assertEquals(Math.PI * 0.02, MeanTurnLength.axialCoilAroundOpening(tiny, 0, 0, 0.02), 1e-8);
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
        assertThrows(InvalidInputException.class, () -> MeanTurnLength.axialCoilAroundOpening(0.05, -0.01, 0.02, 0.01));
        assertThrows(InvalidInputException.class, () -> MeanTurnLength.fromParts(0.1, -1, 0));
    }
}
