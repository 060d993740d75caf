package coilwright.turbine;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class AnnualEnergyTest {

    @Test
    void makes_half_metre_bins_to_25_by_default() {
        AnnualEnergyResult r = AnnualEnergy.binMethod(v -> 100 * v, new Rayleigh(5), 1000);
        assertEquals(50, r.bins().size());
        assertEquals(0.0, r.bins().get(0).windSpeedFromMs());
        assertEquals(25.0, r.bins().get(49).windSpeedToMs(), 1e-12);
        assertEquals(75.0, r.bins().get(1).meanPowerW(), 1e-12);
    }

    @Test
    void bins_add_up_to_the_total_and_daily_and_capacity_factor_follow() {
        AnnualEnergyResult r = AnnualEnergy.binMethod(v -> Math.min(1000, 2 * v * v * v), new Rayleigh(5.5), 1000);
        double sum = r.bins().stream().mapToDouble(EnergyBin::energyKWh).sum();
        assertEquals(sum, r.annualEnergyKWh(), 1e-9);
        assertEquals(r.annualEnergyKWh() / 365, r.dailyEnergyKWh(), 1e-12);
        assertEquals(r.annualEnergyKWh() / (1.0 * 8760), r.capacityFactor(), 1e-12);
        assertTrue(r.capacityFactor() > 0 && r.capacityFactor() < 1);
    }

    @Test
    void more_mean_wind_gives_more_energy() {
        assertTrue(AnnualEnergy.binMethod(v -> v * v * v, new Rayleigh(6), 1000).annualEnergyKWh()
                > AnnualEnergy.binMethod(v -> v * v * v, new Rayleigh(5), 1000).annualEnergyKWh());
    }

    @Test
    void rejects_a_power_curve_that_returns_nan() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> AnnualEnergy.binMethod(v -> v > 10 ? Double.NaN : 1, new Rayleigh(5), 100));
        assertEquals("powerCurveW", e.errors().get(0).field());
        assertTrue(e.getMessage().contains("windSpeedMs = 10.5"), e.getMessage());
    }

    @Test
    void rejects_bad_bin_width_and_rated_power() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> AnnualEnergy.binMethod(v -> 1, new Rayleigh(5), 0, 25, -5));
        assertEquals("binWidthMs", e.errors().get(0).field());
        assertEquals("ratedPowerW", e.errors().get(1).field());
    }
}
