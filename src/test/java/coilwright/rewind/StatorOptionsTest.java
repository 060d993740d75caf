package coilwright.rewind;

import coilwright.validation.InvalidInputException;
import coilwright.winding.Layers;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

class StatorOptionsTest {

    @Test
    void lists_only_balanced_pole_counts_with_their_figures() {
        List<PoleOption> options = StatorOptions.forSlots(12, 3, Layers.DOUBLE, 2, 16);
        List<Integer> poles = options.stream().map(PoleOption::poles).sorted().toList();
        assertFalse(poles.contains(12), "12 slots / 12 poles cannot be balanced");
        assertTrue(poles.containsAll(List.of(8, 10, 14, 16)), poles.toString());
        PoleOption p10 = options.stream().filter(o -> o.poles() == 10).findFirst().orElseThrow();
        assertEquals("2/5", p10.slotsPerPolePerPhase());
        assertEquals(0.4, p10.slotsPerPolePerPhaseValue(), 1e-15);
        assertEquals(60, p10.lcmSlotsPoles());
        assertEquals(2, p10.gcdSlotsPoles());
        assertEquals(4, p10.coilsPerPhase());
        assertEquals(1, p10.coilPitchSlots());
        assertEquals(7, p10.windingFactors().size());
        assertEquals(p10.fundamentalWindingFactor(), p10.windingFactors().get(0), 0);
        assertTrue(p10.allowedParallelPaths().contains(1));
    }

    @Test
    void options_are_sorted_by_winding_factor_then_cogging_periods() {
        List<PoleOption> options = StatorOptions.forSlots(24, 3, Layers.DOUBLE, 2, 30);
        for (int i = 1; i < options.size(); i++) {
            PoleOption a = options.get(i - 1);
            PoleOption b = options.get(i);
            assertTrue(a.fundamentalWindingFactor() > b.fundamentalWindingFactor()
                    || (a.fundamentalWindingFactor() == b.fundamentalWindingFactor()
                    && a.lcmSlotsPoles() >= b.lcmSlotsPoles()), a + " before " + b);
        }
    }

    @Test
    void a_range_with_no_balanced_pole_count_gives_an_empty_list() {
        assertTrue(StatorOptions.forSlots(12, 3, Layers.DOUBLE, 12, 12).isEmpty());
    }

    @Test
    void bad_ranges_are_refused_naming_the_field() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> StatorOptions.forSlots(12, 3, Layers.DOUBLE, 20, 10));
        assertEquals("maxPoles", e.errors().get(0).field());
        assertThrows(InvalidInputException.class, () -> StatorOptions.forSlots(12, 3, null, 2, 10));
        assertThrows(InvalidInputException.class, () -> StatorOptions.forSlots(1, 3, Layers.DOUBLE, 2, 10));
    }
}
