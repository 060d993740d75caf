package coilwright.rewind;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.conductor.BandTemperature;
import coilwright.machine.Alternator;
import org.junit.jupiter.api.Test;

/** Rewind options report their current density and an estimated winding temperature at the working speed. */
class RewindHeatTest {
    private static RewindPlan plan(double cutInRpm) {
        Alternator a = MeasuredMachines.axial(24);
        return RewindPlanner.plan(OutputEstimatorTest.withInductance(a), RewindTarget.battery(24, cutInRpm, 400));
    }

    @Test
    void each_wire_reports_phase_current_over_paths_and_copper_area_as_its_current_density() {
        // definition: J = I_conductor / A_copper, the conductor carrying I_phase / a (a parallel paths)
        for (RewindOption o : plan(150).rewinds()) {
            for (WireChoice w : o.wireChoices()) {
                double expected = w.output().orElseThrow().phaseCurrentRmsA() / o.parallelPaths()
                        / (w.conductorCopperAreaM2() * 1e6);
                assertEquals(expected, w.currentDensityAPerMm2().orElseThrow(), 1e-12 * Math.max(expected, 1e-12));
                double j = expected;
                w.windingTemperatureC().ifPresent(t -> assertEquals(
                        BandTemperature.windingC(j, RewindPlanner.ASSUMED_COOLING, RewindPlanner.ASSUMED_AMBIENT_C)
                                .orElseThrow(), t, 0));
            }
        }
    }

    @Test
    void the_option_carries_the_figures_of_the_wire_nearest_its_copper_area_and_warns_above_the_band() {
        for (RewindOption o : plan(120).rewinds()) {
            WireChoice nearest = o.wireChoices().stream().min(java.util.Comparator.comparingDouble(
                    w -> Math.abs(Math.log(w.conductorCopperAreaM2() / o.conductorCopperAreaM2())))).orElseThrow();
            assertEquals(nearest.currentDensityAPerMm2(), o.currentDensityAPerMm2());
            assertEquals(nearest.windingTemperatureC(), o.windingTemperatureC());
            boolean above = o.currentDensityAPerMm2().orElseThrow() > RewindPlanner.ASSUMED_COOLING.highAPerMm2();
            assertEquals(above, o.notes().stream().anyMatch(n -> n.contains("runs hot")), () -> o.toString());
        }
    }

    @Test
    void a_voltage_target_has_no_output_and_so_no_current_density() {
        RewindPlan p = RewindPlanner.plan(OutputEstimatorTest.withInductance(MeasuredMachines.axial(24)),
                RewindTarget.lineVoltage(30, 300, 400));
        assertTrue(p.rewinds().stream().allMatch(o -> o.currentDensityAPerMm2().isEmpty()
                && o.windingTemperatureC().isEmpty()));
    }
}
