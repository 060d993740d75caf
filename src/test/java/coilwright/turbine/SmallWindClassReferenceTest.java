package coilwright.turbine;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

/** IEC 61400-2 (edition 3, 2013), Table 1: basic parameters for small wind turbine classes. */
class SmallWindClassReferenceTest {

    @Test
    @DisplayName("Vref 50 / 42.5 / 37.5 / 30 m/s and Vave 10 / 8.5 / 7.5 / 6 m/s (IEC 61400-2:2013 Table 1)")
    void class_values_match_the_table() {
        assertEquals(50.0, SmallWindClass.I.referenceWindSpeedMs().orElseThrow());
        assertEquals(42.5, SmallWindClass.II.referenceWindSpeedMs().orElseThrow());
        assertEquals(37.5, SmallWindClass.III.referenceWindSpeedMs().orElseThrow());
        assertEquals(30.0, SmallWindClass.IV.referenceWindSpeedMs().orElseThrow());
        for (SmallWindClass k : new SmallWindClass[] {SmallWindClass.I, SmallWindClass.II, SmallWindClass.III, SmallWindClass.IV}) {
            assertEquals(0.2 * k.referenceWindSpeedMs().orElseThrow(), k.annualAverageWindSpeedMs().orElseThrow(), 1e-12);
        }
        assertTrue(SmallWindClass.S.referenceWindSpeedMs().isEmpty());
    }

    @Test
    @DisplayName("The class needed is the one with the smallest Vave at or above the site mean")
    void class_for_a_site_mean() {
        assertEquals(SmallWindClass.IV, SmallWindClass.classFor(4.0).windClass());
        assertEquals(SmallWindClass.IV, SmallWindClass.classFor(6.0).windClass());
        assertEquals(SmallWindClass.III, SmallWindClass.classFor(6.1).windClass());
        assertEquals(SmallWindClass.II, SmallWindClass.classFor(8.0).windClass());
        assertEquals(SmallWindClass.I, SmallWindClass.classFor(9.9).windClass());
        WindClassAssessment s = SmallWindClass.classFor(10.5);
        assertEquals(SmallWindClass.S, s.windClass());
        assertTrue(s.note().contains("class S"), s.note());
        assertTrue(SmallWindClass.classFor(7.0).note().contains("IEC 61400-2"));
    }

    @Test
    void rejects_a_zero_mean() {
        assertThrows(InvalidInputException.class, () -> SmallWindClass.classFor(0));
    }
}
