package coilwright.web.pages;

import coilwright.system.AlternatorEvaluation;
import coilwright.system.SpeedPoint;
import coilwright.web.units.Shown;
import coilwright.web.units.Units;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** The table of operating points: about twenty speeds spread over the range, each column with its unit. */
final class PointTable {
    static final int MAX_ROWS = 21;

    /** Column headings and the rows of formatted cells. */
    public record Table(List<String> headings, List<List<String>> rows) {
    }

    private PointTable() {
    }

    static Table of(AlternatorEvaluation e, Units units) {
        List<String> headings = List.of("Speed (rpm)", "Frequency (Hz)", "EMF, line (V rms)", "Terminal, line (V rms)",
                "DC current (A)", "Line current (A rms)", "Output (W)", "Losses (W)", "Efficiency (%)",
                "Shaft torque (" + Shown.NEWTON_METRE.symbol(units) + ")", "Current density (A/mm²)");
        List<SpeedPoint> pts = e.points();
        int step = Math.max(1, (int) Math.ceil((pts.size() - 1) / (double) (MAX_ROWS - 1)));
        List<List<String>> rows = new ArrayList<>();
        for (int i = 0; i < pts.size(); i += step) {
            rows.add(row(pts.get(i), units));
        }
        if ((pts.size() - 1) % step != 0) {
            rows.add(row(pts.get(pts.size() - 1), units));
        }
        return new Table(headings, rows);
    }

    private static List<String> row(SpeedPoint p, Units units) {
        return List.of(f("%.0f", p.speedRpm()), f("%.1f", p.frequencyHz()), f("%.1f", p.emfLineRmsV()),
                f("%.1f", p.terminalLineRmsV()), f("%.2f", p.dcCurrentA()), f("%.2f", p.lineCurrentRmsA()),
                f("%.0f", p.powerToLoadW()), f("%.0f", p.totalLossW()), f("%.1f", 100 * p.efficiency()),
                f("%.2f", Shown.NEWTON_METRE.fromSi(p.shaftTorqueNm(), units)), f("%.2f", p.currentDensityAPerMm2()));
    }

    private static String f(String format, double v) {
        return String.format(Locale.ROOT, format, v);
    }
}
