package coilwright.turbine;

import coilwright.validation.Checks;

/**
 * A furling tail described by two wind speeds. Below {@code furlStartMs} the rotor faces the wind. Between the two
 * the rotor yaws just enough to hold its effective wind at the furl-start speed (gamma = acos(v1 / v)), which is
 * what a well-set tail aims at: power held near its value at furl start. At {@code fullyFurledMs} the tail reaches
 * its stop, gamma_max = acos(v1 / v2); above it the angle stays and the effective wind rises again as v v1 / v2.
 *
 * @param furlStartMs    wind speed at which furling begins, m/s, 3 to 40
 * @param fullyFurledMs  wind speed at which the tail reaches its stop, m/s, above furlStartMs and at most 60
 */
public record TailFurling(double furlStartMs, double fullyFurledMs) implements FurlingControl {
    public TailFurling {
        Checks c = new Checks().range("furlStartMs", furlStartMs, 3, 40).range("fullyFurledMs", fullyFurledMs, 3, 60);
        if (!c.hasErrors()) {
            c.require(fullyFurledMs > furlStartMs, "fullyFurledMs", fullyFurledMs,
                    "must exceed furlStartMs = " + Checks.fmt(furlStartMs), "> furlStartMs");
        }
        c.throwIfAny();
    }

    @Override
    public double effectiveWindSpeedMs(double windSpeedMs, WindRotor rotor, double airDensityKgM3) {
        new Checks().range("windSpeedMs", windSpeedMs, 0, 100).throwIfAny();
        if (windSpeedMs <= furlStartMs) {
            return windSpeedMs;
        }
        if (windSpeedMs <= fullyFurledMs) {
            return furlStartMs;
        }
        return windSpeedMs * furlStartMs / fullyFurledMs;
    }

    /** Yaw angle out of the wind at a wind speed, degrees. */
    public double furlAngleDeg(double windSpeedMs) {
        new Checks().range("windSpeedMs", windSpeedMs, 0, 100).throwIfAny();
        if (windSpeedMs <= furlStartMs) {
            return 0;
        }
        return Math.toDegrees(Math.acos(furlStartMs / Math.min(windSpeedMs, fullyFurledMs)));
    }
}
