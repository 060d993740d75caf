package coilwright.web.match;

import coilwright.system.HydroMatchResult;
import coilwright.system.LoadCurvePoint;
import coilwright.system.RunnerCurvePoint;
import coilwright.system.WindMatchPoint;
import coilwright.system.WindMatchResult;
import coilwright.turbine.WindRotor;
import coilwright.web.charts.ChartSpec;
import coilwright.web.charts.ChartSpec.Axis;
import coilwright.web.charts.EnvelopeChart;
import coilwright.web.charts.FieldChart;
import coilwright.web.charts.Series;
import coilwright.web.charts.SvgCharts;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** The server-side SVG charts of the match pages. */
final class MatchCharts {
    /** The wind speeds whose torque curves shade the field, m/s. */
    static final double[] CHART_WIND_SPEEDS_MS = {3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14};
    private static final int CURVE_POINTS = 60;

    private MatchCharts() {
    }

    /**
     * The rotor's torque against its speed as a field shaded by wind speed, the torque the alternator takes at the
     * rotor shaft drawn through it (its operating line), the torque of the rotor at its best tip-speed ratio, and
     * the matched operating points labelled with their wind speeds: where the operating line crosses a wind
     * speed's torque curve, the rotor runs.
     */
    static String windMatching(WindRotor rotor, WindMatchResult r) {
        List<LoadCurvePoint> load = r.alternatorCurve();
        double top = load.get(load.size() - 1).turbineSpeedRpm();
        double rho = r.airDensityKgM3();
        List<FieldChart.Band> bands = new ArrayList<>();
        double yMax = 0;
        for (double v : CHART_WIND_SPEEDS_MS) {
            double[] n = new double[CURVE_POINTS + 1];
            double[] t = new double[CURVE_POINTS + 1];
            for (int i = 0; i <= CURVE_POINTS; i++) {
                n[i] = top * i / CURVE_POINTS;
                t[i] = Math.max(0, rotor.torqueNm(v, n[i], rho));
                yMax = Math.max(yMax, t[i]);
            }
            bands.add(new FieldChart.Band(v, new Series(String.format(Locale.ROOT, "%.0f m/s", v), n, t)));
        }
        double[] n = load.stream().mapToDouble(LoadCurvePoint::turbineSpeedRpm).toArray();
        double[] demand = load.stream().mapToDouble(LoadCurvePoint::torqueAtTurbineNm).toArray();
        double[] best = new double[n.length];
        for (int i = 0; i < n.length; i++) {
            double v = windForBestTipSpeedRatio(rotor, r.optimumTipSpeedRatio(), n[i]);
            best[i] = v > 0 && v <= 100 ? rotor.torqueNm(v, n[i], rho) : 0;
        }
        List<FieldChart.Point> points = new ArrayList<>();
        for (WindMatchPoint p : r.points()) {
            boolean shown = java.util.Arrays.stream(CHART_WIND_SPEEDS_MS).anyMatch(v -> v == p.windSpeedMs());
            if (shown && p.rotorSpeedRpm() > 0 && p.rotorSpeedRpm() <= top) {
                double torque = p.rotorPowerW() / (p.rotorSpeedRpm() * Math.PI / 30);
                points.add(new FieldChart.Point(p.rotorSpeedRpm(), torque, String.format(Locale.ROOT, "%.0f m/s",
                        p.windSpeedMs())));
            }
        }
        return FieldChart.svg(new FieldChart.Spec("Operating line through the rotor's torque field",
                new Axis("Rotor speed", "rpm"), new Axis("Torque at the rotor shaft", "N·m"), new Axis("Wind speed", "m/s"),
                bands, List.of(new Series("Alternator's torque (operating line)", n, demand),
                        new Series("Rotor at its best tip-speed ratio", n, best)),
                "Where they meet", points, top, 1.1 * Math.max(yMax, 1e-3), ChartSpec.DEFAULT_WIDTH_PX,
                ChartSpec.DEFAULT_HEIGHT_PX + 60));
    }

    /** The wind speed at which the rotor turning at {@code rotorSpeedRpm} runs at the tip-speed ratio given, m/s. */
    private static double windForBestTipSpeedRatio(WindRotor rotor, double tipSpeedRatio, double rotorSpeedRpm) {
        return rotorSpeedRpm * Math.PI / 30 * rotor.radiusM() / tipSpeedRatio;
    }

    /**
     * Power to the battery against wind speed: the ideal rotor's (always at its best tip-speed ratio) as a shaded
     * envelope, the matched rotor's as a line inside it, and the rotor speed on a second axis.
     */
    static String windPowerCurve(WindMatchResult r) {
        double[] v = r.points().stream().mapToDouble(WindMatchPoint::windSpeedMs).toArray();
        return EnvelopeChart.svg("Power to the battery against wind speed", new Axis("Wind speed", "m/s"),
                new Axis("Power to the battery", "W"),
                new Series("Ideal rotor (best tip-speed ratio)", v,
                        r.points().stream().mapToDouble(WindMatchPoint::idealBatteryPowerW).toArray()),
                new Series("Matched rotor", v, r.points().stream().mapToDouble(WindMatchPoint::powerToBatteryW).toArray()),
                new Axis("Rotor speed", "rpm"),
                new Series("Rotor speed", v, r.points().stream().mapToDouble(WindMatchPoint::rotorSpeedRpm).toArray()));
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
