package coilwright.sizing;

import coilwright.load.Load;
import coilwright.machine.AlternatorSpec;
import coilwright.system.WindMatchRequest;
import coilwright.system.WindRegime;
import coilwright.system.WindSite;
import coilwright.turbine.WindRotor;
import coilwright.validation.Checks;

/**
 * A wind rotor on its site, as on the wind match: the rotor (Cp curve, speed limit, drive ratio, drivetrain
 * efficiency), the air and the wind regime.
 *
 * @param rotor             the wind rotor and its drive
 * @param site              air density (entered, or from altitude and temperature)
 * @param wind              annual mean wind speed and Weibull shape
 * @param maxWindSpeedMs    top of the wind-speed table, m/s, 25 to 40 in 0.5 m/s steps
 * @param ratedWindSpeedMs  the wind speed whose matched point is "rated" (current density and efficiency are
 *                          checked there), m/s, 1 to maxWindSpeedMs in 0.5 m/s steps
 */
public record WindDrive(WindRotor rotor, WindSite site, WindRegime wind, double maxWindSpeedMs,
                        double ratedWindSpeedMs) implements Drive {
    public WindDrive {
        Checks c = new Checks().present("rotor", rotor).present("site", site).present("wind", wind)
                .range("maxWindSpeedMs", maxWindSpeedMs, 25, 40).range("ratedWindSpeedMs", ratedWindSpeedMs, 1, 40);
        halfStep(c, "maxWindSpeedMs", maxWindSpeedMs);
        halfStep(c, "ratedWindSpeedMs", ratedWindSpeedMs);
        if (!c.hasErrors()) {
            c.require(ratedWindSpeedMs <= maxWindSpeedMs, "ratedWindSpeedMs", ratedWindSpeedMs,
                    "must be at most maxWindSpeedMs = " + Checks.fmt(maxWindSpeedMs), "<= maxWindSpeedMs");
        }
        c.throwIfAny();
    }

    private static void halfStep(Checks c, String field, double v) {
        if (Double.isFinite(v)) {
            c.require(Math.rint(v / WindMatchRequest.WIND_STEP_MS) * WindMatchRequest.WIND_STEP_MS == v, field, v,
                    "must be a multiple of 0.5 m/s (the wind-speed table step)", "multiples of 0.5");
        }
    }

    /** The wind match of one alternator with this drive. */
    public WindMatchRequest matchRequest(AlternatorSpec alternator, Load load) {
        return new WindMatchRequest(alternator, load, rotor, site, wind, maxWindSpeedMs);
    }

    /** Row of the rated wind speed in the wind-speed table. */
    public int ratedRow() {
        return (int) Math.round(ratedWindSpeedMs / WindMatchRequest.WIND_STEP_MS);
    }
}
