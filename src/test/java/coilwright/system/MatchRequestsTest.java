package coilwright.system;

import coilwright.machine.SampleDesigns;
import coilwright.turbine.HydroSite;
import coilwright.turbine.PenstockSpec;
import coilwright.turbine.PipeMaterial;
import coilwright.turbine.Weibull;
import coilwright.turbine.Rayleigh;
import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The input records of matching: every bad value named by its field. */
class MatchRequestsTest {

    private static List<String> fields(Executable e) {
        return assertThrows(InvalidInputException.class, e).errors().stream().map(FieldError::field).toList();
    }

    @Test
    void a_wind_site_takes_isa_density_unless_one_is_entered() {
        assertEquals(1.225, WindSite.standard().effectiveAirDensityKgM3(), 1e-3);
        assertEquals(1.1, new WindSite(2000, 5, 1.1).effectiveAirDensityKgM3(), 0.0);
        assertEquals(List.of("altitudeM", "airDensityKgM3"), fields(() -> new WindSite(20_000, 15, 3)));
        assertEquals(List.of("airDensityKgM3"), fields(() -> new WindSite(0, 15, 0.2)));
    }

    @Test
    void a_wind_regime_of_shape_two_is_rayleigh_and_others_weibull_with_the_same_mean() {
        assertInstanceOf(Rayleigh.class, WindRegime.rayleigh(5).distribution());
        Weibull w = assertInstanceOf(Weibull.class, new WindRegime(6, 2.5).distribution());
        assertEquals(6.0, w.meanWindSpeedMs(), 1e-9);
        assertEquals(List.of("meanWindSpeedMs", "weibullShapeK"), fields(() -> new WindRegime(0, 7)));
    }

    @Test
    void the_wind_request_wants_a_top_speed_of_25_to_40_in_half_steps() {
        assertEquals(List.of("maxWindSpeedMs"), fields(() -> new WindMatchRequest(SampleDesigns.axial24V(),
                MatchFixtures.BATTERY_24V, MatchFixtures.rotor(), WindSite.standard(), WindRegime.rayleigh(5), 20)));
        assertEquals(List.of("maxWindSpeedMs"), fields(() -> new WindMatchRequest(SampleDesigns.axial24V(),
                MatchFixtures.BATTERY_24V, MatchFixtures.rotor(), WindSite.standard(), WindRegime.rayleigh(5), 30.2)));
        assertEquals(61, new WindMatchRequest(SampleDesigns.axial24V(), MatchFixtures.BATTERY_24V, MatchFixtures.rotor(),
                WindSite.standard(), WindRegime.rayleigh(5), 30).windSpeedsMs().length);
        assertTrue(fields(() -> new WindMatchRequest(null, null, null, null, null, 25)).containsAll(
                List.of("alternator", "load", "rotor", "site", "wind")));
    }

    @Test
    void a_runner_needs_a_diameter_or_a_target_speed_within_its_kind() {
        assertEquals(List.of("targetSpeedRpm"), fields(() -> new RunnerDesign(RunnerKind.IMPULSE, 2, 0, 0, 0)));
        assertEquals(List.of("jetCount"), fields(() -> new RunnerDesign(RunnerKind.TURGO, 4, 0.3, 0, 0)));
        assertEquals(List.of("diameterM"), fields(() -> new RunnerDesign(RunnerKind.CROSSFLOW, 1, 2.5, 0, 0)));
        assertEquals(List.of("diameterM", "peakEfficiency"), fields(() -> new RunnerDesign(RunnerKind.IMPULSE, 1, -0.1, 500, 0.99)));
        assertEquals(0.70, new RunnerDesign(RunnerKind.CROSSFLOW, 1, 0.3, 0, 0).effectivePeakEfficiency(), 0.0);
    }

    @Test
    void a_target_speed_no_runner_can_meet_is_infeasible_on_that_field() {
        var e = assertThrows(coilwright.validation.InfeasibleDesignException.class,
                () -> new RunnerDesign(RunnerKind.IMPULSE, 1, 0, 1, 0).at(100, 0.01));
        assertEquals("runner.targetSpeedRpm", e.field());
    }

    @Test
    void the_hydro_request_checks_the_head_against_the_runner_kind_and_the_drive() {
        PenstockSpec pipe = PenstockSpec.of(100, 0.1, PipeMaterial.PVC, 1);
        RunnerDesign crossflow = new RunnerDesign(RunnerKind.CROSSFLOW, 1, 0.3, 0, 0);
        assertEquals(List.of("driveRatio", "drivetrainEfficiency", "site.grossHeadM"),
                fields(() -> new HydroMatchRequest(SampleDesigns.axial24V(), MatchFixtures.BATTERY_48V,
                        new HydroSite(300, 0.01), pipe, crossflow, 0, 1.2, 10)));
        assertEquals(List.of("site.designFlowM3s"), fields(() -> new HydroMatchRequest(SampleDesigns.axial24V(),
                MatchFixtures.BATTERY_48V, new HydroSite(30, 20), pipe, crossflow, 1, 1, 10)));
    }
}
