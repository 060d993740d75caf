package coilwright.demag;

import coilwright.magnet.MagnetGrades;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class DemagnetisationReferenceTest {

    @Test
    @DisplayName("IEC 60909-0 peak factor kappa = 1.02 + 0.98 exp(-3 R/X): 2.00 at R/X = 0, 1.75 at 0.1, 1.07 at 1")
    void iec_60909_peak_factor() {
        // source: IEC 60909-0:2016 eq. (55) and its kappa curve
        assertEquals(2.00, ShortCircuitCurrent.of(10, 1e-9, 1).peakFactor(), 1e-6);
        assertEquals(1.746, ShortCircuitCurrent.of(10, 0.1, 1).peakFactor(), 0.001);
        assertEquals(1.069, ShortCircuitCurrent.of(10, 1, 1).peakFactor(), 0.001);
        ShortCircuitCurrent s = ShortCircuitCurrent.of(40, 0.1, 1);
        assertEquals(40 / Math.hypot(0.1, 1), s.steadyRmsA(), 1e-12);
        assertEquals(s.peakFactor() * Math.sqrt(2) * s.steadyRmsA(), s.peakA(), 1e-12);
    }

    @Test
    @DisplayName("Far from its edges a wide magnet works on the 1-D load line B = Br l_m / (l_m + mu_r g)")
    void wide_magnet_centre_is_on_the_load_line() {
        // source: permeance-coefficient (load line) method of magnet design, e.g. Hanselman 2006, ch. 2
        MagnetCircuit c = new MagnetCircuit(MagnetGrades.byName("N42"), 0.005, 0.001, 0.5, 0.8, 1);
        double br = 1.3;
        double centre = DemagnetisationCheck.faceFluxDensityT(c, br, -0.01, 0.01);
        assertEquals(br * 0.005 / (0.005 + 1.05 * 0.001), centre, 0.005 * br);
    }

    @Test
    @DisplayName("The armature field of the fault by hand: F = (3/2)(4/pi) k_w N i_p / 2p over l_m + mu_r g")
    void armature_field_by_hand() {
        MagnetCircuit c = new MagnetCircuit(MagnetGrades.byName("N42SH"), 0.004, 0.0011, 0.022, 0.8, 1);
        ShortCircuitCurrent sc = ShortCircuitCurrent.of(40, 0.15, 1.26);
        DemagnetisationCheck d = DemagnetisationCheck.of(c, 80, 3, 20, 80, 0.866, sc);
        double mmf = 1.5 * 4 / Math.PI * 0.866 * 80 * sc.peakA() / 20;
        assertEquals(mmf / (0.004 + 1.05 * 0.0011) / 1000, d.armatureFieldKAPerM(), 1e-9);
        assertEquals(d.openCircuitFieldKAPerM() + d.armatureFieldKAPerM(), d.worstFieldKAPerM(), 1e-9);
        assertEquals(0.9 * MagnetGrades.byName("N42SH").intrinsicCoercivityAt(80), d.kneeFieldKAPerM(), 1e-9);
        assertEquals(1 - d.worstFieldKAPerM() / d.kneeFieldKAPerM(), d.margin(), 1e-12);
    }
}
