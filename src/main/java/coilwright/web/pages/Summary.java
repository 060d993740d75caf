package coilwright.web.pages;

import coilwright.conductor.CurrentDensity;
import coilwright.conductor.FillCheck;
import coilwright.load.ResistiveLoad;
import coilwright.system.AlternatorEvaluation;
import coilwright.system.EvaluationRequest;
import coilwright.system.SpeedPoint;
import coilwright.web.Figure;
import coilwright.web.units.Shown;
import coilwright.web.units.Units;
import java.util.List;
import java.util.Locale;

/** The figures an installer reads first: cut-in, rated output and efficiency, heat, fill and over-speed voltage. */
final class Summary {
    private Summary() {
    }

    static List<Figure> of(AlternatorEvaluation e, EvaluationRequest request, Units units) {
        SpeedPoint rated = e.rated();
        CurrentDensity j = e.ratedCurrentDensity();
        FillCheck fill = e.alternator().fill();
        String temp = Shown.CELSIUS.text(request.alternator().windingTempC(), units) + " " + Shown.CELSIUS.symbol(units);
        return List.of(cutIn(e, request),
                new Figure("rated-output", "Output at rated speed", fmt("%.0f W", rated.powerToLoadW()),
                        fmt("at %.0f rpm", rated.speedRpm()), ""),
                new Figure("rated-efficiency", "Efficiency at rated speed", fmt("%.1f %%", 100 * rated.efficiency()),
                        "electrical losses only, at the winding temperature entered; with every loss: see Heat and "
                                + "losses", ""),
                new Figure("hot-resistance", "Phase resistance, hot", fmt("%.3g Ω", e.alternator().phaseResistanceHotOhm()),
                        "at " + temp + fmt(" (%.3g Ω at 20 °C)", e.alternator().resistance().resistance20COhm()), ""),
                new Figure("current-density", "Current density at rated speed", fmt("%.2f A/mm²", j.densityAPerMm2()),
                        fmt("usual band %.0f–%.0f A/mm² for ", j.bandLowAPerMm2(), j.bandHighAPerMm2())
                                + j.cooling().name().toLowerCase(Locale.ROOT).replace('_', ' '),
                        j.status() == CurrentDensity.Status.OK ? "ok" : "bad"),
                new Figure("fill", fill.basis() == FillCheck.Basis.COPPER_FILL ? "Copper fill of the slot" : "Wire fill of the coil",
                        fmt("%.0f %%", 100 * (fill.basis() == FillCheck.Basis.COPPER_FILL ? fill.copperFill() : fill.wireFill())),
                        fmt("practical limit %.0f %%", 100 * fill.practicalLimit()),
                        fill.level() == FillCheck.Level.OK ? "ok" : fill.level() == FillCheck.Level.HIGH ? "warn" : "bad"),
                new Figure("open-circuit", "Open-circuit voltage at maximum speed",
                        fmt("%.0f V rms", e.openCircuitLineRmsVAtMaxSpeed()),
                        fmt("line to line at %.0f rpm, %.0f V peak", e.maxSpeedRpm(), Math.sqrt(2) * e.openCircuitLineRmsVAtMaxSpeed()),
                        e.cautions().stream().anyMatch(c -> c.code().equals("OPEN_CIRCUIT_VOLTAGE")
                                && c.severity() == coilwright.safety.Caution.Severity.DANGER) ? "bad" : ""));
    }

    private static Figure cutIn(AlternatorEvaluation e, EvaluationRequest request) {
        if (request.load() instanceof ResistiveLoad) {
            return new Figure("cut-in", "Cut-in speed", "none", "a resistor bank takes current at any speed", "");
        }
        String status = e.cutInSpeedRpm() <= request.speedRange().maxRpm() ? "ok" : "bad";
        return new Figure("cut-in", "Cut-in speed", fmt("%.0f rpm", e.cutInSpeedRpm()),
                fmt("battery charging starts (%.0f rpm on the solved curve)", e.cutInSpeedSolvedRpm()), status);
    }

    private static String fmt(String format, Object... args) {
        return String.format(Locale.ROOT, format, args);
    }
}
