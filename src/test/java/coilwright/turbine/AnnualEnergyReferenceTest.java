package coilwright.turbine;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import java.util.function.DoubleUnaryOperator;

import static org.junit.jupiter.api.Assertions.*;

/** The method of bins, IEC 61400-12-1 (ed. 2, 2017) clause 9.3, against exact and integrated values. */
class AnnualEnergyReferenceTest {

    @Test
    @DisplayName("IEC 61400-12-1 bin sum with a constant power curve is exactly P x 8760 x (F(vmax) - F(0))")
    void constant_power_curve_is_exact() {
        Weibull w = Weibull.fromMean(1.8, 6.0);
        AnnualEnergyResult r = AnnualEnergy.binMethod(v -> 500.0, w, 0.5, 25, 500);
        double expected = 500.0 * 8760 * (w.cdf(25) - w.cdf(0)) / 1000.0;
        assertEquals(expected, r.annualEnergyKWh(), 1e-9);
    }

    /** Cut-in 3 m/s, cubic to 1500 W rated at 12 m/s: a smooth power curve of a small turbine. */
    private static final DoubleUnaryOperator POWER = v -> v < 3 ? 0 : Math.min(1500, 1500 * (v * v * v - 27) / (1728 - 27));

    private static double integratedKWh(WindDistribution d) {
        double integral = new IterativeLegendreGaussIntegrator(5, 1e-10, 1e-12)
                .integrate(1_000_000, v -> POWER.applyAsDouble(v) * d.pdf(v), 0, 25);
        return integral * 8760 / 1000;
    }

    @Test
    @DisplayName("Bin method agrees with direct integration of P(v) pdf(v) within 0.5 % (Legendre-Gauss, Commons Math)")
    void bin_sum_matches_direct_integration() {
        for (WindDistribution d : new WindDistribution[] {new Rayleigh(5.5), new Rayleigh(7), Weibull.fromMean(2.6, 6)}) {
            double expectedKWh = integratedKWh(d);
            double got = AnnualEnergy.binMethod(POWER, d, 1500).annualEnergyKWh();
            assertEquals(expectedKWh, got, 0.005 * expectedKWh, d.toString());
        }
    }

    @Test
    @DisplayName("The trapezoid error shrinks as the bin width squared (about 0.7 % at 0.5 m/s bins for a 4.5 m/s site)")
    void bin_error_is_second_order_in_bin_width() {
        Rayleigh calm = new Rayleigh(4.5);
        double exact = integratedKWh(calm);
        double coarse = AnnualEnergy.binMethod(POWER, calm, 0.5, 25, 1500).annualEnergyKWh() - exact;
        double fine = AnnualEnergy.binMethod(POWER, calm, 0.25, 25, 1500).annualEnergyKWh() - exact;
        assertTrue(Math.abs(coarse) < 0.01 * exact, "coarse error " + coarse);
        assertEquals(0.25, fine / coarse, 0.03);
    }
}
