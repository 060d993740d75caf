package coilwright.web.pages;

import coilwright.safety.Caution;
import coilwright.system.AlternatorEvaluation;
import coilwright.system.EvaluationRequest;
import coilwright.web.CarriedDesign;
import coilwright.web.NextSteps;
import coilwright.web.units.Shown;
import coilwright.web.units.Units;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/** Everything the results page shows, built from one evaluation; no calculation beyond formatting. */
final class ResultsModel {
    private ResultsModel() {
    }

    /**
     * @param title page heading, and the title offered when the design is saved
     */
    static Map<String, Object> of(String title, EvaluationRequest request, AlternatorEvaluation e, Units units) {
        Map<String, Object> m = new HashMap<>();
        m.put("heading", title);
        m.put("next", NextSteps.of(request, title));
        m.put("unitsLink", CarriedDesign.link("/design/results", request));
        m.put("summary", Summary.of(e, request, units));
        m.put("cautions", e.cautions().stream()
                .sorted(java.util.Comparator.comparing((Caution c) -> c.severity() != Caution.Severity.DANGER)).toList());
        m.put("warnings", e.warnings());
        m.put("charts", ResultCharts.of(e, request));
        m.put("table", PointTable.of(e, units));
        m.put("winding", WindingView.of(e.alternator().winding()));
        m.put("machine", machine(e, units));
        m.put("heat", HeatView.of(e, units));
        return m;
    }

    /** The machine's constants, for the record and for a rewinder's bench check. */
    private static List<List<String>> machine(AlternatorEvaluation e, Units units) {
        var a = e.alternator();
        return List.of(
                List.of("Series turns per phase", Integer.toString(a.seriesTurnsPerPhase())),
                List.of("EMF constant, line (V rms per rpm)" + (a.keMeasured() ? ", measured" : ""), f("%.4f", a.keLineRmsVPerRpm())),
                List.of("Torque constant (N·m per A rms)", f("%.3f", a.ktNmPerA())),
                List.of("Fundamental winding factor", f("%.4f", a.winding().fundamentalWindingFactor())),
                List.of("Air-gap flux density, fundamental (T)", f("%.3f", a.gapField().fundamentalAmplitude2dT())),
                List.of("Phase inductance (mH)", f("%.3g", 1000 * a.phaseInductanceH())
                        + (a.inductance().relativeUncertainty() > 0 ? f(" ± %.0f %%", 100 * a.inductance().relativeUncertainty()) : "")),
                List.of("Mean turn length (" + Shown.MM.symbol(units) + ")", Shown.MM.text(a.meanTurnLengthM(), units)),
                List.of("Copper mass (" + Shown.KILOGRAM.symbol(units) + ")", f("%.2f", Shown.KILOGRAM.fromSi(a.copperMassKg(), units))),
                List.of("Magnet mass (" + Shown.KILOGRAM.symbol(units) + ")", f("%.2f", Shown.KILOGRAM.fromSi(a.magnetMassKg(), units))));
    }

    private static String f(String format, double v) {
        return String.format(Locale.ROOT, format, v);
    }
}
