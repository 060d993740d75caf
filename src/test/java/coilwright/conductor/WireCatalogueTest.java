package coilwright.conductor;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

class WireCatalogueTest {

    @Test
    void lists_every_awg_from_4_to_40_largest_first() {
        List<WireSpec> sizes = WireCatalogue.awgSizes();
        assertEquals(37, sizes.size());
        assertEquals(4, sizes.get(0).awg());
        assertEquals(40, sizes.get(36).awg());
        assertEquals(WireCatalogue.DEFAULT_GRADE, sizes.get(0).insulationGrade());
    }

    @Test
    void metric_sizes_rise_and_stay_inside_the_accepted_range() {
        List<WireSpec> sizes = WireCatalogue.metricSizes(1);
        for (int i = 1; i < sizes.size(); i++) {
            assertTrue(sizes.get(i).bareDiameterM() > sizes.get(i - 1).bareDiameterM());
        }
        assertEquals("0.10 mm", sizes.get(0).label());
        assertEquals("2.80 mm", sizes.get(sizes.size() - 1).label());
    }

    @Test
    void brackets_a_copper_area_between_neighbouring_gauges() {
        double between = (WireSpec.awg(18, 2).copperAreaM2() + WireSpec.awg(17, 2).copperAreaM2()) / 2;
        WireCatalogue.SizeBracket b = WireCatalogue.nearestAwgBelowAndAbove(between);
        assertEquals(18, b.below().orElseThrow().awg());
        assertEquals(17, b.above().orElseThrow().awg());
    }

    @Test
    void an_area_beyond_the_largest_size_has_nothing_above() {
        WireCatalogue.SizeBracket b = WireCatalogue.nearestMetricBelowAndAbove(1e-3);
        assertTrue(b.above().isEmpty());
        assertEquals("2.80 mm", b.below().orElseThrow().label());
    }

    @Test
    void strand_alternatives_are_within_five_percent_and_sorted_by_strands() {
        double target = WireSpec.awg(14, 2).copperAreaM2();
        List<WireCatalogue.StrandOption> options = WireCatalogue.strandAlternatives(target, 6);
        assertFalse(options.isEmpty());
        int last = 0;
        for (WireCatalogue.StrandOption o : options) {
            assertTrue(Math.abs(o.relativeDeviation()) <= 0.05);
            assertEquals(o.wire().conductorCopperAreaM2(), o.copperAreaM2(), 1e-18);
            assertTrue(o.wire().strandsInHand() >= last);
            last = o.wire().strandsInHand();
        }
        assertEquals("AWG 14", options.get(0).wire().label());
        assertTrue(options.stream().anyMatch(o -> o.wire().label().equals("2 x AWG 17")));
    }

    @Test
    void rejects_bad_strand_search_inputs() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> WireCatalogue.strandAlternatives(-1, 0));
        assertEquals(2, e.errors().size());
        assertEquals("maxStrands = 0: must be between 1 and 40", e.errors().get(1).message());
    }
}
