package coilwright.web.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.stream.IntStream;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;

class SvgChartsTest {
    private static final double[] SPEED = IntStream.rangeClosed(0, 40).mapToDouble(i -> i * 25.0).toArray();

    private static ChartSpec emfChart() {
        double[] emf = IntStream.rangeClosed(0, 40).mapToDouble(i -> i * 25.0 * 0.05).toArray();
        double[] terminal = IntStream.rangeClosed(0, 40).mapToDouble(i -> Math.max(0, i * 25.0 * 0.05 - 3)).toArray();
        double[] power = IntStream.rangeClosed(0, 40).mapToDouble(i -> i * i * 0.9).toArray();
        return ChartSpec.of("EMF & terminal voltage <test>", new ChartSpec.Axis("Speed", "rpm"),
                        new ChartSpec.Axis("Voltage", "V"),
                        List.of(new Series("EMF (line)", SPEED, emf), new Series("Terminal voltage", SPEED, terminal)))
                .withRightAxis(new ChartSpec.Axis("Battery power", "W"), List.of(new Series("Power to battery", SPEED, power)));
    }

    private static Document parse(String svg) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        return f.newDocumentBuilder().parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
    }

    @Test
    void renders_well_formed_svg_with_series_names_and_axis_labels() throws Exception {
        String svg = SvgCharts.lineChart(emfChart());
        Document doc = parse(svg);
        assertEquals("svg", doc.getDocumentElement().getLocalName());
        String text = doc.getDocumentElement().getTextContent();
        for (String expected : List.of("EMF (line)", "Terminal voltage", "Power to battery",
                "Speed (rpm)", "Voltage (V)", "Battery power (W)", "EMF & terminal voltage <test>")) {
            assertTrue(text.contains(expected), "SVG text contains " + expected);
        }
    }

    @Test
    void uses_no_external_resources_and_only_generic_fonts() {
        String svg = SvgCharts.lineChart(emfChart());
        assertFalse(svg.contains("@font-face"));
        assertFalse(svg.contains("xlink:href=\"http"));
        assertFalse(svg.contains("url(http"));
        assertTrue(svg.contains("sans-serif"), "generic family");
    }

    @Test
    void paints_with_presentation_attributes_not_inline_style_so_a_strict_policy_allows_it() throws Exception {
        String svg = SvgCharts.lineChart(emfChart());
        assertFalse(svg.contains("style="), "no style attribute");
        assertTrue(svg.contains("stroke=\"#9a4311\""), "the series keep their colour");
        assertFalse(java.util.regex.Pattern.compile("stroke-width=\"\\d+\\.\\d{3,}").matcher(svg).find(),
                "long decimals are cut: 2.200000047683716 -> 2.2");
        parse(svg);
        assertEquals("<g fill=\"none\" stroke=\"rgb(1,2,3)\">",
                SvgCharts.presentationAttributes("<g style='fill:none; stroke: rgb(1,2,3);'>"));
    }

    @Test
    void gives_each_chart_its_own_id_so_several_fit_on_one_page() {
        String a = SvgCharts.lineChart(emfChart());
        String b = SvgCharts.lineChart(emfChart());
        String idA = a.substring(a.indexOf("id=\"") + 4, a.indexOf('"', a.indexOf("id=\"") + 4));
        String idB = b.substring(b.indexOf("id=\"") + 4, b.indexOf('"', b.indexOf("id=\"") + 4));
        assertNotEquals(idA, idB);
        assertTrue(a.contains("role=\"img\""));
    }

    @Test
    void refuses_NaN_points_and_mismatched_lengths() {
        assertThrows(IllegalArgumentException.class, () -> new Series("s", new double[] {1, 2}, new double[] {1, Double.NaN}));
        assertThrows(IllegalArgumentException.class, () -> new Series("s", new double[] {1, 2}, new double[] {1}));
        assertThrows(IllegalArgumentException.class, () -> ChartSpec.of("t", new ChartSpec.Axis("x", "m"),
                new ChartSpec.Axis("y", "m"), List.of()));
    }

    /** The vertices of the longest path drawn in the series' colour (the curve, not its legend swatch). */
    private static List<double[]> curve(String svg, String colour) {
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("stroke=\"" + colour + "\"[^>]*><path d='([^']*)'")
                .matcher(svg);
        String longest = "";
        while (m.find()) {
            longest = m.group(1).length() > longest.length() ? m.group(1) : longest;
        }
        List<double[]> points = new java.util.ArrayList<>();
        java.util.regex.Matcher p = java.util.regex.Pattern.compile("[ML](-?[0-9.]+),(-?[0-9.]+)").matcher(longest);
        while (p.find()) {
            points.add(new double[] {Double.parseDouble(p.group(1)), Double.parseDouble(p.group(2))});
        }
        return points;
    }

    @Test
    void a_curve_of_a_thousand_points_is_drawn_with_few_and_keeps_its_peak_where_it_is() {
        double[] x = IntStream.range(0, 1000).mapToDouble(i -> i * 0.6).toArray();
        double[] y = IntStream.range(0, 1000).mapToDouble(i -> i == 613 ? 950 : 400 + 300 * Math.sin(i / 90.0)).toArray();
        ChartSpec spec = ChartSpec.of("Spike", new ChartSpec.Axis("Speed", "rpm"), new ChartSpec.Axis("Power", "W"),
                List.of(new Series("Power", x, y)));
        List<double[]> every = curve(SvgCharts.lineChart(spec, -1.0), "#9a4311"); // a negative tolerance keeps every point
        List<double[]> thin = curve(SvgCharts.lineChart(spec), "#9a4311");
        assertEquals(1000, every.size(), "without thinning every point is drawn");
        assertTrue(thin.size() < 150, "thinned to " + thin.size() + " points");
        double peak = every.stream().mapToDouble(p -> p[1]).min().orElseThrow();
        assertEquals(peak, thin.stream().mapToDouble(p -> p[1]).min().orElseThrow(), 1e-9, "the peak is drawn at its height");
        assertTrue(thin.stream().anyMatch(p -> Math.abs(p[0] - every.get(613)[0]) < 1e-9 && p[1] == peak),
                "and at its speed");
    }
}
