package coilwright.web.saved;

import coilwright.web.charts.ChartSpec;
import coilwright.web.charts.ChartSpec.Axis;
import coilwright.web.charts.Series;
import coilwright.web.pages.DesignFigures;
import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import java.util.Optional;

/**
 * The two revisions' curves on one chart, from their saved snapshots: power to the load (left axis) and open-circuit
 * line EMF (right axis) against speed, the first drawn as "first", the second as "second".
 */
final class CompareCurves {
    private static final Axis SPEED = new Axis("Speed", "rpm");

    private CompareCurves() {
    }

    /** The overlay, or empty when a snapshot holds no operating points. */
    static Optional<String> of(JsonNode first, JsonNode second) {
        JsonNode a = first.path("points");
        JsonNode b = second.path("points");
        if (!a.isArray() || a.isEmpty() || !b.isArray() || b.isEmpty()) {
            return Optional.empty();
        }
        List<Series> power = List.of(series("Power to load, first", a, "powerToLoadW"),
                series("Power to load, second", b, "powerToLoadW"));
        List<Series> emf = List.of(series("Open-circuit EMF, first", a, "emfLineRmsV"),
                series("Open-circuit EMF, second", b, "emfLineRmsV"));
        return Optional.of(DesignFigures.chart(ChartSpec.of("The two revisions over the speed range", SPEED,
                new Axis("Power to load", "W"), power).withRightAxis(new Axis("EMF", "V rms, line"), emf)));
    }

    private static Series series(String name, JsonNode points, String field) {
        double[] x = new double[points.size()];
        double[] y = new double[points.size()];
        for (int i = 0; i < points.size(); i++) {
            x[i] = points.get(i).path("speedRpm").asDouble();
            y[i] = points.get(i).path(field).asDouble();
        }
        return new Series(name, x, y);
    }
}
