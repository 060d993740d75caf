package coilwright.winding;

import coilwright.validation.InfeasibleDesignException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class FeasibilityTest {

    @Test
    void the_automatic_pitch_is_one_for_tooth_coils_and_full_pitch_otherwise() {
        assertEquals(1, Feasibility.resolvePitch(WindingSpec.of(12, 10, 3, Layers.DOUBLE)));
        assertEquals(6, Feasibility.resolvePitch(WindingSpec.of(24, 4, 3, Layers.DOUBLE)));
        assertEquals(8, Feasibility.resolvePitch(WindingSpec.of(30, 4, 3, Layers.DOUBLE)));
        // single layer: 7.5 slots per pole, so the nearest odd pitch
        assertEquals(7, Feasibility.resolvePitch(WindingSpec.of(30, 4, 3, Layers.SINGLE)));
        assertEquals(5, Feasibility.resolvePitch(WindingSpec.of(24, 4, 3, Layers.DOUBLE).withCoilPitchSlots(5)));
    }

    @Test
    void the_automatic_pitch_never_exceeds_half_the_slots() {
        // 5 slots, 2 poles, one phase: 2.5 slots per pole rounds to 3, but at most Q/2 = 2
        assertEquals(2, Feasibility.resolvePitch(WindingSpec.of(5, 2, 1, Layers.DOUBLE)));
    }

    @Test
    void a_double_layer_refusal_gives_the_numbers_of_the_condition() {
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class,
                () -> Feasibility.requireBalanceable(WindingSpec.of(12, 12, 3, Layers.DOUBLE), 1));
        assertEquals("12 slots with 12 poles and 3 phases: Q/(m*t) = 12/(3*6) is not a whole number"
                + " (t = gcd(Q, p) = 6), so the phases cannot be balanced", e.getMessage());
    }

    @Test
    void a_single_layer_uses_the_coil_star_of_half_the_slots() {
        // 6 slots, 4 poles: three coils on alternate teeth, one per phase, t' = gcd(3, 2) = 1
        assertDoesNotThrow(() -> Feasibility.requireBalanceable(WindingSpec.of(6, 4, 3, Layers.SINGLE), 1));
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class,
                () -> Feasibility.requireBalanceable(WindingSpec.of(10, 8, 3, Layers.SINGLE), 1));
        assertTrue(e.getMessage().contains("(Q/2)/(m*t') = 5/(3*1)"), e.getMessage());
    }
}
