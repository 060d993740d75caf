package coilwright.web.charts;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Ellipse2D;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.DatasetRenderingOrder;
import org.jfree.chart.plot.SeriesRenderingOrder;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.LookupPaintScale;
import org.jfree.chart.renderer.xy.XYAreaRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * A field of curves shaded by a third quantity (one band per level, lighter for lower levels, with a colour scale
 * beside the plot), lines drawn through it and labelled points on them; for example a rotor's torque against speed
 * at many wind speeds, the torque an alternator takes, and where the two meet. Drawn by JFreeChart into SVG.
 */
public final class FieldChart {
    private static final Color LOW = new Color(0xeef2f5);
    private static final Color HIGH = new Color(0x4d6b84);
    private static final List<Color> LINES = List.of(new Color(0x9a4311), new Color(0x1c2329), new Color(0x2e7d32));

    /**
     * @param level the value the band stands for (e.g. 8 for 8 m/s); its curve bounds the band from above
     */
    public record Band(double level, Series curve) {
    }

    /** A marked point with its label, e.g. the operating point at 8 m/s. */
    public record Point(double x, double y, String label) {
    }

    /**
     * @param field       name and unit of the shading quantity, e.g. "Wind speed" in "m/s"
     * @param bands       the curves, any order (drawn highest level first so every band stays visible)
     * @param lines       lines over the field, the first drawn strongest
     * @param pointsName  legend name of the points
     * @param xMax        the x axis runs from 0 to this
     * @param yMax        the y axis runs from 0 to this (lines may leave the plot at the top)
     */
    public record Spec(String title, ChartSpec.Axis x, ChartSpec.Axis y, ChartSpec.Axis field, List<Band> bands,
                       List<Series> lines, String pointsName, List<Point> points, double xMax, double yMax,
                       int widthPx, int heightPx) {
        public Spec {
            bands = bands.stream().sorted((a, b) -> Double.compare(b.level(), a.level())).toList();
            lines = List.copyOf(lines);
            points = List.copyOf(points);
            if (bands.isEmpty() || !(xMax > 0) || !(yMax > 0)) {
                throw new IllegalArgumentException("a field chart needs at least one band and positive x and y ranges");
            }
        }
    }

    private FieldChart() {
    }

    public static String svg(Spec spec) {
        XYPlot plot = new XYPlot();
        plot.setDatasetRenderingOrder(DatasetRenderingOrder.FORWARD);
        plot.setSeriesRenderingOrder(SeriesRenderingOrder.FORWARD);
        NumberAxis x = new NumberAxis(spec.x().text());
        NumberAxis y = new NumberAxis(spec.y().text());
        y.setRange(0, spec.yMax());
        x.setRange(0, spec.xMax());
        plot.setDomainAxis(x);
        plot.setRangeAxis(y);
        LookupPaintScale scale = scale(spec.bands());
        XYSeriesCollection field = new XYSeriesCollection();
        XYAreaRenderer areas = new XYAreaRenderer(XYAreaRenderer.AREA);
        for (int i = 0; i < spec.bands().size(); i++) {
            Band b = spec.bands().get(i);
            field.addSeries(series(b.curve()));
            areas.setSeriesPaint(i, scale.getPaint(b.level()));
            areas.setSeriesVisibleInLegend(i, false);
        }
        plot.setDataset(0, field);
        plot.setRenderer(0, areas);
        XYSeriesCollection lines = new XYSeriesCollection();
        XYLineAndShapeRenderer lineRenderer = new XYLineAndShapeRenderer(true, false);
        for (int i = 0; i < spec.lines().size(); i++) {
            lines.addSeries(series(spec.lines().get(i)));
            lineRenderer.setSeriesPaint(i, LINES.get(i % LINES.size()));
            lineRenderer.setSeriesStroke(i, i == 0 ? new BasicStroke(3.2f) : new BasicStroke(1.8f, BasicStroke.CAP_BUTT,
                    BasicStroke.JOIN_ROUND, 1f, new float[] {7f, 4f}, 0f));
        }
        plot.setDataset(1, lines);
        plot.setRenderer(1, lineRenderer);
        if (!spec.points().isEmpty()) {
            XYSeries marks = new XYSeries(spec.pointsName(), false, true);
            for (Point p : spec.points()) {
                marks.add(p.x(), p.y());
                XYTextAnnotation label = new XYTextAnnotation(p.label(), p.x(), p.y());
                label.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 12));
                label.setTextAnchor(TextAnchor.BOTTOM_RIGHT);
                label.setPaint(new Color(0x1c2329));
                plot.addAnnotation(label);
            }
            XYLineAndShapeRenderer dots = new XYLineAndShapeRenderer(false, true);
            dots.setSeriesShape(0, new Ellipse2D.Double(-4.5, -4.5, 9, 9));
            dots.setSeriesPaint(0, new Color(0x1c2329));
            plot.setDataset(2, new XYSeriesCollection(marks));
            plot.setRenderer(2, dots);
        }
        JFreeChart chart = new JFreeChart(spec.title(), new Font(Font.SANS_SERIF, Font.BOLD, 16), plot, true);
        chart.setBackgroundPaint(Color.WHITE);
        chart.getLegend().setItemFont(new Font(Font.SANS_SERIF, Font.PLAIN, 13));
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(0xc9cfd4));
        plot.setRangeGridlinePaint(new Color(0xc9cfd4));
        for (NumberAxis axis : List.of(x, y)) {
            axis.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 14));
            axis.setTickLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
        }
        NumberAxis levels = new NumberAxis(spec.field().text());
        levels.setRange(scale.getLowerBound(), scale.getUpperBound());
        double step = (scale.getUpperBound() - scale.getLowerBound()) / spec.bands().size();
        levels.setTickUnit(new org.jfree.chart.axis.NumberTickUnit(spec.bands().size() > 8 ? 2 * step : step));
        levels.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 13));
        PaintScaleLegend key = new PaintScaleLegend(scale, levels);
        key.setPosition(RectangleEdge.RIGHT);
        key.setStripWidth(14);
        key.setMargin(6, 10, 30, 4);
        chart.addSubtitle(key);
        return SvgCharts.svg(chart, spec.title(), spec.widthPx(), spec.heightPx());
    }

    /** Each band's colour, from light (lowest level) to dark (highest), held across the band up to the next level. */
    private static LookupPaintScale scale(List<Band> bands) {
        double low = bands.get(bands.size() - 1).level();
        double high = bands.get(0).level();
        double step = bands.size() > 1 ? (high - low) / (bands.size() - 1) : 1;
        LookupPaintScale scale = new LookupPaintScale(low - step, high, LOW);
        for (Band b : bands) {
            double t = high == low ? 1 : (b.level() - low) / (high - low);
            scale.add(b.level() - step * (1 - 1e-9), blend(t));
        }
        return scale;
    }

    private static Color blend(double t) {
        return new Color((int) Math.round(LOW.getRed() + t * (HIGH.getRed() - LOW.getRed())),
                (int) Math.round(LOW.getGreen() + t * (HIGH.getGreen() - LOW.getGreen())),
                (int) Math.round(LOW.getBlue() + t * (HIGH.getBlue() - LOW.getBlue())));
    }

    private static XYSeries series(Series s) {
        XYSeries xy = new XYSeries(s.name(), false, true);
        for (int i = 0; i < s.x().length; i++) {
            xy.add(s.x()[i], s.y()[i], false);
        }
        return xy;
    }
}
