package coilwright.magnet;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Grade figures against manufacturers' published grade tables (typical data sheets for sintered NdFeB and hard
 * ferrite; 1 kOe = 1000/(4 pi) kA/m exactly by the definition of the oersted).
 */
class MagnetGradesReferenceTest {

    @Test
    @DisplayName("NdFeB data sheets: N42 Br 1.28-1.32 T, N52 1.43-1.48 T, N35 1.17-1.22 T")
    void ndfeb_remanence_lies_in_the_published_ranges() {
        assertInRange(MagnetGrades.byName("N35").remanenceT(), 1.17, 1.22);
        assertInRange(MagnetGrades.byName("N42").remanenceT(), 1.28, 1.32);
        assertInRange(MagnetGrades.byName("N48SH").remanenceT(), 1.38, 1.42);
        assertInRange(MagnetGrades.byName("N52").remanenceT(), 1.43, 1.48);
    }

    @Test
    @DisplayName("NdFeB data sheets: HcJ class minimum 12/14/17/20/25/30 kOe = 955/1114/1353/1592/1989/2387 kA/m")
    void ndfeb_coercivity_classes() {
        assertEquals(955, MagnetGrades.byName("N42").intrinsicCoercivityKAPerM(), 1);
        assertEquals(1114, MagnetGrades.byName("N42M").intrinsicCoercivityKAPerM(), 1);
        assertEquals(1353, MagnetGrades.byName("N42H").intrinsicCoercivityKAPerM(), 1);
        assertEquals(1592, MagnetGrades.byName("N42SH").intrinsicCoercivityKAPerM(), 1);
        assertEquals(1989, MagnetGrades.byName("N40UH").intrinsicCoercivityKAPerM(), 1);
        assertEquals(2387, MagnetGrades.byName("N35EH").intrinsicCoercivityKAPerM(), 1);
    }

    @Test
    @DisplayName("Br temperature correction with the data-sheet coefficient -0.12 %/K: N42 at 80 C = 1.30 * (1 - 0.072) = 1.2064 T")
    void ndfeb_remanence_at_temperature() {
        assertEquals(1.2064, MagnetGrades.byName("N42").remanenceAt(80), 1e-9);
        // ferrite -0.20 %/K: Y30 at 100 C = 0.385 * (1 - 0.16) = 0.3234 T
        assertEquals(0.3234, MagnetGrades.byName("Ferrite Y30").remanenceAt(100), 1e-9);
    }

    @Test
    @DisplayName("ferrite data sheets: Y30 Br 0.38-0.39 T, Y35 0.40-0.41 T, C8 0.385-0.395 T; HcJ about 180-270 kA/m")
    void ferrite_figures() {
        assertInRange(MagnetGrades.byName("Ferrite Y30").remanenceT(), 0.38, 0.39);
        assertInRange(MagnetGrades.byName("Ferrite Y35").remanenceT(), 0.40, 0.41);
        assertInRange(MagnetGrades.byName("Ferrite C8").remanenceT(), 0.385, 0.395);
        MagnetGrades.all().stream().filter(g -> g.material() == MagnetMaterial.FERRITE)
                .forEach(g -> assertInRange(g.intrinsicCoercivityKAPerM(), 180, 270));
    }

    private static void assertInRange(double v, double lo, double hi) {
        assertTrue(v >= lo && v <= hi, v + " not in " + lo + ".." + hi);
    }
}
