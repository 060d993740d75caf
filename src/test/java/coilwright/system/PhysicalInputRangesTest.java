package coilwright.system;

import coilwright.machine.SampleDesigns;
import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Regressions: admitted but absurd numbers once reached the model and came back as 500s or as 400s about internal
 * fields (phaseInductanceH = 1e-200, drivetrainEfficiency = 5e-324, measured Ke = 1e-12 giving "frequencyHz =
 * 2.4E12"). Each is now refused where the user typed it, naming that field and its physical range.
 */
class PhysicalInputRangesTest {

    private static FieldError only(InvalidInputException e) {
        assertEquals(1, e.errors().size(), e.errors().toString());
        return e.errors().get(0);
    }

    @Test
    void an_entered_phase_inductance_below_a_microhenry_is_refused_by_name() {
        FieldError e = only(assertThrows(InvalidInputException.class,
                () -> SampleDesigns.axial24V().withPhaseInductanceH(1e-200)));
        assertEquals("phaseInductanceH", e.field());
        assertTrue(e.allowed().contains("1.0E-6 to 10"), e.allowed());
    }

    @Test
    void a_measured_ke_below_a_tenth_of_a_millivolt_per_rpm_is_refused_by_name() {
        FieldError e = only(assertThrows(InvalidInputException.class,
                () -> SampleDesigns.axial24V().withMeasuredKeLineVPerRpm(1e-12)));
        assertEquals("measuredKeLineVPerRpm", e.field());
        assertTrue(e.allowed().contains("1.0E-4 to 100"), e.allowed());
    }

    @Test
    void zero_still_asks_for_the_computed_values() {
        assertEquals(0.0, SampleDesigns.axial24V().withPhaseInductanceH(0).withMeasuredKeLineVPerRpm(0).phaseInductanceH());
    }

    @Test
    void a_drivetrain_efficiency_below_a_half_is_refused_by_name() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new HydroMatchRequest(
                SampleDesigns.axial24V(), MatchFixtures.BATTERY_48V, MatchFixtures.site(),
                coilwright.turbine.PenstockSpec.of(120, 0.1, coilwright.turbine.PipeMaterial.HDPE, 2.0),
                MatchFixtures.impulseFor(600), 1.0, 5e-324, 10.0));
        assertEquals("drivetrainEfficiency", only(e).field());
        InvalidInputException w = assertThrows(InvalidInputException.class, () -> new coilwright.turbine.WindRotor(
                3.6, 3, new coilwright.turbine.ParametricCp(0.42, 6.5), 500, 1.0, 5e-324));
        assertEquals("drivetrainEfficiency", only(w).field());
    }
}
