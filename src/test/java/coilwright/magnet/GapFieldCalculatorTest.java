package coilwright.magnet;

import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class GapFieldCalculatorTest {

    @Test
    void radial_rotor_uses_the_carter_scaled_gap_in_the_one_d_circuit() {
        RadialSurfaceRotor r = RadialSurfaceRotorTest.inner();
        GapField f = GapFieldCalculator.solve(r, 10, 12, 60);
        double br = MagnetGrades.byName("N42SH").remanenceAt(60);
        double kc = CarterCoefficient.of(Math.PI * 0.1 / 12, 0.0025, 0.001);
        assertEquals(br, f.remanenceAtTempT(), 1e-15);
        assertEquals(kc, f.carterCoefficient(), 1e-15);
        assertEquals(kc * 0.001, f.effectiveGapM(), 1e-15);
        assertEquals(br * 0.004 / (0.004 + 1.05 * kc * 0.001), f.gapFluxDensity1dT(), 1e-12);
        assertEquals(Math.PI * 0.1 / 10, f.polePitchM(), 1e-15);
        assertEquals(0.8, f.poleArcRatio(), 0.0);
    }

    @Test
    void radial_flux_per_pole_is_two_over_pi_times_fundamental_times_pole_area() {
        GapField f = GapFieldCalculator.solve(RadialSurfaceRotorTest.inner(), 10, 12, 60);
        double area = f.polePitchM() * 0.05;
        assertEquals(2 / Math.PI * f.fundamentalAmplitude2dT() * area, f.fluxPerPoleWb(), 1e-15);
        assertEquals(2 / Math.PI * f.fundamentalAmplitude1dT() * area, f.fluxPerPole1dWb(), 1e-15);
        assertEquals(f.fundamentalAmplitude2dT(), f.amplitudeT(1), 0.0);
        assertEquals(f.fundamentalAmplitude2dT() / f.fundamentalAmplitude1dT(), f.leakageRatio(), 1e-15);
        // tau_p / g_eff is about 30 here: a few percent of leakage, not more
        assertTrue(f.leakageRatio() < 1.0 && f.leakageRatio() > 0.9, "leakage ratio " + f.leakageRatio());
        assertEquals(7, f.harmonicAmplitudes().size());
        assertTrue(f.peakFluxDensity2dT() < f.gapFluxDensity1dT() && f.peakFluxDensity2dT() > 0.9 * f.gapFluxDensity1dT());
        assertEquals(f.magnetVolumeM3() * 7500, f.magnetMassKg(), 1e-12);
        assertTrue(f.warnings().isEmpty());
    }

    @Test
    void a_smooth_stator_has_no_carter_correction() {
        RadialSurfaceRotor r = new RadialSurfaceRotor(RotorSide.OUTER, "Ferrite Y30", 0.2, 0.04, 0.0015, 0.01, 0.9, 0);
        GapField f = GapFieldCalculator.solve(r, 16, 1, 20);
        assertEquals(1.0, f.carterCoefficient(), 0.0);
        assertEquals(r.magnetVolumeM3() * 4900, f.magnetMassKg(), 1e-12);
    }

    @Test
    void axial_rotor_integrates_flux_over_radius_and_averages_over_the_coil_layer() {
        AxialDualRotor a = AxialDualRotorTest.sample();
        GapField f = GapFieldCalculator.solve(a, 12, 9, 40);
        double br = MagnetGrades.byName("N42").remanenceAt(40);
        assertEquals(br * 0.02 / (0.02 + 1.05 * 0.017), f.gapFluxDensity1dT(), 1e-12);
        assertEquals(0.017, f.effectiveGapM(), 1e-15);
        assertEquals(1.0, f.carterCoefficient(), 0.0);
        double tauC = 2 * Math.PI * 0.12 / 12;
        assertEquals(0.046 / tauC, f.poleArcRatio(), 1e-12);
        double centreEstimate = 2 / Math.PI * f.fundamentalAmplitude2dT() * tauC * 0.05;
        assertEquals(centreEstimate, f.fluxPerPoleWb(), 0.03 * centreEstimate);
        assertTrue(f.leakageRatio() < 0.95, "a 17 mm gap on a 63 mm pole pitch leaks: " + f.leakageRatio());
        assertTrue(f.fluxPerPoleWb() < f.fluxPerPole1dWb());
        assertEquals(a.magnetVolumeM3(12) * 7500, f.magnetMassKg(), 1e-12);
        assertTrue(f.fieldEvaluation().contains("coil layer"));
    }

    @Test
    void axial_flux_per_pole_matches_an_independent_midpoint_rule_integral_over_radius() {
        // local pole pitch tau(r) = 2 pi r / 2p and local pole-arc ratio w / tau(r), 20000 strips
        AxialDualRotor a = AxialDualRotorTest.sample();
        GapField f = GapFieldCalculator.solve(a, 12, 0, 20);
        double gapHalf = a.magneticGapM() / 2;
        double sum1d = 0;
        double sum2d = 0;
        int n = 20000;
        double dr = a.magnetLengthM() / n;
        for (int i = 0; i < n; i++) {
            double r = a.innerRadiusM() + (i + 0.5) * dr;
            double tau = 2 * Math.PI * r / 12;
            double alpha = Math.min(1, a.magnetWidthM() / tau);
            sum1d += 2 / Math.PI * HarmonicGapField.squareWaveFundamentalT(f.gapFluxDensity1dT(), alpha) * tau * dr;
            sum2d += 2 / Math.PI * HarmonicGapField.normalFluxDensityT(1, f.remanenceAtTempT(), 1.05, alpha, tau,
                    a.magnetThicknessM(), gapHalf, a.coilLayerThicknessM() / 2) * tau * dr;
        }
        assertEquals(sum1d, f.fluxPerPole1dWb(), 1e-7 * sum1d);
        assertEquals(sum2d, f.fluxPerPoleWb(), 1e-7 * sum2d);
    }

    @Test
    void with_a_tiny_gap_on_a_long_pole_pitch_the_two_d_peak_is_the_one_d_flat_top() {
        // tau_p / g = 15700: the series needs very many orders to converge at the pole centre
        RadialSurfaceRotor r = new RadialSurfaceRotor(RotorSide.OUTER, "N40", 1.0, 0.1, 0.0001, 0.005, 0.8, 0);
        GapField f = GapFieldCalculator.solve(r, 2, 1, 20);
        assertEquals(f.gapFluxDensity1dT(), f.peakFluxDensity2dT(), 1e-3 * f.gapFluxDensity1dT());
    }

    @Test
    void warns_when_the_magnets_run_too_hot() {
        GapField f = GapFieldCalculator.solve(AxialDualRotorTest.sample(), 12, 9, 95);
        assertEquals(1, f.warnings().size());
        assertTrue(f.warnings().get(0).contains("irreversible demagnetisation"));
    }

    @Test
    void refuses_bad_arguments_naming_each() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> GapFieldCalculator.solve(RadialSurfaceRotorTest.inner(), 7, 0, 500));
        String m = e.getMessage();
        assertTrue(m.contains("poles = 7: must be even"), m);
        assertTrue(m.contains("slots = 0: must be between 1 and 2000"), m);
        assertTrue(m.contains("magnetTempC = 500.0: must be between -60.0 and 300.0"), m);
        InvalidInputException missing = assertThrows(InvalidInputException.class,
                () -> GapFieldCalculator.solve(null, 0, 1, 20));
        assertTrue(missing.getMessage().contains("rotor is missing"), missing.getMessage());
        assertTrue(missing.getMessage().contains("poles = 0: must be between 2 and 1000"), missing.getMessage());
    }

    @Test
    void refuses_a_slot_opening_wider_than_the_slot_pitch() {
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class,
                () -> GapFieldCalculator.solve(RadialSurfaceRotorTest.inner(), 10, 200, 20));
        assertEquals("slotOpeningM", e.field());
        assertTrue(e.getMessage().contains("slot pitch"), e.getMessage());
    }

    @Test
    void refuses_overlapping_axial_magnets_naming_the_width() {
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class,
                () -> GapFieldCalculator.solve(AxialDualRotorTest.sample(), 20, 0, 20));
        assertEquals("magnetWidthM", e.field());
    }
}
