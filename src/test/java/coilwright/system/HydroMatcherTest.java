package coilwright.system;

import coilwright.safety.Caution;
import coilwright.turbine.FlowDurationPoint;
import coilwright.turbine.HydroSite;
import coilwright.turbine.ImpulseRunner;
import coilwright.validation.InfeasibleDesignException;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class HydroMatcherTest {
    private static HydroMatchResult result;

    @BeforeAll
    static void match() {
        result = HydroMatcher.match(MatchFixtures.hydroRequest(MatchFixtures.site(), MatchFixtures.impulseFor(400)));
    }

    @Test
    void the_runner_is_sized_for_the_target_speed_at_the_net_head() {
        double net = result.penstock().netHeadM();
        assertTrue(net < 25.0 && net > 15.0, "net head " + net);
        ImpulseRunner expected = ImpulseRunner.forTargetSpeed(net, 0.015, 2, 400);
        assertEquals(expected.pitchCircleDiameterM(), result.runnerDiameterM(), 1e-12);
        assertEquals(400.0, result.optimumRunnerSpeedRpm(), 1e-9);
        assertEquals(800.0, result.runawayRunnerSpeedRpm(), 1e-9);
        assertEquals(0.98 * Math.sqrt(2 * 9.80665 * net), result.jetVelocityMs(), 1e-9);
        assertEquals(1000 * 9.80665 * 0.015 * net, result.hydraulicPowerW(), 1e-6);
    }

    @Test
    void the_matched_point_balances_runner_torque_against_the_alternator_and_conserves_energy() {
        HydroOperatingPoint m = result.matched();
        assertTrue(m.powerToBatteryW() > 0);
        assertTrue(m.runnerSpeedRpm() < result.runawayRunnerSpeedRpm());
        SpeedPoint alt = AlternatorEvaluator.point(MatchFixtures.AXIAL, MatchFixtures.BATTERY_48V, m.alternatorSpeedRpm());
        assertEquals(alt.shaftPowerW(), m.runnerPowerW() * 0.95, 1e-6 * alt.shaftPowerW());
        assertEquals(m.runnerPowerW(), m.powerToBatteryW() + m.totalLossW(), 1e-6 * m.runnerPowerW());
        assertEquals(m.powerToBatteryW() * 24 / 1000, result.dailyEnergyKWh(), 1e-12);
    }

    @Test
    void the_runaway_voltage_heads_the_cautions() {
        assertEquals(800.0, result.runawayAlternatorSpeedRpm(), 1e-9);
        assertEquals(MatchFixtures.AXIAL.emfLineRmsV(800.0), result.openCircuitLineRmsVAtRunaway(), 1e-9);
        Caution first = result.cautions().get(0);
        assertEquals("OPEN_CIRCUIT_VOLTAGE", first.code());
        assertEquals(Caution.Severity.DANGER, first.severity());
        assertTrue(first.message().contains("runaway"), first.message());
    }

    @Test
    void without_a_flow_duration_curve_there_is_no_annual_energy() {
        assertTrue(result.annualEnergyKWh().isEmpty());
    }

    @Test
    void a_flow_duration_curve_at_the_design_flow_all_year_gives_365_days_of_output() {
        HydroSite steady = new HydroSite(25.0, 0.015, List.of(new FlowDurationPoint(0.02, 0), new FlowDurationPoint(0.015, 100)));
        HydroMatchResult r = HydroMatcher.match(MatchFixtures.hydroRequest(steady, MatchFixtures.impulseFor(400)));
        assertEquals(365 * r.dailyEnergyKWh() * 8760 / (365 * 24), r.annualEnergyKWh().orElseThrow(), 1e-6);
    }

    @Test
    void less_water_part_of_the_year_gives_less_energy() {
        HydroSite dry = new HydroSite(25.0, 0.015, List.of(new FlowDurationPoint(0.015, 0), new FlowDurationPoint(0.005, 100)));
        HydroMatchResult r = HydroMatcher.match(MatchFixtures.hydroRequest(dry, MatchFixtures.impulseFor(400)));
        assertTrue(r.annualEnergyKWh().orElseThrow() < 365 * r.dailyEnergyKWh());
        assertTrue(r.annualEnergyKWh().orElseThrow() > 0);
    }

    @Test
    void the_runner_line_falls_to_zero_at_runaway_and_peaks_at_the_optimum() {
        var curve = result.runnerCurve();
        assertEquals(0.0, curve.get(curve.size() - 1).torqueNm(), 1e-12);
        RunnerCurvePoint mid = curve.get((curve.size() - 1) / 2);
        assertEquals(400.0, mid.runnerSpeedRpm(), 1e-9);
        assertEquals(result.peakShaftPowerW(), mid.powerW(), 1e-9 * result.peakShaftPowerW());
        assertFalse(result.alternatorCurve().isEmpty());
    }

    @Test
    void a_runner_that_cannot_reach_cut_in_free_spins_and_says_so() {
        HydroSite low = new HydroSite(1.5, 0.004, List.of());
        HydroMatchResult r = HydroMatcher.match(MatchFixtures.hydroRequest(low, new RunnerDesign(RunnerKind.CROSSFLOW, 1, 0.6, 0, 0)));
        assertTrue(r.matched().flags().contains(MatchFlag.FREE_SPINNING));
        assertEquals(r.runawayRunnerSpeedRpm(), r.matched().runnerSpeedRpm(), 1e-9);
        assertTrue(r.warnings().stream().anyMatch(w -> w.contains("does not cut in")));
    }

    @Test
    void a_penstock_that_eats_the_head_is_infeasible() {
        HydroSite thirsty = new HydroSite(5.0, 0.2, List.of());
        assertThrows(InfeasibleDesignException.class,
                () -> HydroMatcher.match(MatchFixtures.hydroRequest(thirsty, MatchFixtures.impulseFor(400))));
    }
}
