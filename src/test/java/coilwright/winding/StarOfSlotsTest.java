package coilwright.winding;

import coilwright.validation.FieldError;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.stream.Collectors;

import static org.junit.jupiter.api.Assertions.*;

class StarOfSlotsTest {
    static final double TOL = 1e-9;

    static Complex coilPhasor(Coil c, int slots, int poles) {
        double alpha = Math.PI * poles / slots;
        Complex go = Complex.I.multiply(alpha * (c.goSlot() - 1)).exp();
        Complex ret = Complex.I.multiply(alpha * (c.returnSlot() - 1)).exp();
        return go.subtract(ret).multiply(c.polarity());
    }

    @Test
    void twelve_slots_ten_poles_double_layer_gives_the_tooth_coil_pattern_a_rewinder_expects() {
        Winding w = StarOfSlots.layout(WindingSpec.of(12, 10, 3, Layers.DOUBLE));
        String pattern = w.coils().stream().map(Coil::label).collect(Collectors.joining(" "));
        assertEquals("A -A -B B C -C -A A B -B -C C", pattern);
        assertEquals(4, w.coilsPerPhase());
        assertEquals(List.of(1, 2, 7, 8), w.phaseCoils().get(0));
        // two groups of two neighbouring coils, opposite polarity inside each group
        assertEquals(-1, w.coil(1).polarity() * w.coil(2).polarity());
        assertEquals(-1, w.coil(7).polarity() * w.coil(8).polarity());
        assertEquals(1, w.coil(1).goSlot());
        assertEquals(2, w.coil(1).returnSlot());
        assertEquals(1, w.coil(12).returnSlot(), "the last coil wraps round to slot 1");
    }

    @Test
    void twelve_slots_ten_poles_reports_the_machine_figures() {
        Winding w = StarOfSlots.layout(WindingSpec.of(12, 10, 3, Layers.DOUBLE));
        assertEquals(2, w.qNumerator());
        assertEquals(5, w.qDenominator());
        assertEquals(1, w.periodicity());
        assertEquals(60, w.lcmSlotsPoles());
        assertEquals(2, w.gcdSlotsPoles());
        assertEquals(150.0, w.slotAngleElecDeg(), TOL);
        assertTrue(w.toothCoils());
    }

    @Test
    void phases_of_a_three_phase_layout_are_equal_and_120_degrees_apart() {
        Winding w = StarOfSlots.layout(WindingSpec.of(24, 22, 3, Layers.DOUBLE));
        Complex[] sum = new Complex[3];
        for (int ph = 0; ph < 3; ph++) {
            sum[ph] = Complex.ZERO;
            for (int n : w.phaseCoils().get(ph)) {
                sum[ph] = sum[ph].add(coilPhasor(w.coil(n), 24, 22));
            }
        }
        for (int ph = 1; ph < 3; ph++) {
            assertEquals(sum[0].abs(), sum[ph].abs(), TOL * sum[0].abs());
            double diff = Math.toDegrees(sum[ph].getArgument() - sum[0].getArgument());
            assertEquals(0.0, Math.IEEEremainder(diff - 120.0 * ph, 360.0), 1e-7);
        }
    }

    @Test
    void single_phase_twelve_coils_on_twelve_poles_has_unit_winding_factor() {
        Winding w = StarOfSlots.layout(WindingSpec.of(12, 12, 1, Layers.DOUBLE));
        assertEquals(1.0, w.fundamentalWindingFactor(), TOL);
        assertEquals(12, w.coilsPerPhase());
        assertEquals(List.of(1, 2, 3, 4, 6, 12), StarOfSlots.allowedParallelPaths(w.spec()));
    }

    @Test
    void three_phase_with_as_many_slots_as_poles_is_refused_but_single_phase_is_not() {
        assertThrows(InfeasibleDesignException.class, () -> StarOfSlots.layout(WindingSpec.of(12, 12, 3, Layers.DOUBLE)));
        assertDoesNotThrow(() -> StarOfSlots.layout(WindingSpec.of(12, 12, 1, Layers.DOUBLE)));
    }

    @Test
    void single_layer_with_odd_slots_is_refused_with_the_reason() {
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class,
                () -> StarOfSlots.layout(WindingSpec.of(9, 8, 3, Layers.SINGLE)));
        assertEquals("slots", e.field());
        assertTrue(e.getMessage().contains("even number of slots"), e.getMessage());
    }

    @Test
    void single_layer_with_an_even_pitch_short_of_180_degrees_is_refused() {
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class,
                () -> StarOfSlots.layout(new WindingSpec(24, 4, 3, Layers.SINGLE, 4, 1, 0)));
        assertEquals("coilPitchSlots", e.field());
        assertTrue(e.getMessage().contains("spans 120.0 degrees"), e.getMessage());
    }

    @Test
    void single_layer_full_pitch_distributed_winding_uses_each_slot_once_with_belts_of_two() {
        Winding w = StarOfSlots.layout(WindingSpec.of(24, 4, 3, Layers.SINGLE));
        assertEquals(6, w.coilPitchSlots());
        assertEquals(12, w.coils().size());
        assertEquals("A A B B C C A A B B C C",
                w.coils().stream().map(Coil::label).collect(Collectors.joining(" ")));
        int[] sides = new int[25];
        w.coils().forEach(c -> { sides[c.goSlot()]++; sides[c.returnSlot()]++; });
        for (int s = 1; s <= 24; s++) {
            assertEquals(1, sides[s], "slot " + s);
        }
    }

    @Test
    void a_winding_factor_below_the_useful_minimum_is_refused_with_pitch_and_distribution() {
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class,
                () -> StarOfSlots.layout(new WindingSpec(12, 2, 3, Layers.DOUBLE, 1, 1, 0)));
        assertTrue(e.getMessage().contains("fundamental winding factor is 0.250"), e.getMessage());
        assertTrue(e.getMessage().contains("pitch factor 0.259"), e.getMessage());
    }

    @Test
    void a_skew_that_cancels_the_fundamental_is_refused_on_the_skew_field() {
        // 12 coils, 12 poles: one slot pitch is 180 electrical degrees, two cancel the fundamental
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class,
                () -> StarOfSlots.layout(new WindingSpec(12, 12, 1, Layers.DOUBLE, 0, 1, 2.0)));
        assertEquals("skewSlotPitches", e.field());
    }

    @Test
    void parallel_paths_that_cannot_be_identical_are_refused_naming_the_allowed_counts() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> StarOfSlots.layout(new WindingSpec(9, 6, 3, Layers.DOUBLE, 0, 4, 0)));
        FieldError err = e.errors().get(0);
        assertEquals("parallelPaths", err.field());
        assertEquals("parallelPaths = 4: the 3 coils of each phase cannot be split into 4 identical groups;"
                + " allowed: 1, 3", err.message());
        assertEquals("1, 3", err.allowed());
    }

    @Test
    void coils_with_different_phasors_cannot_run_in_parallel() {
        // 9 slots / 8 poles: the three coils of a phase lie 20 electrical degrees apart
        assertEquals(List.of(1), StarOfSlots.allowedParallelPaths(WindingSpec.of(9, 8, 3, Layers.DOUBLE)));
    }

    @Test
    void parallel_paths_carry_equal_emf_and_split_the_coils_evenly() {
        Winding w = StarOfSlots.layout(new WindingSpec(24, 4, 3, Layers.DOUBLE, 5, 4, 0));
        assertEquals(8, w.coilsPerPhase());
        assertEquals(2, w.coilsPerPathPerPhase());
        assertEquals(2, w.seriesCoilsPerPhase());
        for (List<List<Integer>> phase : w.parallelPathCoils()) {
            assertEquals(4, phase.size());
            Complex first = null;
            for (List<Integer> path : phase) {
                assertEquals(2, path.size());
                Complex sum = Complex.ZERO;
                for (int n : path) {
                    sum = sum.add(coilPhasor(w.coil(n), 24, 4));
                }
                first = first == null ? sum : first;
                assertEquals(0.0, sum.subtract(first).abs(), TOL);
            }
        }
    }

    @Test
    void feasible_pole_counts_skip_unbalanced_combinations() {
        List<Integer> poles = StarOfSlots.feasiblePoleCounts(12, 3, Layers.DOUBLE, 2, 16).stream()
                .map(w -> w.spec().poles()).toList();
        // 12 and 6 are unbalanced (Q/(m*t) = 12/18 and 12/9)
        assertEquals(List.of(2, 4, 8, 10, 14, 16), poles);
    }

    @Test
    void feasible_pole_counts_round_an_odd_minimum_up_and_check_the_range() {
        assertEquals(4, StarOfSlots.feasiblePoleCounts(12, 3, Layers.DOUBLE, 3, 4).get(0).spec().poles());
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> StarOfSlots.feasiblePoleCounts(12, 3, Layers.DOUBLE, 20, 10));
        assertEquals("maxPoles", e.errors().get(0).field());
        assertThrows(InvalidInputException.class, () -> StarOfSlots.feasiblePoleCounts(0, 3, Layers.DOUBLE, 2, 10));
    }
}
