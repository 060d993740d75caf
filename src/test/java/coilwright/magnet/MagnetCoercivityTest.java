package coilwright.magnet;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class MagnetCoercivityTest {

    @Test
    void ndfeb_coercivity_falls_with_temperature_and_less_so_in_higher_classes() {
        double n = MagnetGrades.byName("N42").intrinsicCoercivityTempCoeffPerK();
        double sh = MagnetGrades.byName("N42SH").intrinsicCoercivityTempCoeffPerK();
        double uh = MagnetGrades.byName("N38UH").intrinsicCoercivityTempCoeffPerK();
        assertEquals(-0.0060, n, 1e-12);
        assertEquals(-0.0055, sh, 1e-12);
        assertEquals(-0.0052, uh, 1e-12);
        assertEquals(-0.0050, MagnetGrades.byName("N35EH").intrinsicCoercivityTempCoeffPerK(), 1e-12);
    }

    @Test
    void ferrite_coercivity_rises_with_temperature() {
        MagnetGrade y30 = MagnetGrades.byName("Ferrite Y30");
        assertEquals(0.0030, y30.intrinsicCoercivityTempCoeffPerK(), 1e-12);
        assertTrue(y30.intrinsicCoercivityAt(-20) < y30.intrinsicCoercivityKAPerM());
    }

    @Test
    void coercivity_at_temperature_is_linear_and_never_negative() {
        MagnetGrade g = MagnetGrades.byName("N42");
        assertEquals(g.intrinsicCoercivityKAPerM() * (1 - 0.0060 * 80), g.intrinsicCoercivityAt(100), 1e-9);
        assertEquals(0, g.intrinsicCoercivityAt(250));
        assertEquals(g.intrinsicCoercivityKAPerM(), g.intrinsicCoercivityAt(20), 1e-12);
    }

    @Test
    void a_grade_outside_the_catalogue_takes_the_class_its_coercivity_reaches() {
        MagnetGrade g = new MagnetGrade("Test", MagnetMaterial.NDFEB_SINTERED, 1.3, -0.001, 1600, 1.05, 150, "invented");
        assertEquals(-0.0055, g.intrinsicCoercivityTempCoeffPerK(), 1e-12);
    }

    @Test
    void remanence_ratio_scales_between_temperatures() {
        MagnetGrade g = MagnetGrades.byName("N42");
        assertEquals((1 - 0.0012 * 60) / (1 - 0.0012 * 5), g.remanenceRatio(25, 80), 1e-12);
        assertEquals(1.0, g.remanenceRatio(40, 40), 0);
    }
}
