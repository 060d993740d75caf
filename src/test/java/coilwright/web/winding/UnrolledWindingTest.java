package coilwright.web.winding;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.web.winding.UnrolledWinding.Loop;
import coilwright.web.winding.UnrolledWinding.Row;
import coilwright.winding.Layers;
import coilwright.winding.StarOfSlots;
import coilwright.winding.Winding;
import coilwright.winding.WindingSpec;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

class UnrolledWindingTest {
    private static final Pattern NUMBER = Pattern.compile("-?[0-9.]+");

    private static Winding layout(int slots, int poles, Layers layers) {
        return StarOfSlots.layout(WindingSpec.of(slots, poles, 3, layers));
    }

    @ParameterizedTest(name = "{0} slots, {1} poles, {2}, rows of {3}")
    @CsvSource({"12, 10, DOUBLE, 24", "36, 4, DOUBLE, 24", "36, 4, DOUBLE, 8", "24, 22, DOUBLE, 8", "12, 10, SINGLE, 8",
            "48, 8, DOUBLE, 24", "24, 4, SINGLE, 8"})
    void no_two_end_connections_at_one_height_overlap_in_a_row(int slots, int poles, Layers layers, int perRow) {
        UnrolledWinding u = UnrolledWinding.of(layout(slots, poles, layers), perRow, "wide");
        for (Row row : u.rows()) {
            assertTrue(row.lastSlot() - row.firstSlot() + 1 <= perRow);
            List<Loop> loops = row.loops();
            for (int i = 0; i < loops.size(); i++) {
                for (int j = i + 1; j < loops.size(); j++) {
                    double[] a = bar(loops.get(i));
                    double[] b = bar(loops.get(j));
                    boolean sameHeight = Math.abs(a[2] - b[2]) < 1e-6;
                    assertFalse(sameHeight && a[0] <= b[1] && b[0] <= a[1],
                            "coils " + loops.get(i).coil() + " and " + loops.get(j).coil() + " in row " + row.index());
                }
            }
        }
    }

    @Test
    void every_drawing_fits_its_view_box() {
        for (UnrolledWinding u : UnrolledWinding.forPage(layout(36, 4, Layers.DOUBLE))) {
            for (Row row : u.rows()) {
                row.cells().forEach(c -> assertTrue(c.x() >= 0 && c.x() + c.w() <= u.width() && c.y() + c.h() <= u.height()));
                row.slotNumbers().forEach(t -> assertTrue(t.y() <= u.height() && t.x() <= u.width()));
                row.bands().forEach(b -> assertTrue(b.y() + b.h() <= u.height()));
                row.loops().forEach(l -> assertTrue(bar(l)[2] > 0));
            }
        }
    }

    @Test
    void a_page_gets_one_drawing_for_a_small_stator_and_a_wide_and_a_narrow_one_for_a_large_one() {
        assertEquals(List.of("all"), UnrolledWinding.forPage(layout(6, 4, Layers.DOUBLE)).stream()
                .map(UnrolledWinding::variant).toList());
        List<UnrolledWinding> two = UnrolledWinding.forPage(layout(36, 4, Layers.DOUBLE));
        assertEquals(List.of("wide", "narrow"), two.stream().map(UnrolledWinding::variant).toList());
        assertEquals(2, two.get(0).rows().size(), "36 slots: two rows of one 18-slot section each");
        assertEquals(List.of(1, 19), two.get(0).rows().stream().map(Row::firstSlot).toList());
    }

    @Test
    void rows_hold_whole_sections_where_they_fit_and_equal_lengths_otherwise() {
        assertEquals(12, UnrolledLayout.slotsPerRow(12, 3, 24), "the whole stator fits");
        assertEquals(6, UnrolledLayout.slotsPerRow(12, 3, 8), "two 3-slot sections");
        assertEquals(18, UnrolledLayout.slotsPerRow(36, 18, 24), "one 18-slot section");
        assertEquals(8, UnrolledLayout.slotsPerRow(24, 24, 8), "three equal rows");
        assertEquals(7, UnrolledLayout.slotsPerRow(27, 27, 8), "four rows, the last shorter");
    }

    @Test
    void a_coil_that_leaves_its_row_says_where_it_continues() {
        UnrolledWinding u = UnrolledWinding.of(layout(12, 10, Layers.DOUBLE), 24, "wide");
        Loop out = u.rows().get(0).loops().stream().filter(l -> l.part().equals("out")).findFirst().orElseThrow();
        assertEquals(12, out.goSlot(), "only the last coil wraps round to slot 1");
        assertEquals("→1", out.onward().orElseThrow().text());
        Loop in = u.rows().get(0).loops().stream().filter(l -> l.part().equals("in")).findFirst().orElseThrow();
        assertEquals("12→", in.onward().orElseThrow().text());
        assertEquals(1, in.returnSlot());
    }

    /** The horizontal part of an end connection: x from, x to, height. */
    private static double[] bar(Loop loop) {
        Matcher m = NUMBER.matcher(loop.path().replaceAll("[MVH]", " "));
        List<Double> n = m.results().map(r -> Double.parseDouble(r.group())).toList();
        boolean in = loop.part().equals("in");
        double x0 = n.get(0);
        double y = in ? n.get(1) : n.get(2);
        double x1 = in ? n.get(2) : n.get(3);
        return new double[] {Math.min(x0, x1), Math.max(x0, x1), y};
    }
}
