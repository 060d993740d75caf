package coilwright.web.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.IntStream;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;

class FieldChartTest {
    private static final double[] X = IntStream.rangeClosed(0, 20).mapToDouble(i -> i * 10.0).toArray();

    private static FieldChart.Spec spec(int bands) {
        List<FieldChart.Band> field = new ArrayList<>();
        for (int level = 1; level <= bands; level++) {
            int l = level;
            double[] y = IntStream.rangeClosed(0, 20).mapToDouble(i -> l * (1 + i * (20 - i) / 100.0)).toArray();
            field.add(new FieldChart.Band(level, new Series(level + " m/s", X, y)));
        }
        double[] line = IntStream.rangeClosed(0, 20).mapToDouble(i -> i * 0.4).toArray();
        return new FieldChart.Spec("Field <test>", new ChartSpec.Axis("Speed", "rpm"), new ChartSpec.Axis("Torque", "N·m"),
                new ChartSpec.Axis("Wind speed", "m/s"), field, List.of(new Series("Operating line", X, line)), "Met",
                List.of(new FieldChart.Point(50, 2, "5 m/s"), new FieldChart.Point(100, 4, "8 m/s")), 200, 12, 720, 460);
    }

    @Test
    void draws_well_formed_svg_with_the_point_labels_the_line_and_the_scale_title() throws Exception {
        String svg = FieldChart.svg(spec(6));
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        String text = f.newDocumentBuilder().parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)))
                .getDocumentElement().getTextContent();
        for (String expected : List.of("Field <test>", "5 m/s", "8 m/s", "Operating line", "Met", "Wind speed (m/s)",
                "Torque (N·m)")) {
            assertTrue(text.contains(expected), expected);
        }
    }

    @Test
    void every_band_gets_its_own_shade_lighter_for_lower_levels() {
        Set<String> fills = new HashSet<>(fills(FieldChart.svg(spec(6))));
        Set<String> fewer = new HashSet<>(fills(FieldChart.svg(spec(3))));
        assertEquals(3, fills.size() - fewer.size(), "three more bands, three more shades: " + fills + " / " + fewer);
    }

    @Test
    void a_chart_without_bands_or_range_is_refused() {
        assertThrows(IllegalArgumentException.class, () -> new FieldChart.Spec("t", new ChartSpec.Axis("x", ""),
                new ChartSpec.Axis("y", ""), new ChartSpec.Axis("z", ""), List.of(), List.of(), "p", List.of(), 1, 1, 720, 400));
    }

    /** The fill colours of the drawn shapes. */
    private static List<String> fills(String svg) {
        Matcher m = Pattern.compile("fill(?:: ?|=\")(#[0-9a-fA-F]{6}|rgb\\([^)]*\\))").matcher(svg);
        List<String> out = new ArrayList<>();
        while (m.find()) {
            out.add(m.group(1));
        }
        return out;
    }
}
