package coilwright.turbine;

import coilwright.validation.Checks;

/**
 * One point of a user's rotor power limit.
 *
 * @param windSpeedMs     wind speed, m/s, 0 to 100
 * @param maxRotorPowerW  most power the rotor delivers at that wind speed, W, &gt;= 0
 */
public record PowerLimitPoint(double windSpeedMs, double maxRotorPowerW) {
    public PowerLimitPoint {
        new Checks().range("windSpeedMs", windSpeedMs, 0, 100).range("maxRotorPowerW", maxRotorPowerW, 0, 1e7)
                .throwIfAny();
    }
}
