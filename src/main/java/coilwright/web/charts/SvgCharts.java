package coilwright.web.charts;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Rectangle;
import java.util.List;
import java.util.concurrent.atomic.AtomicLong;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.text.TextUtils;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;

/**
 * Server-side SVG line charts drawn by JFreeChart into JFreeSVG: inline-able {@code <svg>} elements with
 * generic font families only (no font files, works offline). Each chart gets its own id and defs prefix,
 * so several can sit on one page. Thread-safe.
 */
public final class SvgCharts {
    /** Colour-blind-aware palette, dark enough for print. */
    private static final List<Color> PALETTE = List.of(new Color(0x9a4311), new Color(0x1a5fb4),
            new Color(0x2e7d32), new Color(0x6a1b9a), new Color(0x00838f), new Color(0x5d4037));
    private static final String FONT = Font.SANS_SERIF;
    private static final AtomicLong IDS = new AtomicLong();

    static {
        if (System.getProperty("java.awt.headless") == null) {
            System.setProperty("java.awt.headless", "true");
        }
        // Rotated labels as real <text> (with a transform), not glyph outlines: searchable, smaller, printable.
        TextUtils.setUseDrawRotatedStringWorkaround(false);
    }

    private SvgCharts() {
    }

    /** The chart as one {@code <svg>} element with {@code role="img"} and a {@code <title>}. */
    public static String lineChart(ChartSpec spec) {
        return lineChart(spec, SvgCompaction.TOLERANCE_PX);
    }

    /** As {@link #lineChart(ChartSpec)}, each curve drawn within {@code tolerancePx} of every one of its points. */
    static String lineChart(ChartSpec spec, double tolerancePx) {
        JFreeChart chart = ChartFactory.createXYLineChart(spec.title(), spec.x().text(), spec.left().text(),
                dataset(spec.leftSeries()), PlotOrientation.VERTICAL, true, false, false);
        XYPlot plot = chart.getXYPlot();
        style(chart, plot);
        plot.setRenderer(0, renderer(0, spec.leftSeries().size(), false));
        spec.right().ifPresent(axis -> {
            NumberAxis rightAxis = new NumberAxis(axis.text());
            rightAxis.setAutoRangeIncludesZero(false);
            styleAxis(rightAxis);
            plot.setRangeAxis(1, rightAxis);
            plot.setDataset(1, dataset(spec.rightSeries()));
            plot.mapDatasetToRangeAxis(1, 1);
            plot.setRenderer(1, renderer(spec.leftSeries().size(), spec.rightSeries().size(), true));
        });
        return svg(chart, spec.title(), spec.widthPx(), spec.heightPx(), tolerancePx);
    }

    /**
     * Bars by category, one bar per series in each category, on a value axis from {@code valueFrom} to
     * {@code valueTo} (for example winding factors 0 to 1 by harmonic order).
     *
     * @param series legend name to one value per category, in category order (a single series has no legend)
     */
    public static String barChart(String title, ChartSpec.Axis category, ChartSpec.Axis value, List<String> categories,
                                  java.util.Map<String, double[]> series, double valueFrom, double valueTo,
                                  int widthPx, int heightPx) {
        org.jfree.data.category.DefaultCategoryDataset data = new org.jfree.data.category.DefaultCategoryDataset();
        series.forEach((name, values) -> {
            if (values.length != categories.size()) {
                throw new IllegalArgumentException("series " + name + ": " + values.length + " values for "
                        + categories.size() + " categories");
            }
            for (int i = 0; i < values.length; i++) {
                data.addValue(values[i], name, categories.get(i));
            }
        });
        JFreeChart chart = ChartFactory.createBarChart(title, category.text(), value.text(), data,
                PlotOrientation.VERTICAL, series.size() > 1, false, false);
        org.jfree.chart.plot.CategoryPlot plot = chart.getCategoryPlot();
        chart.setBackgroundPaint(Color.WHITE);
        chart.getTitle().setFont(new Font(FONT, Font.BOLD, 15));
        if (chart.getLegend() != null) {
            chart.getLegend().setItemFont(new Font(FONT, Font.PLAIN, 13));
        }
        plot.setBackgroundPaint(Color.WHITE);
        plot.setRangeGridlinePaint(new Color(0xc9cfd4));
        plot.setOutlinePaint(new Color(0x8a949c));
        plot.getRangeAxis().setRange(valueFrom, valueTo);
        styleAxis(plot.getRangeAxis());
        plot.getDomainAxis().setLabelFont(new Font(FONT, Font.PLAIN, 14));
        plot.getDomainAxis().setTickLabelFont(new Font(FONT, Font.PLAIN, 13));
        org.jfree.chart.renderer.category.BarRenderer bars = (org.jfree.chart.renderer.category.BarRenderer) plot.getRenderer();
        bars.setBarPainter(new org.jfree.chart.renderer.category.StandardBarPainter());
        bars.setShadowVisible(false);
        bars.setItemMargin(0.05);
        for (int i = 0; i < series.size(); i++) {
            bars.setSeriesPaint(i, PALETTE.get((i + 1) % PALETTE.size()));
        }
        return svg(chart, title, widthPx, heightPx);
    }

    /** Draws a chart into one {@code <svg>} element with its own id, {@code role="img"} and a {@code <title>}. */
    static String svg(JFreeChart chart, String title, int widthPx, int heightPx) {
        return svg(chart, title, widthPx, heightPx, SvgCompaction.TOLERANCE_PX);
    }

    private static String svg(JFreeChart chart, String title, int widthPx, int heightPx, double tolerancePx) {
        String id = "chart-" + IDS.incrementAndGet();
        SVGGraphics2D g2 = new SVGGraphics2D(widthPx, heightPx);
        g2.setDefsKeyPrefix(id + "-");
        g2.setGeomDoubleConverter(SvgCompaction::tenth);
        if (chart.getPlot() instanceof XYPlot xy) {
            // One path per curve rather than one line element per segment, so the curve can be thinned.
            for (int i = 0; i < xy.getRendererCount(); i++) {
                if (xy.getRenderer(i) instanceof XYLineAndShapeRenderer lines) {
                    lines.setDrawSeriesLineAsPath(true);
                }
            }
        }
        chart.draw(g2, new Rectangle(0, 0, widthPx, heightPx));
        String svg = SvgCompaction.compact(presentationAttributes(g2.getSVGElement(id)), id, widthPx, heightPx,
                tolerancePx);
        int open = svg.indexOf('>', svg.indexOf("<svg"));
        return svg.substring(0, open) + " role=\"img\" aria-labelledby=\"" + id + "-title\">"
                + "<title id=\"" + id + "-title\">" + escape(title) + "</title>" + svg.substring(open + 1);
    }

    private static final java.util.regex.Pattern STYLE = java.util.regex.Pattern.compile("style='([^']*)'");
    private static final java.util.regex.Pattern PROPERTY = java.util.regex.Pattern.compile("[a-z-]+");
    private static final java.util.regex.Pattern LONG_DECIMAL = java.util.regex.Pattern.compile("(\\d+\\.\\d{2})\\d+");

    /**
     * JFreeSVG writes each element's paint as a {@code style} attribute, which a Content-Security-Policy without
     * {@code 'unsafe-inline'} refuses; every property it writes is also an SVG presentation attribute, so each
     * {@code style='a:b;c:d'} becomes {@code a="b" c="d"} (long decimals cut to two places). The drawing is the same.
     */
    static String presentationAttributes(String svg) {
        java.util.regex.Matcher m = STYLE.matcher(svg);
        StringBuilder out = new StringBuilder(svg.length());
        while (m.find()) {
            StringBuilder attrs = new StringBuilder();
            for (String declaration : m.group(1).split(";")) {
                int colon = declaration.indexOf(':');
                if (colon <= 0) {
                    continue;
                }
                String name = declaration.substring(0, colon).strip();
                String value = LONG_DECIMAL.matcher(declaration.substring(colon + 1).strip()).replaceAll("$1");
                if (!PROPERTY.matcher(name).matches() || value.contains("\"") || value.contains("'")) {
                    continue;
                }
                if (attrs.length() > 0) {
                    attrs.append(' ');
                }
                attrs.append(name).append("=\"").append(value).append('"');
            }
            m.appendReplacement(out, java.util.regex.Matcher.quoteReplacement(attrs.toString()));
        }
        m.appendTail(out);
        return out.toString();
    }

    private static XYSeriesCollection dataset(List<Series> series) {
        XYSeriesCollection data = new XYSeriesCollection();
        for (Series s : series) {
            XYSeries xy = new XYSeries(s.name(), false, true);
            for (int i = 0; i < s.x().length; i++) {
                xy.add(s.x()[i], s.y()[i], false);
            }
            data.addSeries(xy);
        }
        return data;
    }

    private static XYLineAndShapeRenderer renderer(int firstColour, int count, boolean dashed) {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        for (int i = 0; i < count; i++) {
            r.setSeriesPaint(i, PALETTE.get((firstColour + i) % PALETTE.size()));
            r.setSeriesStroke(i, dashed
                    ? new BasicStroke(2.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1f, new float[] {7f, 4f}, 0f)
                    : new BasicStroke(2.2f));
        }
        return r;
    }

    private static void style(JFreeChart chart, XYPlot plot) {
        chart.setBackgroundPaint(Color.WHITE);
        chart.setAntiAlias(true);
        chart.getTitle().setFont(new Font(FONT, Font.BOLD, 16));
        chart.getLegend().setItemFont(new Font(FONT, Font.PLAIN, 13));
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(0xc9cfd4));
        plot.setRangeGridlinePaint(new Color(0xc9cfd4));
        plot.setOutlinePaint(new Color(0x8a949c));
        styleAxis(plot.getDomainAxis());
        styleAxis(plot.getRangeAxis());
    }

    private static void styleAxis(ValueAxis axis) {
        axis.setLabelFont(new Font(FONT, Font.PLAIN, 14));
        axis.setTickLabelFont(new Font(FONT, Font.PLAIN, 12));
        axis.setLabelPaint(new Color(0x1c2329));
        axis.setTickLabelPaint(new Color(0x1c2329));
    }

    private static String escape(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
