package coilwright.magnet;

import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class AxialDualRotorTest {

    /** Invented example: 46 x 50 x 10 mm magnets on a 120 mm pitch circle, 13 mm coil layer, 2 mm clearances. */
    static AxialDualRotor sample() {
        return new AxialDualRotor("N42", 0.046, 0.050, 0.120, 0.010, 0.013, 0.002);
    }

    @Test
    void magnetic_gap_and_radii() {
        AxialDualRotor a = sample();
        assertEquals(0.017, a.magneticGapM(), 1e-12);
        assertEquals(0.095, a.innerRadiusM(), 1e-12);
        assertEquals(0.145, a.outerRadiusM(), 1e-12);
        assertEquals(2 * Math.PI * 0.12 / 12, AxialDualRotor.polePitchAtM(0.12, 12), 1e-15);
        assertEquals(2 * 12 * 0.046 * 0.05 * 0.01, a.magnetVolumeM3(12), 1e-15);
    }

    @Test
    void twelve_magnets_fit() {
        assertDoesNotThrow(() -> sample().checkFits(12));
        assertDoesNotThrow(() -> sample().checkFits(2));
    }

    @Test
    void magnets_wider_than_the_pole_pitch_are_refused_naming_the_width() {
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class, () -> sample().checkFits(20));
        assertEquals("magnetWidthM", e.field());
        assertTrue(e.getMessage().contains("wider than the pole pitch") && e.getMessage().contains("overlap"),
                e.getMessage());
    }

    @Test
    void magnets_touching_at_the_inner_edge_are_refused_naming_the_width() {
        // 16 poles: pitch at the centre radius 47.1 mm > 46 mm, but at r = 95 mm the limit is 2 r tan(pi/16) = 37.8 mm
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class, () -> sample().checkFits(16));
        assertEquals("magnetWidthM", e.field());
        assertTrue(e.getMessage().contains("touch at their inner edge") && e.getMessage().contains("0.0378"),
                e.getMessage());
    }

    @Test
    void magnets_reaching_the_axis_are_refused_naming_the_length() {
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class,
                () -> new AxialDualRotor("N42", 0.02, 0.1, 0.05, 0.01, 0.01, 0.001));
        assertEquals("magnetLengthM", e.field());
        assertTrue(e.getMessage().contains("inner edge"), e.getMessage());
    }

    @Test
    void refuses_every_bad_field_at_once_with_its_range() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new AxialDualRotor("N60", 0, 1, Double.POSITIVE_INFINITY, 0.2, 0.0005, 0.05));
        assertEquals(7, e.errors().size(), e.getMessage());
        String m = e.getMessage();
        assertTrue(m.contains("gradeName = N60: unknown magnet grade"), m);
        assertTrue(m.contains("magnetWidthM = 0.0: must be between 0.002 and 0.5"), m);
        assertTrue(m.contains("magnetLengthM = 1.0: must be between 0.002 and 0.5"), m);
        assertTrue(m.contains("magnetCentreRadiusM = Infinity: must be a finite number"), m);
        assertTrue(m.contains("magnetThicknessM = 0.2: must be between 5.0E-4 and 0.1"), m);
        assertTrue(m.contains("coilLayerThicknessM = 5.0E-4: must be between 0.001 and 0.1"), m);
        assertTrue(m.contains("clearancePerSideM = 0.05: must be between 1.0E-4 and 0.02"), m);
    }
}
