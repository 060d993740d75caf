package coilwright.web.charts;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.DatasetRenderingOrder;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYAreaRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * What is reached against what could be: a shaded envelope (the best possible), a strong line inside it (what is
 * achieved) and, on a second axis, a thin dashed line (for example the speed it runs at). Drawn by JFreeChart into
 * SVG.
 */
public final class EnvelopeChart {
    private EnvelopeChart() {
    }

    /**
     * @param envelope the upper bound, shaded down to zero
     * @param achieved the line drawn over it
     * @param right    the right axis and its series (drawn dashed)
     */
    public static String svg(String title, ChartSpec.Axis x, ChartSpec.Axis y, Series envelope, Series achieved,
                             ChartSpec.Axis right, Series rightSeries) {
        XYPlot plot = new XYPlot();
        plot.setDatasetRenderingOrder(DatasetRenderingOrder.FORWARD);
        NumberAxis xAxis = new NumberAxis(x.text());
        NumberAxis yAxis = new NumberAxis(y.text());
        NumberAxis rightAxis = new NumberAxis(right.text());
        plot.setDomainAxis(xAxis);
        plot.setRangeAxis(0, yAxis);
        plot.setRangeAxis(1, rightAxis);
        XYAreaRenderer area = new XYAreaRenderer(XYAreaRenderer.AREA);
        area.setSeriesPaint(0, new Color(0xd7e3ee));
        plot.setDataset(0, collection(envelope));
        plot.setRenderer(0, area);
        XYLineAndShapeRenderer line = new XYLineAndShapeRenderer(true, false);
        line.setSeriesPaint(0, new Color(0x9a4311));
        line.setSeriesStroke(0, new BasicStroke(3.2f));
        plot.setDataset(1, collection(achieved));
        plot.setRenderer(1, line);
        XYLineAndShapeRenderer speed = new XYLineAndShapeRenderer(true, false);
        speed.setSeriesPaint(0, new Color(0x24343f));
        speed.setSeriesStroke(0, new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1f,
                new float[] {3f, 4f}, 0f));
        plot.setDataset(2, collection(rightSeries));
        plot.setRenderer(2, speed);
        plot.mapDatasetToRangeAxis(2, 1);
        JFreeChart chart = new JFreeChart(title, new Font(Font.SANS_SERIF, Font.BOLD, 16), plot, true);
        chart.setBackgroundPaint(Color.WHITE);
        chart.getLegend().setItemFont(new Font(Font.SANS_SERIF, Font.PLAIN, 13));
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(0xc9cfd4));
        plot.setRangeGridlinePaint(new Color(0xc9cfd4));
        for (NumberAxis axis : List.of(xAxis, yAxis, rightAxis)) {
            axis.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 14));
            axis.setTickLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
        }
        return SvgCharts.svg(chart, title, ChartSpec.DEFAULT_WIDTH_PX, ChartSpec.DEFAULT_HEIGHT_PX);
    }

    private static XYSeriesCollection collection(Series s) {
        XYSeries xy = new XYSeries(s.name(), false, true);
        for (int i = 0; i < s.x().length; i++) {
            xy.add(s.x()[i], s.y()[i], false);
        }
        return new XYSeriesCollection(xy);
    }
}
