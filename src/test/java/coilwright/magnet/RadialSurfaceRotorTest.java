package coilwright.magnet;

import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import java.util.Map;
import java.util.stream.Collectors;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class RadialSurfaceRotorTest {

    static RadialSurfaceRotor inner() {
        return new RadialSurfaceRotor(RotorSide.INNER, "N42SH", 0.100, 0.050, 0.001, 0.004, 0.8, 0.0025);
    }

    @Test
    void magnet_radii_and_volume_of_an_inner_rotor() {
        RadialSurfaceRotor r = inner();
        assertEquals(0.049, r.magnetSurfaceRadiusM(), 1e-12);
        assertEquals(0.045, r.magnetBackRadiusM(), 1e-12);
        assertEquals(0.8 * Math.PI * (0.049 * 0.049 - 0.045 * 0.045) * 0.05, r.magnetVolumeM3(), 1e-15);
    }

    @Test
    void magnet_radii_of_an_outer_rotor_lie_outside_the_stator() {
        RadialSurfaceRotor r = new RadialSurfaceRotor(RotorSide.OUTER, "N42", 0.2, 0.03, 0.001, 0.003, 0.9, 0.0);
        assertEquals(0.101, r.magnetSurfaceRadiusM(), 1e-12);
        assertEquals(0.104, r.magnetBackRadiusM(), 1e-12);
        assertTrue(r.magnetVolumeM3() > 0);
    }

    @Test
    void refuses_every_bad_field_at_once_with_its_range() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new RadialSurfaceRotor(null, "X",
                -1, 0, 0.00001, Double.NaN, 0.2, -0.001));
        Map<String, String> byField = e.errors().stream()
                .collect(Collectors.toMap(f -> f.field(), f -> f.message()));
        assertEquals(8, byField.size(), e.getMessage());
        assertEquals("side is missing: a value is required", byField.get("side"));
        assertTrue(byField.get("gradeName").contains("unknown magnet grade; allowed: N35"));
        assertEquals("gapDiameterM = -1.0: must be between 0.01 and 5.0", byField.get("gapDiameterM"));
        assertEquals("stackLengthM = 0.0: must be between 0.002 and 2.0", byField.get("stackLengthM"));
        assertEquals("airGapM = 1.0E-5: must be between 1.0E-4 and 0.05", byField.get("airGapM"));
        assertEquals("magnetThicknessM = NaN: must be a finite number", byField.get("magnetThicknessM"));
        assertEquals("poleArcRatio = 0.2: must be between 0.3 and 1.0", byField.get("poleArcRatio"));
        assertEquals("slotOpeningM = -0.001: must be between 0.0 and 0.1", byField.get("slotOpeningM"));
    }

    @Test
    void refuses_an_inner_rotor_whose_magnets_reach_the_axis() {
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class, () -> new RadialSurfaceRotor(
                RotorSide.INNER, "N42", 0.02, 0.02, 0.002, 0.009, 0.8, 0));
        assertEquals("magnetThicknessM", e.field());
        assertTrue(e.getMessage().contains("rotor iron diameter"), e.getMessage());
    }

    @Test
    void copies_change_one_field() {
        assertEquals(0.006, inner().withMagnetThicknessM(0.006).magnetThicknessM(), 0.0);
        assertEquals(0.002, inner().withAirGapM(0.002).airGapM(), 0.0);
        assertEquals(inner().poleArcRatio(), inner().withAirGapM(0.002).poleArcRatio(), 0.0);
    }
}
