package coilwright.web.pages;

import coilwright.cogging.CoggingTorque;
import coilwright.demag.DemagnetisationCheck;
import coilwright.demag.Verdict;
import coilwright.system.AlternatorEvaluation;
import coilwright.system.HeatAndLosses;
import coilwright.system.LossPoint;
import coilwright.web.Figure;
import coilwright.web.charts.ChartSpec;
import coilwright.web.charts.SvgCharts;
import coilwright.web.units.Fmt;
import coilwright.web.units.Shown;
import coilwright.web.units.Units;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.ToDoubleFunction;

/**
 * The results page's block on heat and losses: figures, the loss table by speed (columns that are zero at every
 * speed left out), the breakdown at rated speed as a bar chart, and what was assumed. Formatting only.
 *
 * @param basis       which winding temperature each figure uses
 * @param figures     temperatures, efficiency, cogging, starting torque, demagnetisation margin
 * @param headings    loss table headings with units
 * @param rows        one row per speed
 * @param chart       SVG bar chart of the losses at rated speed
 * @param assumptions what was assumed
 */
record HeatView(String basis, List<Figure> figures, List<String> headings, List<List<String>> rows, String chart,
                List<String> assumptions) {

    /** A loss: its table heading and its short name under the chart's bar. */
    private record Column(String heading, String bar, ToDoubleFunction<LossPoint> value) {
    }

    private static final List<Column> LOSSES = List.of(
            new Column("Copper", "Copper", LossPoint::windingCopperLossW),
            new Column("Eddy in conductors", "Eddy", LossPoint::conductorEddyLossW),
            new Column("Delta circulation", "Delta", LossPoint::deltaCirculationLossW),
            new Column("Stator iron", "Iron", LossPoint::statorIronLossW),
            new Column("Bearings", "Bearings", LossPoint::bearingFrictionLossW),
            new Column("Windage", "Windage", LossPoint::windageLossW),
            new Column("Diodes", "Diodes", LossPoint::diodeLossW),
            new Column("Cables", "Cables", LossPoint::cableLossW),
            new Column("Battery", "Battery", LossPoint::batteryInternalLossW));

    static HeatView of(AlternatorEvaluation e, Units units) {
        HeatAndLosses h = e.heatAndLosses();
        Fmt fmt = new Fmt(units);
        List<LossPoint> all = new ArrayList<>(h.points());
        all.add(h.rated());
        List<Column> shown = LOSSES.stream().filter(c -> all.stream().anyMatch(p -> c.value().applyAsDouble(p) > 0))
                .toList();
        List<String> headings = new ArrayList<>(List.of("Speed (rpm)", "Winding (" + Shown.CELSIUS.symbol(units) + ")",
                "Hot spot (" + Shown.CELSIUS.symbol(units) + ")", "Output (W)"));
        shown.forEach(c -> headings.add(c.heading() + " (W)"));
        headings.addAll(List.of("Shaft (W)", "Efficiency (%)"));
        List<List<String>> rows = new ArrayList<>();
        for (LossPoint p : h.points()) {
            List<String> row = new ArrayList<>(List.of(fmt.sig(p.speedRpm(), 4), temperature(fmt, p, units),
                    fmt.sig(Shown.CELSIUS.fromSi(p.windingHotSpotC(), units), 3), fmt.sig(p.powerToLoadW(), 3)));
            shown.forEach(c -> row.add(fmt.sig(c.value().applyAsDouble(p), 3)));
            row.add(fmt.sig(p.shaftPowerW(), 3));
            row.add(p.shaftPowerW() > 0 ? String.format(java.util.Locale.ROOT, "%.1f", 100 * p.efficiency()) : "—");
            rows.add(row);
        }
        return new HeatView(h.temperatureBasis(), figures(h, fmt, units), headings, rows, chart(h.rated(), shown),
                h.assumptions());
    }

    private static String temperature(Fmt fmt, LossPoint p, Units units) {
        String t = fmt.sig(Shown.CELSIUS.fromSi(p.windingMeanC(), units), 3);
        return p.temperatureSettled() ? t : "> " + t;
    }

    private static List<Figure> figures(HeatAndLosses h, Fmt fmt, Units units) {
        LossPoint r = h.rated();
        boolean hot = r.windingHotSpotC() > h.insulationLimitC();
        CoggingTorque c = h.cogging();
        DemagnetisationCheck d = h.demagnetisation();
        String limit = fmt.temp(h.insulationLimitC());
        return List.of(
                new Figure("heat-rated-temperature", "Winding at rated speed", (r.temperatureSettled() ? "" : "> ")
                        + fmt.temp(r.windingMeanC()), "hot spot " + fmt.temp(r.windingHotSpotC())
                        + ", insulation limit " + limit, hot ? "bad" : "ok"),
                Figure.of("heat-limit-speed", "Insulation limit reached at", h.insulationLimitReached()
                        ? fmt.sig(h.insulationLimitSpeedRpm(), 3) + " rpm" : "not in the range",
                        "speed where the hot spot reaches " + limit),
                Figure.of("heat-efficiency", "Efficiency at rated speed, every loss counted",
                        fmt.percent(r.efficiency()),
                        "shaft " + fmt.sig(r.shaftPowerW(), 3) + " W, losses " + fmt.sig(r.totalLossW(), 3) + " W"),
                Figure.of("heat-cogging", "Cogging torque, peak to peak",
                        fmt.shown(Shown.NEWTON_METRE, c.peakToPeakNm(), 3),
                        c.cyclesPerRevolution() > 0 ? c.cyclesPerRevolution() + " cycles per revolution" : c.note()),
                Figure.of("heat-starting-torque", "Torque to start from rest", fmt.shown(Shown.NEWTON_METRE,
                        h.startingTorqueNm(), 3), "peak cogging plus bearing break-away friction"),
                new Figure("heat-demagnetisation", "Demagnetisation margin", fmt.percent(d.margin()),
                        "short circuit at the highest speed, magnets at " + fmt.temp(d.magnetTempC()),
                        d.verdict() == Verdict.OK ? "ok" : d.verdict() == Verdict.WARNING ? "warn" : "bad"));
    }

    private static String chart(LossPoint rated, List<Column> shown) {
        List<String> names = shown.stream().map(Column::bar).toList();
        double[] watts = shown.stream().mapToDouble(c -> c.value().applyAsDouble(rated)).toArray();
        double top = 1.1 * java.util.Arrays.stream(watts).max().orElse(0);
        Map<String, double[]> series = new LinkedHashMap<>();
        series.put("Loss", watts);
        return SvgCharts.barChart(String.format(java.util.Locale.ROOT, "Losses at rated speed (%.0f rpm)",
                rated.speedRpm()), new ChartSpec.Axis("Where the power goes", ""), new ChartSpec.Axis("Loss", "W"),
                names, series, 0, top > 0 ? top : 1, 720, 320);
    }
}
