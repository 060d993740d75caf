package coilwright.magnet;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class MagnetGradesTest {

    @Test
    void finds_grades_ignoring_case_and_blanks() {
        assertEquals("N42SH", MagnetGrades.byName(" n42sh ").name());
        assertEquals(MagnetMaterial.FERRITE, MagnetGrades.byName("ferrite y30").material());
    }

    @Test
    void unknown_grade_is_refused_listing_the_allowed_names() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> MagnetGrades.byName("N99"));
        assertEquals("gradeName", e.errors().get(0).field());
        assertTrue(e.getMessage().startsWith("gradeName = N99: unknown magnet grade; allowed: N35, N38"), e.getMessage());
        assertTrue(e.getMessage().contains("Ferrite C8"), e.getMessage());
        assertThrows(InvalidInputException.class, () -> MagnetGrades.byName(null));
    }

    @Test
    void contains_the_commercial_temperature_classes_but_not_impossible_combinations() {
        List<String> names = MagnetGrades.names();
        for (String n : List.of("N35", "N52", "N52M", "N50H", "N48SH", "N42UH", "N38EH", "Ferrite Y35")) {
            assertTrue(names.contains(n), n);
        }
        for (String n : List.of("N52H", "N52SH", "N50SH", "N45UH", "N42EH")) {
            assertFalse(names.contains(n), n);
        }
        assertEquals(names.size(), MagnetGrades.all().size());
    }

    @Test
    void stronger_grades_have_higher_remanence_and_higher_classes_higher_coercivity_and_temperature() {
        assertTrue(MagnetGrades.byName("N52").remanenceT() > MagnetGrades.byName("N35").remanenceT());
        String[] classes = {"N42", "N42M", "N42H", "N42SH", "N42UH"};
        for (int i = 1; i < classes.length; i++) {
            MagnetGrade lower = MagnetGrades.byName(classes[i - 1]);
            MagnetGrade higher = MagnetGrades.byName(classes[i]);
            assertTrue(higher.intrinsicCoercivityKAPerM() > lower.intrinsicCoercivityKAPerM(), classes[i]);
            assertTrue(higher.maxWorkingTempC() > lower.maxWorkingTempC(), classes[i]);
            assertEquals(lower.remanenceT(), higher.remanenceT(), 0.0, classes[i]);
        }
    }

    @Test
    void every_grade_names_its_source() {
        MagnetGrades.all().forEach(g -> assertFalse(g.source().isBlank(), g.name()));
    }
}
