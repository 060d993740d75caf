package coilwright.rewind;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.validation.InvalidInputException;
import coilwright.winding.Layers;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The orders are worked out by hand from the fundamental winding factors of the star of slots (El-Refaie, IEEE Trans.
 * Ind. Electron. 57(1), 2010: 12 slots with 8/16 poles 0.866, 10/14 poles 0.933; 9 slots with 8/10 poles 0.945,
 * 6 poles 0.866; distributed 12 slots 2 poles (q = 2, full pitch) 0.966, 4 poles (q = 1) 1), the cogging cycles
 * LCM(Q, 2p) and the pull symmetry gcd(Q, 2p).
 */
class PoleRankingTest {
    private static List<Integer> poles(List<PoleOption> options) {
        return options.stream().map(PoleOption::poles).toList();
    }

    @Test
    void by_winding_factor_the_best_factor_comes_first_and_ties_go_to_more_cogging_cycles() {
        // kw1: 4p 1, 2p 0.966, 14p and 10p 0.933 (LCM 84 and 60), 16p and 8p 0.866 (LCM 48 and 24)
        assertEquals(List.of(4, 2, 14, 10, 16, 8),
                poles(StatorOptions.forSlots(12, 3, Layers.DOUBLE, 2, 16, PoleRanking.WINDING_FACTOR)));
    }

    @Test
    void by_cogging_the_most_cycles_per_revolution_come_first() {
        // LCM(12, 2p): 14p 84, 10p 60, 16p 48, 8p 24, 4p and 2p 12 (then the higher factor, 4p)
        assertEquals(List.of(14, 10, 16, 8, 4, 2),
                poles(StatorOptions.forSlots(12, 3, Layers.DOUBLE, 2, 16, PoleRanking.COGGING)));
    }

    @Test
    void balanced_puts_the_options_nothing_beats_on_every_count_first() {
        // 4p (best factor) and 14p (most cycles) are beaten by none; then 2p and 10p; then 16p, which beats 8p
        assertEquals(List.of(4, 14, 2, 10, 16, 8),
                poles(StatorOptions.forSlots(12, 3, Layers.DOUBLE, 2, 16, PoleRanking.BALANCED)));
    }

    @Test
    void balanced_keeps_an_option_whose_pull_cancels_ahead_of_a_one_sided_one() {
        // 9 slots: 10p beats 8p (same factor 0.945, LCM 90 > 72); 6p (0.866, LCM 18) is the only one with
        // gcd(9, 6) = 3, a balanced pull, so no option beats it on every count
        List<PoleOption> options = StatorOptions.forSlots(9, 3, Layers.DOUBLE, 6, 10, PoleRanking.BALANCED);
        assertEquals(List.of(10, 6, 8), poles(options));
        assertTrue(PoleRanking.pullBalanced(options.get(1)));
        assertFalse(PoleRanking.pullBalanced(options.get(0)));
        assertEquals(List.of(10, 8, 6), poles(StatorOptions.forSlots(9, 3, Layers.DOUBLE, 6, 10, PoleRanking.WINDING_FACTOR)));
    }

    @Test
    void a_missing_ranking_is_refused_by_name() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> StatorOptions.forSlots(12, 3, Layers.DOUBLE, 2, 16, null));
        assertEquals("rankBy", e.errors().get(0).field());
    }
}
