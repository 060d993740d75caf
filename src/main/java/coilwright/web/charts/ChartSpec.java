package coilwright.web.charts;

import java.util.List;
import java.util.Optional;

/**
 * A line chart: title, x axis, left y axis with its series, optionally a right y axis with its own.
 * Axis labels are shown as "label (unit)".
 *
 * @param widthPx  drawing width in px (the SVG scales to its container)
 * @param heightPx drawing height in px
 */
public record ChartSpec(String title, Axis x, Axis left, List<Series> leftSeries,
                        Optional<Axis> right, List<Series> rightSeries, int widthPx, int heightPx) {
    public static final int DEFAULT_WIDTH_PX = 720;
    public static final int DEFAULT_HEIGHT_PX = 400;

    /** An axis label and its unit, e.g. {@code new Axis("Speed", "rpm")}. */
    public record Axis(String label, String unit) {
        public String text() {
            return unit == null || unit.isBlank() ? label : label + " (" + unit + ")";
        }
    }

    public ChartSpec {
        leftSeries = List.copyOf(leftSeries);
        rightSeries = List.copyOf(rightSeries);
        if (leftSeries.isEmpty()) {
            throw new IllegalArgumentException("a chart needs at least one series on its left axis");
        }
        if (right.isEmpty() && !rightSeries.isEmpty()) {
            throw new IllegalArgumentException("right-axis series need a right axis");
        }
        if (widthPx < 100 || heightPx < 80) {
            throw new IllegalArgumentException("chart size " + widthPx + " x " + heightPx + ": must be at least 100 x 80 px");
        }
    }

    /** A chart with one y axis at the default size. */
    public static ChartSpec of(String title, Axis x, Axis y, List<Series> series) {
        return new ChartSpec(title, x, y, series, Optional.empty(), List.of(), DEFAULT_WIDTH_PX, DEFAULT_HEIGHT_PX);
    }

    /** The same chart with a second y axis on the right for these series. */
    public ChartSpec withRightAxis(Axis axis, List<Series> series) {
        return new ChartSpec(title, x, left, leftSeries, Optional.of(axis), series, widthPx, heightPx);
    }

    public ChartSpec withSize(int width, int height) {
        return new ChartSpec(title, x, left, leftSeries, right, rightSeries, width, height);
    }
}
