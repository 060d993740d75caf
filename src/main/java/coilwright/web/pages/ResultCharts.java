package coilwright.web.pages;

import coilwright.load.ResistiveLoad;
import coilwright.system.AlternatorEvaluation;
import coilwright.system.EvaluationRequest;
import coilwright.system.SpeedPoint;
import coilwright.web.charts.ChartSpec;
import coilwright.web.charts.ChartSpec.Axis;
import coilwright.web.charts.Series;
import coilwright.web.charts.SvgCharts;
import java.util.List;
import java.util.function.ToDoubleFunction;

/** The three result charts against speed, as inline SVG. */
final class ResultCharts {
    private static final Axis SPEED = new Axis("Speed", "rpm");

    private ResultCharts() {
    }

    /** Voltages; current and power; losses and efficiency. */
    static List<String> of(AlternatorEvaluation e, EvaluationRequest request) {
        List<SpeedPoint> pts = e.points();
        boolean battery = !(request.load() instanceof ResistiveLoad);
        ChartSpec voltages = ChartSpec.of("EMF and terminal voltage", SPEED, new Axis("Voltage", "V rms, line"),
                List.of(series("Open-circuit EMF", pts, SpeedPoint::emfLineRmsV),
                        series("Terminal voltage under load", pts, SpeedPoint::terminalLineRmsV)));
        ChartSpec current = ChartSpec.of(battery ? "Battery current and power" : "Line current and power", SPEED,
                        new Axis(battery ? "DC current" : "Line current", "A"),
                        List.of(battery ? series("DC current", pts, SpeedPoint::dcCurrentA)
                                : series("Line current (rms)", pts, SpeedPoint::lineCurrentRmsA)))
                .withRightAxis(new Axis("Power", "W"), List.of(series(battery ? "Power to battery" : "Power to load",
                        pts, SpeedPoint::powerToLoadW)));
        List<Series> lossSeries = new java.util.ArrayList<>(List.of(series("Winding copper", pts, SpeedPoint::windingCopperLossW),
                series("Cables", pts, SpeedPoint::cableLossW)));
        if (battery) {
            lossSeries.add(series("Diodes", pts, SpeedPoint::diodeLossW));
        }
        ChartSpec losses = ChartSpec.of("Losses and efficiency", SPEED, new Axis("Loss", "W"), lossSeries)
                .withRightAxis(new Axis("Efficiency", "%"), List.of(series("Efficiency", pts, p -> 100 * p.efficiency())));
        return List.of(scalable(voltages), scalable(current), scalable(losses));
    }

    /**
     * The chart with a viewBox, so it scales to its box on screen and paper instead of being clipped at its drawn
     * size (the charting helper writes width and height only).
     */
    static String scalable(ChartSpec spec) {
        String svg = SvgCharts.lineChart(spec);
        if (svg.contains("viewBox")) {
            return svg;
        }
        return svg.replaceFirst("<svg ", "<svg viewBox=\"0 0 " + spec.widthPx() + " " + spec.heightPx() + "\" ");
    }

    private static Series series(String name, List<SpeedPoint> pts, ToDoubleFunction<SpeedPoint> y) {
        return new Series(name, pts.stream().mapToDouble(SpeedPoint::speedRpm).toArray(), pts.stream().mapToDouble(y).toArray());
    }
}
