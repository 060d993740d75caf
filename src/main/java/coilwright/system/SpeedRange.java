package coilwright.system;

import coilwright.validation.Checks;

/**
 * Alternator speeds to evaluate, evenly spaced from {@code minRpm} to {@code maxRpm}.
 *
 * @param minRpm  lowest speed, rpm (0 to 100 000)
 * @param maxRpm  highest speed, rpm; above minRpm
 * @param points  number of speeds (2 to 1000)
 */
public record SpeedRange(double minRpm, double maxRpm, int points) {
    public static final int MAX_POINTS = 1000;

    /** Slowest top of a range, and slowest given speed, rpm: below it frequencies and drag figures underflow. */
    public static final double MIN_SPEED_RPM = 1;

    public SpeedRange {
        Checks c = new Checks().range("minRpm", minRpm, 0, 100_000).range("maxRpm", maxRpm, 0, 100_000)
                .intRange("points", points, 2, MAX_POINTS);
        if (!c.hasErrors()) {
            c.require(maxRpm >= MIN_SPEED_RPM, "maxRpm", maxRpm, "must be at least " + MIN_SPEED_RPM + " rpm",
                    MIN_SPEED_RPM + " to 100000");
        }
        if (!c.hasErrors()) {
            c.require(maxRpm > minRpm, "maxRpm", maxRpm, "must be above minRpm = " + Checks.fmt(minRpm)
                    + " (the range is empty or reversed)", "> minRpm");
        }
        c.throwIfAny();
    }

    /** The i-th speed, i = 0 .. points-1, rpm. */
    public double speedRpm(int i) {
        return minRpm + (maxRpm - minRpm) * i / (points - 1);
    }
}
