package coilwright.conductor;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.analysis.integration.UnivariateIntegrator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Checks of the inductance formulas against independent numerical calculations: Maxwell's mutual
 * inductance of coaxial circles (itself checked against the Neumann double integral) summed over the
 * filaments of a coil, with Maxwell's geometric-mean-distance method for the self terms; and the stored
 * field energy of a sinusoidal MMF for the magnetizing inductance.
 */
class InductanceEstimateReferenceTest {
    private static final double MU0 = 4e-7 * Math.PI;
    private static final UnivariateIntegrator INTEGRATOR = new IterativeLegendreGaussIntegrator(16, 1e-12, 1e-14);

    /** Complete elliptic integrals K and E of modulus k by the arithmetic-geometric mean. */
    private static double[] ellipticKE(double k) {
        double a = 1.0;
        double b = Math.sqrt(1.0 - k * k);
        double c = k;
        double sum = 0.5 * c * c;
        double pow = 0.5;
        while (Math.abs(c) > 1e-16) {
            double an = (a + b) / 2.0;
            double bn = Math.sqrt(a * b);
            c = (a - b) / 2.0;
            a = an;
            b = bn;
            pow *= 2.0;
            sum += pow * c * c;
        }
        double kk = Math.PI / (2.0 * a);
        return new double[] {kk, kk * (1.0 - sum)};
    }

    /** Maxwell's formula for the mutual inductance of coaxial circles of radii r1, r2 a distance z apart, H. */
    private static double maxwellMutualH(double r1, double r2, double z) {
        double k = Math.sqrt(4.0 * r1 * r2 / ((r1 + r2) * (r1 + r2) + z * z));
        double[] ke = ellipticKE(k);
        return MU0 * Math.sqrt(r1 * r2) * ((2.0 / k - k) * ke[0] - 2.0 / k * ke[1]);
    }

    /** Neumann's double integral for the same pair, reduced to one angle and integrated numerically. */
    private static double neumannMutualH(double r1, double r2, double z) {
        double integral = INTEGRATOR.integrate(100_000, phi -> Math.cos(phi)
                / Math.sqrt(r1 * r1 + r2 * r2 - 2 * r1 * r2 * Math.cos(phi) + z * z), 0.0, 2.0 * Math.PI);
        return MU0 * r1 * r2 / 2.0 * integral;
    }

    /**
     * Coil of N turns, mean radius a, axial length b, radial depth c, as n x n filaments; self terms by
     * the geometric mean distance of a rectangle from itself, 0.2235 * (w + h) (Maxwell).
     */
    private static double filamentCoilH(double turns, double a, double b, double c, int n) {
        double w = c / n;
        double h = b / n;
        double gmd = 0.2235 * (w + h);
        double t = turns / (n * n);
        double sum = 0.0;
        for (int i = 0; i < n * n; i++) {
            double ri = a - c / 2 + w * (i % n + 0.5);
            double zi = h * (i / n + 0.5);
            for (int j = 0; j < n * n; j++) {
                double rj = a - c / 2 + w * (j % n + 0.5);
                double zj = h * (j / n + 0.5);
                sum += i == j ? maxwellMutualH(ri, ri, gmd) : maxwellMutualH(ri, rj, zi - zj);
            }
        }
        return t * t * sum;
    }

    @Test
    @DisplayName("Maxwell's elliptic-integral formula agrees with the Neumann integral (test helper check)")
    void maxwell_formula_agrees_with_neumann_integral() {
        assertEquals(neumannMutualH(0.05, 0.04, 0.01), maxwellMutualH(0.05, 0.04, 0.01), 1e-6 * maxwellMutualH(0.05, 0.04, 0.01));
        assertEquals(neumannMutualH(0.1, 0.1, 0.002), maxwellMutualH(0.1, 0.1, 0.002), 1e-6 * maxwellMutualH(0.1, 0.1, 0.002));
    }

    // Wheeler (Proc. IRE 1928) states about 1 % accuracy when 6a, 9b and 10c are of similar size; the
    // tolerance here is 2 % to allow for the filament model's own discretisation error.
    @ParameterizedTest(name = "a = {1} m, b = {2} m, c = {3} m")
    @CsvSource({"100, 0.05, 0.02, 0.02", "50, 0.03, 0.02, 0.015", "200, 0.04, 0.012, 0.02"})
    @DisplayName("Wheeler's multilayer formula matches a filament calculation within 2 %")
    void wheeler_matches_filament_sum(double turns, double a, double b, double c) {
        double numeric = filamentCoilH(turns, a, b, c, 14);
        assertEquals(numeric, InductanceEstimate.wheelerMultilayerH(turns, a, b, c), 0.02 * numeric);
    }

    /** L = 2W / sum(i^2) with W the air-gap field energy of m sinusoidally distributed phases. */
    private static double energyMagnetizingH(SlottedInductanceInput in) {
        int m = in.phases();
        double p = in.polePairs();
        double amp = 4.0 / Math.PI * in.windingFactor() * in.seriesTurnsPerPhase() / (2.0 * p);
        double[] currents = new double[m];
        double sumI2 = 0.0;
        for (int k = 0; k < m; k++) {
            currents[k] = Math.cos(2.0 * Math.PI * k / m);
            sumI2 += currents[k] * currents[k];
        }
        double g = in.effectiveAirGapM();
        double energy = INTEGRATOR.integrate(1_000_000, theta -> {
            double mmf = 0.0;
            for (int k = 0; k < m; k++) {
                mmf += amp * currents[k] * Math.cos(p * theta - 2.0 * Math.PI * k / m);
            }
            double bGap = MU0 * mmf / g;
            return bGap * bGap / (2.0 * MU0) * g * in.stackLengthM() * in.airGapRadiusM();
        }, 0.0, 2.0 * Math.PI);
        return 2.0 * energy / sumI2;
    }

    @ParameterizedTest(name = "m = {0}, p = {1}")
    @CsvSource({"3, 4", "3, 7", "1, 5", "5, 3"})
    @DisplayName("magnetizing inductance equals the field-energy value 2W / sum(i^2) of the fundamental MMF")
    void magnetizing_inductance_matches_field_energy(int m, int p) {
        SlottedInductanceInput in = new SlottedInductanceInput(m, p, 12 * m, 120, 0.933, 0.06, 0.04, 0.004,
                0.012, 0.006, 0.001, 0.003, 0.05, 0.3);
        double numeric = energyMagnetizingH(in);
        assertEquals(numeric, InductanceEstimate.magnetizingInductanceH(in), 1e-6 * numeric);
    }

    @Test
    @DisplayName("slot permeance h/(3b) equals the magnetic energy of a uniformly filled rectangular slot")
    void slot_permeance_matches_slot_field_energy() {
        double h = 0.015;
        double b = 0.005;
        // H(y) = (y/h) * I / b for unit ampere-turns; energy per metre W' = mu0/2 * integral(H^2 * b dy)
        double energy = INTEGRATOR.integrate(100_000, y -> MU0 / 2.0 * Math.pow(y / h / b, 2) * b, 0.0, h);
        double lambdaNumeric = 2.0 * energy / MU0;
        SlottedInductanceInput in = new SlottedInductanceInput(3, 2, 12, 100, 0.9, 0.05, 0.1, 0.003,
                h, b, 0.0, b, 0.0, 0.0);
        double expected = 4.0 * 3 / 12 * MU0 * 0.1 * 100 * 100 * lambdaNumeric;
        assertEquals(expected, InductanceEstimate.slotLeakageInductanceH(in), 1e-9 * expected);
    }
}
