package coilwright.web.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;

class SvgCompactionTest {
    private static final Pattern POINT = Pattern.compile("[ML](-?[0-9.]+),(-?[0-9.]+)");

    private static List<double[]> points(String d) {
        List<double[]> out = new ArrayList<>();
        Matcher m = POINT.matcher(d);
        while (m.find()) {
            out.add(new double[] {Double.parseDouble(m.group(1)), Double.parseDouble(m.group(2))});
        }
        return out;
    }

    private static String path(double[] x, double[] y) {
        StringBuilder d = new StringBuilder();
        for (int i = 0; i < x.length; i++) {
            d.append(i == 0 ? 'M' : 'L').append(x[i]).append(',').append(y[i]);
        }
        return d.toString();
    }

    /** Distance from a point to the drawn polyline, px. */
    private static double distance(double[] c, List<double[]> line) {
        double best = Double.MAX_VALUE;
        for (int i = 1; i < line.size(); i++) {
            double[] a = line.get(i - 1);
            double[] b = line.get(i);
            double dx = b[0] - a[0];
            double dy = b[1] - a[1];
            double t = Math.max(0, Math.min(1, ((c[0] - a[0]) * dx + (c[1] - a[1]) * dy) / (dx * dx + dy * dy)));
            best = Math.min(best, Math.hypot(a[0] + t * dx - c[0], a[1] + t * dy - c[1]));
        }
        return best;
    }

    @Test
    void a_curve_of_a_thousand_points_keeps_few_and_every_dropped_point_stays_within_the_tolerance() {
        int n = 1000;
        double[] x = IntStream.range(0, n).mapToDouble(i -> 60 + 0.65 * i).toArray();
        double[] y = IntStream.range(0, n).mapToDouble(i -> 330 - 290 * Math.sin(Math.PI * i / (n - 1))
                * Math.exp(-i / 600.0) - (i == 437 ? 40 : 0)).toArray();
        String thin = SvgCompaction.simplifiedPath(path(x, y), SvgCompaction.TOLERANCE_PX);
        List<double[]> kept = points(thin);
        assertTrue(kept.size() < 120, "kept " + kept.size() + " of " + n);
        for (int i = 0; i < n; i++) {
            // 0.25 px from the algorithm plus 0.05 px from writing coordinates to 0.1 px
            assertTrue(distance(new double[] {x[i], y[i]}, kept) <= SvgCompaction.TOLERANCE_PX + 0.05 + 1e-9,
                    "point " + i + " is " + distance(new double[] {x[i], y[i]}, kept) + " px from the drawn line");
        }
        double peak = kept.stream().mapToDouble(p -> p[1]).min().orElseThrow();
        double truePeak = java.util.Arrays.stream(y).min().orElseThrow();
        assertEquals(truePeak, peak, 0.05, "the peak (the spike at point 437) is drawn where it is");
        assertEquals(x[0], kept.get(0)[0], 0.05, "the curve starts where it starts");
        assertEquals(x[n - 1], kept.get(kept.size() - 1)[0], 0.05, "and ends where it ends");
    }

    @Test
    void a_highest_point_closer_to_the_chord_than_the_tolerance_is_still_kept() {
        String thin = SvgCompaction.simplifiedPath("M0,100L50,99.9L100,100", SvgCompaction.TOLERANCE_PX);
        assertEquals("M0,100L50,99.9L100,100", thin);
    }

    @Test
    void several_sub_paths_are_thinned_separately() {
        assertEquals("M0,0L10,0M0,5L10,5",
                SvgCompaction.simplifiedPath("M0,0L5,0L10,0M0,5L5,5L10,5", SvgCompaction.TOLERANCE_PX));
    }

    @Test
    void lines_drawn_alike_share_one_group_and_texts_never_move_past_a_rectangle() {
        String svg = "<svg><line x1='0' y1='0' x2='1' y2='1' stroke=\"#808080\" stroke-miterlimit=\"10\"/>"
                + "<text x='1' y='2' fill=\"#000000\">a</text>"
                + "<line x1='2' y1='0' x2='3' y2='1' stroke=\"#808080\" stroke-miterlimit=\"10\"/>"
                + "<rect x='0' y='0' width='5' height='5' fill=\"#ffffff\"/><text x='3' y='3'>b</text></svg>";
        assertEquals("<svg><g stroke=\"#808080\"><line x1='0' y1='0' x2='1' y2='1'/><line x1='2' y1='0' x2='3' y2='1'/>"
                        + "</g><text x='1' y='2' fill=\"#000000\">a</text><rect x='0' y='0' width='5' height='5' "
                        + "fill=\"#ffffff\"/><text x='3' y='3'>b</text></svg>",
                SvgCompaction.compact(svg, "c", 10, 10, SvgCompaction.TOLERANCE_PX));
    }

    @Test
    void coordinates_are_written_to_a_tenth_of_a_pixel() {
        assertEquals("12", SvgCompaction.tenth(12.04));
        assertEquals("12.1", SvgCompaction.tenth(12.05));
        assertEquals("-0.3", SvgCompaction.tenth(-0.26));
        assertEquals("-3.5", SvgCompaction.tenth(-3.5));
        assertEquals("0", SvgCompaction.tenth(-0.01));
    }
}
