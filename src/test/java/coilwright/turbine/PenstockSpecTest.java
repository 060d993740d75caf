package coilwright.turbine;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class PenstockSpecTest {

    @Test
    void material_gives_roughness_and_c() {
        PenstockSpec s = PenstockSpec.of(100, 0.15, PipeMaterial.COMMERCIAL_STEEL, 1);
        assertEquals(0.045e-3, s.roughnessM(), 1e-15);
        assertEquals(120, s.hazenWilliamsC());
        assertEquals(0.045e-3 / 0.15, s.relativeRoughness(), 1e-15);
    }

    @Test
    void rejects_zero_diameter_and_negative_length_naming_both() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new PenstockSpec(-1, 0, 0, 140, 0));
        assertEquals("lengthM", e.errors().get(0).field());
        assertEquals("innerDiameterM", e.errors().get(1).field());
        assertEquals("innerDiameterM = 0.0: must be > 0.0 and <= 5.0", e.errors().get(1).message());
    }

    @Test
    void rejects_roughness_beyond_the_moody_chart() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new PenstockSpec(10, 0.02, 0.005, 100, 0));
        assertEquals("roughnessM", e.errors().get(0).field());
    }

    @Test
    void rejects_missing_material() {
        assertEquals("material", assertThrows(InvalidInputException.class,
                () -> PenstockSpec.of(10, 0.1, null, 0)).errors().get(0).field());
    }
}
