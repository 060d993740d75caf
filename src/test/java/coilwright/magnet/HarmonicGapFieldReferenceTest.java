package coilwright.magnet;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Independent checks of the 2-D harmonic gap-field solution: the 1-D magnetic-circuit limit, and a finite-volume
 * solution of the same 2-D linear magnetostatic problem (scalar potential, SOR) written here from scratch.
 */
class HarmonicGapFieldReferenceTest {

    @Test
    @DisplayName("tau_p/g = 1000: the 2-D fundamental equals the 1-D square-wave fundamental within 1e-4 (limit k -> 0)")
    void two_d_solution_tends_to_the_one_d_magnetic_circuit_for_long_pole_pitches() {
        double brT = 1.3;
        double mu = 1.05;
        double alpha = 0.8;
        double gM = 0.001;
        double lmM = 0.004;
        double tauM = 1000 * gM;
        double bg1dT = brT * lmM / (lmM + mu * gM);
        double expected = HarmonicGapField.squareWaveFundamentalT(bg1dT, alpha);
        double b1 = HarmonicGapField.normalFluxDensityT(1, brT, mu, alpha, tauM, lmM, gM, 0.0);
        assertEquals(expected, b1, 1e-4 * expected);
    }

    @Test
    @DisplayName("DESIGN.md form Br_v sinh(k lm)/(mu cosh(k lm) sinh(k g) + sinh(k lm) cosh(k g)) agrees with the overflow-safe form")
    void stable_form_equals_the_textbook_form() {
        double brT = 1.2;
        double mu = 1.05;
        double alpha = 0.7;
        double tauM = 0.03;
        double lmM = 0.005;
        double gM = 0.002;
        for (int v = 1; v <= 25; v += 2) {
            double k = v * Math.PI / tauM;
            double brv = HarmonicGapField.remanenceHarmonicT(v, brT, alpha);
            double textbook = brv * Math.sinh(k * lmM)
                    / (mu * Math.cosh(k * lmM) * Math.sinh(k * gM) + Math.sinh(k * lmM) * Math.cosh(k * gM));
            double got = HarmonicGapField.normalFluxDensityT(v, brT, mu, alpha, tauM, lmM, gM, 0.0);
            assertEquals(textbook, got, 1e-12 + 1e-12 * Math.abs(textbook), "order " + v);
        }
    }

    @Test
    @DisplayName("independent finite-volume solve, magnet on iron facing iron (tau_p/g = 10): fundamental and pole-centre peak within 0.1 %")
    void finite_volume_solution_agrees_for_magnet_facing_iron() {
        double brT = 1.25;
        double mu = 1.05;
        double alpha = 0.7;
        double tauM = 0.020;
        double lmM = 0.003;
        double gM = 0.002;
        double hM = 0.00005;
        FiniteVolumeMagnetField fv = FiniteVolumeMagnetField.singleSided(brT, mu, alpha, tauM, lmM, gM, hM, true);
        double b1Fv = fv.fundamentalAtTopIronT();
        double b1 = HarmonicGapField.normalFluxDensityT(1, brT, mu, alpha, tauM, lmM, gM, 0.0);
        assertEquals(b1Fv, b1, 0.001 * b1Fv);
        double peak = 0;
        for (int v = 1; v <= GapFieldCalculator.PEAK_MAX_ORDER; v += 2) {
            peak += HarmonicGapField.normalFluxDensityT(v, brT, mu, alpha, tauM, lmM, gM, 0.0);
        }
        assertEquals(fv.poleCentreAtTopIronT(), peak, 0.001 * peak);
        // the 2-D result must show leakage against the 1-D circuit here, or this case tests nothing
        double b11d = HarmonicGapField.squareWaveFundamentalT(brT * lmM / (lmM + mu * gM), alpha);
        assertTrue(b1 < 0.97 * b11d, "leakage visible: " + b1 + " vs " + b11d);
    }

    @Test
    @DisplayName("finite-volume solve with air (not recoil material) between magnets stays within 0.5 % of the harmonic model (mu_rec = 1.05)")
    void harmonic_model_is_close_when_the_interpolar_gap_is_air() {
        double brT = 1.25;
        double mu = 1.05;
        double alpha = 0.7;
        double tauM = 0.020;
        double lmM = 0.003;
        double gM = 0.002;
        FiniteVolumeMagnetField fv = FiniteVolumeMagnetField.singleSided(brT, mu, alpha, tauM, lmM, gM, 0.00005, false);
        double b1 = HarmonicGapField.normalFluxDensityT(1, brT, mu, alpha, tauM, lmM, gM, 0.0);
        assertEquals(fv.fundamentalAtTopIronT(), b1, 0.005 * b1);
    }

    @Test
    @DisplayName("finite-volume solve of a whole dual rotor (two magnet discs, air-cored layer): mid-plane symmetry and coil-layer average within 0.1 %")
    void finite_volume_solution_agrees_for_a_symmetric_dual_rotor() {
        double brT = 1.3;
        double mu = 1.05;
        double alpha = 0.75;
        double tauM = 0.024;
        double lmM = 0.004;
        double gapTotalM = 0.008;
        double coilLayerM = 0.006;
        FiniteVolumeMagnetField fv = FiniteVolumeMagnetField.dual(brT, mu, alpha, tauM, lmM, gapTotalM, 0.0001);
        double midPlane = HarmonicGapField.normalFluxDensityT(1, brT, mu, alpha, tauM, lmM, gapTotalM / 2, 0.0);
        assertEquals(fv.fundamentalAtHeightT(lmM + gapTotalM / 2), midPlane, 0.001 * midPlane);
        double averaged = HarmonicGapField.normalFluxDensityT(1, brT, mu, alpha, tauM, lmM, gapTotalM / 2,
                coilLayerM / 2);
        double fvAverage = fv.fundamentalAveragedT(lmM + gapTotalM / 2 - coilLayerM / 2,
                lmM + gapTotalM / 2 + coilLayerM / 2);
        assertEquals(fvAverage, averaged, 0.001 * averaged);
        assertTrue(averaged > midPlane * 1.01, "the coil layer sees more than the mid-plane field");
    }
}
