package coilwright.losses;

import coilwright.conductor.Copper;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class ConductorEddyLossReferenceTest {

    @Test
    @DisplayName("Sullivan (1999): 1 mm copper wire, 0.5 T peak at 100 Hz, 20 C: pi d^4 w^2 B^2 / (128 rho) = 0.1405 W/m")
    void sullivan_formula_by_hand() {
        // source: Sullivan, IEEE Trans. Power Electron. 14(2), 1999, eq. for round-wire eddy loss; by hand:
        // pi * 1e-12 * (628.32)^2 * 0.25 / (128 * 1.7241e-8) = 0.14050 W/m
        double w = ConductorEddyLoss.perMetreW(1e-3, 0.5, 2 * Math.PI * 100, Copper.RESISTIVITY_20C_OHM_M);
        assertEquals(0.14050, w, 0.0001);
    }

    @Test
    @DisplayName("The formula equals the integral of J^2 / sigma over the wire with J = sigma x dB/dt (low frequency)")
    void formula_equals_the_integral_of_the_induced_current() {
        // source: Faraday's law in a round conductor in a uniform transverse field (e.g. Lammeraner & Stafl,
        // "Eddy Currents", 1966): E_z = x dB/dt, J = sigma E_z; mean of (dB/dt)^2 = omega^2 B^2 / 2
        double d = 1.6e-3;
        double b = 0.4;
        double omega = 2 * Math.PI * 60;
        double rho = Copper.resistivityOhmM(75);
        double r = d / 2;
        IterativeLegendreGaussIntegrator gauss = new IterativeLegendreGaussIntegrator(8, 1e-12, 1e-20);
        // integral over the disc of x^2 dA = integral over x of x^2 * 2 sqrt(r^2 - x^2) dx
        double secondMoment = gauss.integrate(100_000, x -> x * x * 2 * Math.sqrt(Math.max(0, r * r - x * x)), -r, r);
        double integral = secondMoment * omega * omega * b * b / 2 / rho;
        assertEquals(integral, ConductorEddyLoss.perMetreW(d, b, omega, rho), 1e-6 * integral);
    }

    @Test
    @DisplayName("Copper skin depth at 50 Hz, 20 C is 9.3 mm (sqrt(2 rho / (omega mu0)))")
    void skin_depth() {
        // source: standard skin-depth formula; copper at 50 Hz about 9.3 mm (textbook value)
        assertEquals(9.35e-3, ConductorEddyLoss.skinDepthM(50, Copper.RESISTIVITY_20C_OHM_M), 0.05e-3);
    }
}
