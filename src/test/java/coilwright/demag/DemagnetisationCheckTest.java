package coilwright.demag;

import coilwright.magnet.AxialDualRotor;
import coilwright.magnet.MagnetGrades;
import coilwright.magnet.RadialSurfaceRotor;
import coilwright.magnet.RotorSide;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class DemagnetisationCheckTest {
    private static DemagnetisationCheck radial(String grade, double tempC, double emfV) {
        RadialSurfaceRotor r = new RadialSurfaceRotor(RotorSide.INNER, grade, 0.14, 0.08, 0.001, 0.004, 0.8, 0.0025);
        return DemagnetisationCheck.of(MagnetCircuit.radial(r, 24, 20), tempC, 3, 20, 80, 0.866,
                ShortCircuitCurrent.of(emfV, 0.15, 1.26));
    }

    @Test
    void hot_ndfeb_is_worse_than_cold_and_a_high_coercivity_class_helps() {
        assertTrue(radial("N42", 120, 40).margin() < radial("N42", 20, 40).margin());
        assertEquals(Verdict.DANGER, radial("N42", 120, 40).verdict());
        assertEquals(Verdict.OK, radial("N42SH", 120, 40).verdict());
    }

    @Test
    void ferrite_is_weakest_in_the_cold() {
        DemagnetisationCheck cold = radial("Ferrite Y30", -20, 40);
        DemagnetisationCheck hot = radial("Ferrite Y30", 100, 40);
        assertTrue(cold.margin() < hot.margin());
        assertSame(cold, DemagnetisationCheck.worse(cold, hot));
        assertSame(cold, DemagnetisationCheck.worse(hot, cold));
    }

    @Test
    void the_exposed_edge_sees_more_opposing_field_than_the_load_line_at_the_centre() {
        DemagnetisationCheck d = radial("N42SH", 20, 0);
        assertEquals(0, d.armatureFieldKAPerM());
        MagnetCircuit c = MagnetCircuit.radial(new RadialSurfaceRotor(RotorSide.INNER, "N42SH", 0.14, 0.08, 0.001,
                0.004, 0.8, 0.0025), 24, 20);
        double br = MagnetGrades.byName("N42SH").remanenceAt(20);
        double loadLine = br * c.gapToFacingM() / (0.004 + 1.05 * c.gapToFacingM()) / (4e-7 * Math.PI) / 1000;
        assertTrue(d.openCircuitFieldKAPerM() > loadLine, d.openCircuitFieldKAPerM() + " vs " + loadLine);
    }

    @Test
    void with_a_large_gap_the_centre_of_a_dual_rotor_magnet_is_the_weak_point() {
        AxialDualRotor a = new AxialDualRotor("N42", 0.04, 0.05, 0.16, 0.01, 0.018, 0.0015);
        MagnetCircuit c = MagnetCircuit.axial(a, 16);
        double br = 1.3;
        assertTrue(DemagnetisationCheck.centreFluxDensityT(c, br) < DemagnetisationCheck.edgeFluxDensityT(c, br));
        DemagnetisationCheck d = DemagnetisationCheck.of(c, 20, 3, 16, 192, 0.866, ShortCircuitCurrent.of(0, 0.5, 1));
        double centre = (MagnetGrades.byName("N42").remanenceAt(20) - DemagnetisationCheck.centreFluxDensityT(c,
                MagnetGrades.byName("N42").remanenceAt(20))) / (4e-7 * Math.PI * 1.05) / 1000;
        assertEquals(centre, d.openCircuitFieldKAPerM(), 1e-9);
    }

    @Test
    void a_larger_fault_current_lowers_the_margin_and_crosses_into_warning_then_danger() {
        double previous = Double.POSITIVE_INFINITY;
        Verdict last = Verdict.OK;
        for (double emf = 0; emf <= 400; emf += 20) {
            DemagnetisationCheck d = radial("N42SH", 100, emf);
            assertTrue(d.margin() < previous);
            assertTrue(d.verdict().compareTo(last) >= 0, "verdicts only get worse");
            previous = d.margin();
            last = d.verdict();
        }
        assertEquals(Verdict.DANGER, last);
    }

    @Test
    void an_axial_rotor_is_checked_at_its_inner_radius_across_both_magnets() {
        AxialDualRotor a = new AxialDualRotor("N42", 0.04, 0.05, 0.16, 0.01, 0.018, 0.0015);
        MagnetCircuit c = MagnetCircuit.axial(a, 16);
        assertEquals(2, c.magnetsPerPole());
        assertEquals(a.magneticGapM() / 2, c.gapToFacingM(), 1e-15);
        assertEquals(2 * Math.PI * a.innerRadiusM() / 16, c.polePitchM(), 1e-15);
        DemagnetisationCheck d = DemagnetisationCheck.of(c, 60, 3, 16, 192, 0.866, ShortCircuitCurrent.of(60, 0.5, 1.7));
        assertTrue(d.summary().contains("kA/m"));
        assertTrue(Double.isFinite(d.margin()));
    }

    @Test
    void inputs_are_checked() {
        MagnetCircuit c = new MagnetCircuit(MagnetGrades.byName("N42"), 0.005, 0.001, 0.02, 0.8, 1);
        assertThrows(InvalidInputException.class, () -> DemagnetisationCheck.of(c, 20, 2, 20, 80, 0.9,
                ShortCircuitCurrent.of(1, 1, 1)));
        assertThrows(InvalidInputException.class, () -> ShortCircuitCurrent.of(-1, 0, 1));
        assertThrows(InvalidInputException.class, () -> new MagnetCircuit(null, 0, 0, 0, 2, 3));
    }
}
