package coilwright.web.match;

import coilwright.system.HydroMatchResult;
import coilwright.system.LoadCurvePoint;
import coilwright.system.RunnerCurvePoint;
import coilwright.system.WindMatchPoint;
import coilwright.system.WindMatchResult;
import coilwright.turbine.WindRotor;
import coilwright.web.charts.ChartSpec;
import coilwright.web.charts.ChartSpec.Axis;
import coilwright.web.charts.Series;
import coilwright.web.charts.SvgCharts;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** The server-side SVG charts of the match pages. */
final class MatchCharts {
    static final double[] CHART_WIND_SPEEDS_MS = {4, 6, 8, 10, 12, 14};
    private static final int CURVE_POINTS = 60;

    private MatchCharts() {
    }

    /** Rotor power against rotor speed at several wind speeds, with the alternator's demand drawn over them. */
    static String windMatching(WindRotor rotor, WindMatchResult r) {
        List<LoadCurvePoint> load = r.alternatorCurve();
        double top = load.get(load.size() - 1).turbineSpeedRpm();
        List<Series> series = new ArrayList<>();
        for (double v : CHART_WIND_SPEEDS_MS) {
            double[] n = new double[CURVE_POINTS + 1];
            double[] p = new double[CURVE_POINTS + 1];
            for (int i = 0; i <= CURVE_POINTS; i++) {
                n[i] = top * i / CURVE_POINTS;
                p[i] = rotor.powerW(v, n[i], r.airDensityKgM3());
            }
            series.add(new Series(String.format(Locale.ROOT, "Rotor at %.0f m/s", v), n, p));
        }
        series.add(new Series("Alternator demand at the rotor shaft",
                load.stream().mapToDouble(LoadCurvePoint::turbineSpeedRpm).toArray(),
                load.stream().mapToDouble(LoadCurvePoint::powerAtTurbineW).toArray()));
        return SvgCharts.lineChart(ChartSpec.of("Matching: rotor power and alternator demand",
                new Axis("Rotor speed", "rpm"), new Axis("Power", "W"), series));
    }

    /** Battery power of the matched and of the ideal rotor against wind speed. */
    static String windPowerCurve(WindMatchResult r) {
        double[] v = r.points().stream().mapToDouble(WindMatchPoint::windSpeedMs).toArray();
        return SvgCharts.lineChart(ChartSpec.of("Power to the battery", new Axis("Wind speed", "m/s"),
                new Axis("Power", "W"), List.of(
                        new Series("Matched", v, r.points().stream().mapToDouble(WindMatchPoint::powerToBatteryW).toArray()),
                        new Series("Ideal rotor", v, r.points().stream().mapToDouble(WindMatchPoint::idealBatteryPowerW).toArray())))
                .withRightAxis(new Axis("Rotor speed", "rpm"), List.of(new Series("Rotor speed", v,
                        r.points().stream().mapToDouble(WindMatchPoint::rotorSpeedRpm).toArray()))));
    }

    /** Runner power against runner speed with the alternator's demand drawn over it. */
    static String hydroMatching(HydroMatchResult r) {
        List<RunnerCurvePoint> runner = r.runnerCurve();
        List<LoadCurvePoint> load = r.alternatorCurve();
        return SvgCharts.lineChart(ChartSpec.of("Matching: runner power and alternator demand",
                new Axis("Runner speed", "rpm"), new Axis("Power", "W"), List.of(
                        new Series("Runner at design flow", runner.stream().mapToDouble(RunnerCurvePoint::runnerSpeedRpm).toArray(),
                                runner.stream().mapToDouble(RunnerCurvePoint::powerW).toArray()),
                        new Series("Alternator demand at the runner shaft",
                                load.stream().mapToDouble(LoadCurvePoint::turbineSpeedRpm).toArray(),
                                load.stream().mapToDouble(LoadCurvePoint::powerAtTurbineW).toArray()),
                        new Series("Power to battery", load.stream().mapToDouble(LoadCurvePoint::turbineSpeedRpm).toArray(),
                                load.stream().mapToDouble(LoadCurvePoint::powerToBatteryW).toArray()))));
    }
}
