package coilwright.system;

import coilwright.machine.SampleDesigns;
import coilwright.safety.Caution;
import coilwright.turbine.AirDensity;
import coilwright.turbine.EnergyBin;
import coilwright.turbine.ParametricCp;
import coilwright.turbine.Rayleigh;
import coilwright.turbine.SmallWindClass;
import coilwright.turbine.WindRotor;
import coilwright.validation.InfeasibleDesignException;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class WindMatchingTest {
    private static WindMatchResult result;

    @BeforeAll
    static void match() {
        result = WindMatching.match(MatchFixtures.windRequest(MatchFixtures.rotor()));
    }

    @Test
    void the_table_runs_from_still_air_to_25_m_s_in_half_metre_steps() {
        assertEquals(51, result.points().size());
        assertEquals(0.0, result.points().get(0).windSpeedMs(), 0.0);
        assertEquals(12.5, result.points().get(25).windSpeedMs(), 0.0);
        assertEquals(25.0, result.points().get(50).windSpeedMs(), 0.0);
    }

    @Test
    void the_annual_energy_is_the_trapezoid_bin_sum_of_the_battery_power_curve() {
        Rayleigh wind = new Rayleigh(5.0);
        double sum = 0;
        for (int i = 1; i < result.points().size(); i++) {
            WindMatchPoint a = result.points().get(i - 1);
            WindMatchPoint b = result.points().get(i);
            sum += 8760 * (wind.cdf(b.windSpeedMs()) - wind.cdf(a.windSpeedMs()))
                    * 0.5 * (a.powerToBatteryW() + b.powerToBatteryW()) / 1000;
        }
        assertEquals(sum, result.annualEnergy().annualEnergyKWh(), 1e-9 * sum);
        assertEquals(sum / 365, result.annualEnergy().dailyEnergyKWh(), 1e-9 * sum);
        double rated = result.points().stream().mapToDouble(WindMatchPoint::powerToBatteryW).max().orElseThrow();
        assertEquals(sum * 1000 / 8760 / rated, result.annualEnergy().capacityFactor(), 1e-9);
        assertEquals(50, result.annualEnergy().bins().size());
        EnergyBin first = result.annualEnergy().bins().get(0);
        assertEquals(0.5, first.windSpeedToMs(), 0.0);
    }

    @Test
    void the_matching_percentage_compares_with_the_ideal_rotor_and_stays_within_100() {
        assertTrue(result.matchingPercent() > 0 && result.matchingPercent() <= 100.0 + 1e-9, "" + result.matchingPercent());
        assertTrue(result.idealAnnualEnergyKWh() >= result.annualEnergy().annualEnergyKWh());
        assertEquals(100 * result.annualEnergy().annualEnergyKWh() / result.idealAnnualEnergyKWh(), result.matchingPercent(), 1e-9);
        assertTrue(result.rotorCapturePercent() > 0 && result.rotorCapturePercent() <= 100.0 + 1e-9);
    }

    @Test
    void cut_in_wind_speed_is_the_first_charging_row() {
        double cutIn = result.cutInWindSpeedMs().orElseThrow();
        for (WindMatchPoint p : result.points()) {
            if (p.windSpeedMs() < cutIn) {
                assertEquals(0.0, p.powerToBatteryW(), 0.0);
            }
        }
        assertTrue(cutIn > 0 && cutIn < 5, "cut-in " + cutIn);
    }

    @Test
    void the_density_comes_from_the_isa_and_the_class_from_iec_61400_2() {
        assertEquals(AirDensity.isa(0, 15), result.airDensityKgM3(), 1e-12);
        assertEquals(SmallWindClass.IV, result.windClass().windClass());
    }

    @Test
    void the_open_circuit_voltage_is_checked_at_the_furling_speed() {
        assertEquals(500.0, result.checkSpeedRpm(), 1e-9);
        assertEquals(MatchFixtures.AXIAL.emfLineRmsV(500.0), result.openCircuitLineRmsVAtCheckSpeed(), 1e-9);
        Caution first = result.cautions().get(0);
        assertEquals("OPEN_CIRCUIT_VOLTAGE", first.code());
        assertTrue(first.message().contains("500 rpm"), first.message());
    }

    @Test
    void without_a_speed_limit_the_check_speed_is_free_spinning_at_the_top_wind_speed() {
        WindRotor free = new WindRotor(3.6, 3, new ParametricCp(0.42, 6.5), 0, 1.0, 1.0);
        WindMatchResult r = WindMatching.match(MatchFixtures.windRequest(free));
        assertEquals(free.freeSpinSpeedRpm(25), r.checkSpeedRpm(), 1e-9);
        assertEquals(Caution.Severity.DANGER, r.cautions().get(0).severity());
    }

    @Test
    void a_rotor_governed_below_cut_in_never_charges_and_is_infeasible() {
        WindRotor slow = new WindRotor(3.6, 3, new ParametricCp(0.42, 6.5), 60, 1.0, 1.0);
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class,
                () -> WindMatching.match(MatchFixtures.windRequest(slow)));
        assertEquals("alternator", e.field());
    }

    @Test
    void an_entered_density_is_used_as_given() {
        WindMatchRequest req = new WindMatchRequest(SampleDesigns.axial24V(), MatchFixtures.BATTERY_24V,
                MatchFixtures.rotor(), new WindSite(0, 15, 1.0), new WindRegime(5.0, 2.4), 25);
        WindMatchResult r = WindMatching.match(req);
        assertEquals(1.0, r.airDensityKgM3(), 0.0);
        assertEquals("entered", r.airDensitySource());
        assertTrue(r.annualEnergy().annualEnergyKWh() < result.annualEnergy().annualEnergyKWh());
    }
}
