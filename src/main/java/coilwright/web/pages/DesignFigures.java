package coilwright.web.pages;

import coilwright.system.AlternatorEvaluation;
import coilwright.system.EvaluationRequest;
import coilwright.web.charts.ChartSpec;
import java.util.List;

/**
 * The results page's charts and winding layout for other pages that show one design (the saved design and its print
 * view), so they draw them with the same fragments ({@code fragments/winding :: layout}) and the same charts.
 *
 * @param charts  inline SVG: voltages; current and power; losses and efficiency, against speed
 * @param winding the winding layout as a rewinder reads it
 */
public record DesignFigures(List<String> charts, WindingView winding) {
    public static DesignFigures of(AlternatorEvaluation e, EvaluationRequest request) {
        return new DesignFigures(ResultCharts.of(e, request), WindingView.of(e.alternator().winding()));
    }

    /** Another chart drawn as the results page draws its own (scaling to its box on screen and paper). */
    public static String chart(ChartSpec spec) {
        return ResultCharts.scalable(spec);
    }
}
