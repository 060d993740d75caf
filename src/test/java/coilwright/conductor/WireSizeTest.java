package coilwright.conductor;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class WireSizeTest {

    @Test
    void each_gauge_step_shrinks_the_diameter_by_the_39th_root_of_92() {
        double ratio = WireSize.awgDiameterM(17) / WireSize.awgDiameterM(18);
        assertEquals(Math.pow(92.0, 1.0 / 39.0), ratio, 1e-12);
    }

    @Test
    void equivalent_awg_inverts_the_defining_formula() {
        for (int n = WireSize.MIN_AWG; n <= WireSize.MAX_AWG; n++) {
            assertEquals(n, WireSize.equivalentAwg(WireSize.awgDiameterM(n)), 1e-9);
        }
    }

    @Test
    void interpolated_enamel_build_lies_between_its_table_neighbours() {
        double d = 1.06e-3;
        double inc = WireSize.overallDiameterM(d, 2) - d;
        assertTrue(inc > 0.094e-3 - 1e-12 && inc < 0.097e-3 + 1e-12, "increase " + inc);
    }

    @Test
    void grade_two_is_always_thicker_than_grade_one() {
        for (double mm = 0.05; mm < 6.0; mm *= 1.1) {
            assertTrue(WireSize.overallDiameterM(mm / 1000, 2) > WireSize.overallDiameterM(mm / 1000, 1), "at " + mm);
        }
    }

    @Test
    void outside_the_table_the_end_increase_is_used() {
        assertEquals(0.080e-3 + 0.017e-3, WireSize.overallDiameterM(0.080e-3, 1), 1e-12);
        assertEquals(5.189e-3 + 0.093e-3, WireSize.overallDiameterM(5.189e-3, 1), 1e-12);
    }

    @Test
    void rejects_awg_outside_4_to_40_naming_field_and_range() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> WireSize.awgDiameterM(50));
        assertEquals("awg = 50: must be between 4 and 40", e.errors().get(0).message());
        assertThrows(InvalidInputException.class, () -> WireSize.awgDiameterM(3));
    }

    @Test
    void rejects_bad_grade_and_nan_diameter() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> WireSize.overallDiameterM(Double.NaN, 3));
        assertEquals(2, e.errors().size());
        assertEquals("bareDiameterM", e.errors().get(0).field());
        assertEquals("insulationGrade = 3: must be between 1 and 2", e.errors().get(1).message());
    }
}
