package coilwright.turbine;

import coilwright.validation.Checks;

import java.util.List;

/**
 * A user's curve of the most power the rotor delivers by wind speed (from a maker's power curve or a test), linear
 * between points, no limit below the first point and the last value beyond the last. Where the rotor's ideal power
 * exceeds the limit, the effective wind is reduced by the cube root of the ratio (see {@link FurlingControl}).
 *
 * @param points at least two points with strictly increasing wind speed
 */
public record PowerLimitCurve(List<PowerLimitPoint> points) implements FurlingControl {
    public PowerLimitCurve {
        Checks c = new Checks().present("points", points);
        if (points != null) {
            c.require(points.size() >= 2, "points", points.size() + " points", "needs at least 2 points", ">= 2 points");
            for (int i = 1; i < points.size(); i++) {
                c.require(points.get(i).windSpeedMs() > points.get(i - 1).windSpeedMs(), "points[" + i + "].windSpeedMs",
                        points.get(i).windSpeedMs(), "must exceed the previous point's wind speed", "increasing");
            }
        }
        c.throwIfAny();
        points = List.copyOf(points);
    }

    /** The power limit at a wind speed, W (infinite below the first point). */
    public double limitW(double windSpeedMs) {
        if (windSpeedMs < points.get(0).windSpeedMs()) {
            return Double.POSITIVE_INFINITY;
        }
        for (int i = 1; i < points.size(); i++) {
            PowerLimitPoint a = points.get(i - 1);
            PowerLimitPoint b = points.get(i);
            if (windSpeedMs <= b.windSpeedMs()) {
                double w = (windSpeedMs - a.windSpeedMs()) / (b.windSpeedMs() - a.windSpeedMs());
                return a.maxRotorPowerW() + w * (b.maxRotorPowerW() - a.maxRotorPowerW());
            }
        }
        return points.get(points.size() - 1).maxRotorPowerW();
    }

    @Override
    public double effectiveWindSpeedMs(double windSpeedMs, WindRotor rotor, double airDensityKgM3) {
        new Checks().range("windSpeedMs", windSpeedMs, 0, 100).present("rotor", rotor).throwIfAny();
        double limit = limitW(windSpeedMs);
        double ideal = windSpeedMs == 0 ? 0 : rotor.idealPowerW(windSpeedMs, airDensityKgM3);
        if (ideal <= limit) {
            return windSpeedMs;
        }
        return windSpeedMs * Math.cbrt(limit / ideal);
    }
}
