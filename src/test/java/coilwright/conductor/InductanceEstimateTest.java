package coilwright.conductor;

import coilwright.validation.InvalidInputException;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class InductanceEstimateTest {

    private static SlottedInductanceInput slotted(double turns, double gap) {
        return new SlottedInductanceInput(3, 5, 12, turns, 0.933, 0.05, 0.04, gap, 0.012, 0.006, 0.001, 0.003,
                0.06, SlottedInductanceInput.TYPICAL_END_WINDING_PERMEANCE);
    }

    @Test
    void wheeler_formula_in_si_matches_the_inch_form() {
        // a = 1 in, b = 1 in, c = 0.5 in, N = 100: L = 0.8 * 1 * 10000 / (6 + 9 + 5) = 400 uH
        assertEquals(400e-6, InductanceEstimate.wheelerMultilayerH(100, 0.0254, 0.0254, 0.0127), 1e-12);
    }

    @Test
    void air_cored_phase_is_coils_times_coil_over_paths_squared() {
        AirCoredInductanceInput in = new AirCoredInductanceInput(60, 4, 2, 0.3, 0.02, 0.012);
        double coil = InductanceEstimate.wheelerMultilayerH(60, 0.3 / (2 * Math.PI), 0.012, 0.02);
        InductanceEstimate est = InductanceEstimate.airCored(in);
        assertEquals(4 * coil / 4, est.phaseInductanceH(), 1e-15);
        assertEquals(0.5, est.relativeUncertainty(), 0.0);
        assertTrue(est.method().contains("Wheeler"));
    }

    @Test
    void slotted_total_is_the_sum_of_its_three_parts() {
        SlottedInductanceInput in = slotted(100, 0.004);
        double sum = InductanceEstimate.magnetizingInductanceH(in) + InductanceEstimate.slotLeakageInductanceH(in)
                + InductanceEstimate.endWindingLeakageInductanceH(in);
        InductanceEstimate est = InductanceEstimate.slotted(in);
        assertEquals(sum, est.phaseInductanceH(), sum * 1e-12);
        assertEquals(0.3, est.relativeUncertainty(), 0.0);
        assertTrue(InductanceEstimate.slotLeakageInductanceH(in) > 0);
        assertTrue(InductanceEstimate.endWindingLeakageInductanceH(in) > 0);
    }

    @Property
    void inductance_grows_with_turns_squared_and_falls_with_the_gap(
            @ForAll @DoubleRange(min = 5, max = 500) double turns,
            @ForAll @Scale(5) @DoubleRange(min = 0.001, max = 0.02) double gap) {
        double l1 = InductanceEstimate.slotted(slotted(turns, gap)).phaseInductanceH();
        double l2 = InductanceEstimate.slotted(slotted(2 * turns, gap)).phaseInductanceH();
        double wider = InductanceEstimate.slotted(slotted(turns, 2 * gap)).phaseInductanceH();
        assertEquals(4 * l1, l2, 4 * l1 * 1e-9);
        assertTrue(wider < l1 && wider > 0);
    }

    @Property
    void air_cored_estimate_is_positive_and_finite(
            @ForAll @IntRange(min = 1, max = 2000) int turns,
            @ForAll @Scale(5) @DoubleRange(min = 0.005, max = 0.05) double legWidth,
            @ForAll @Scale(5) @DoubleRange(min = 0.003, max = 0.03) double thickness) {
        double mlt = Math.PI * legWidth + 0.1;
        double l = InductanceEstimate.airCored(new AirCoredInductanceInput(turns, 6, 1, mlt, legWidth, thickness))
                .phaseInductanceH();
        assertTrue(l > 0 && Double.isFinite(l));
    }

    @Test
    void reactance_is_two_pi_f_l() {
        InductanceEstimate est = new InductanceEstimate(2e-3, 0.3, "test");
        assertEquals(2 * Math.PI * 50 * 2e-3, est.reactanceOhm(50), 1e-12);
        assertThrows(InvalidInputException.class, () -> est.reactanceOhm(-1));
    }

    @Test
    void rejects_a_non_positive_result_and_bad_uncertainty() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new InductanceEstimate(0, 1.5, null));
        assertEquals(3, e.errors().size());
    }

    @Test
    void rejects_bad_wheeler_arguments() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> InductanceEstimate.wheelerMultilayerH(0.5, 0, 0.01, Double.NaN));
        assertEquals(3, e.errors().size());
        assertEquals("turns", e.errors().get(0).field());
    }
}
