package coilwright.magnet;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class MagnetGradeTest {

    private static MagnetGrade sample() {
        return new MagnetGrade("Test", MagnetMaterial.NDFEB_SINTERED, 1.3, -0.001, 1000, 1.05, 100, "invented");
    }

    @Test
    void remanence_falls_linearly_with_temperature() {
        MagnetGrade g = sample();
        assertEquals(1.3, g.remanenceAt(20), 1e-15);
        assertEquals(1.3 * (1 - 0.001 * 80), g.remanenceAt(100), 1e-12);
        assertTrue(g.remanenceAt(-20) > 1.3);
    }

    @Test
    void warns_above_the_maximum_working_temperature_and_mentions_demagnetisation() {
        MagnetGrade g = sample();
        assertEquals(0, g.temperatureWarnings(100).size());
        String w = g.temperatureWarnings(110).get(0);
        assertTrue(w.contains("110 C") && w.contains("100 C") && w.contains("irreversible demagnetisation"), w);
    }

    @Test
    void warns_for_cold_ferrite_only() {
        MagnetGrade ferrite = MagnetGrades.byName("Ferrite Y30");
        assertTrue(ferrite.temperatureWarnings(-30).get(0).contains("cold"));
        assertEquals(0, ferrite.temperatureWarnings(-10).size());
        assertEquals(0, MagnetGrades.byName("N42").temperatureWarnings(-30).size());
    }

    @Test
    void refuses_a_temperature_outside_the_model_range() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> sample().remanenceAt(400));
        assertTrue(e.getMessage().contains("magnetTempC = 400.0: must be between -60.0 and 300.0"), e.getMessage());
        assertThrows(InvalidInputException.class, () -> sample().remanenceAt(Double.NaN));
    }

    @Test
    void refuses_every_bad_field_at_once() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new MagnetGrade(" ", null, 2.0,
                0.001, 10, 0.9, 500, ""));
        assertEquals(8, e.errors().size(), e.getMessage());
        assertTrue(e.getMessage().contains("remanenceT = 2.0: must be between 0.1 and 1.6"), e.getMessage());
        assertTrue(e.getMessage().contains("material is missing"), e.getMessage());
    }
}
