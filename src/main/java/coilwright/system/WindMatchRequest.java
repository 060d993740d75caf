package coilwright.system;

import coilwright.load.Load;
import coilwright.machine.AlternatorSpec;
import coilwright.turbine.WindRotor;
import coilwright.validation.Checks;

/**
 * A wind system to match: rotor, alternator, load, site and wind regime.
 *
 * @param alternator      the machine
 * @param load            its battery (through a rectifier) or resistors
 * @param rotor           the wind rotor with its Cp curve, speed limit, drive ratio and drivetrain efficiency
 * @param site            air density (entered, or from altitude and temperature)
 * @param wind            annual mean wind speed and distribution shape, for the annual energy
 * @param maxWindSpeedMs  top of the wind-speed table and of the annual sum, m/s, 25 to 40 (0.5 m/s steps)
 */
public record WindMatchRequest(AlternatorSpec alternator, Load load, WindRotor rotor, WindSite site, WindRegime wind,
                               double maxWindSpeedMs) {
    /** Step of the wind-speed table and bin width of the annual sum, m/s (IEC 61400-12-1). */
    public static final double WIND_STEP_MS = 0.5;

    public WindMatchRequest {
        Checks c = new Checks().present("alternator", alternator).present("load", load).present("rotor", rotor)
                .present("site", site).present("wind", wind).range("maxWindSpeedMs", maxWindSpeedMs, 25.0, 40.0);
        if (Double.isFinite(maxWindSpeedMs)) {
            c.require(Math.rint(maxWindSpeedMs / WIND_STEP_MS) * WIND_STEP_MS == maxWindSpeedMs, "maxWindSpeedMs",
                    maxWindSpeedMs, "must be a multiple of 0.5 m/s", "25 to 40 in 0.5 m/s steps");
        }
        c.throwIfAny();
    }

    /** The tabulated wind speeds 0, 0.5, ... maxWindSpeedMs, m/s. */
    public double[] windSpeedsMs() {
        int n = (int) Math.round(maxWindSpeedMs / WIND_STEP_MS);
        double[] v = new double[n + 1];
        for (int i = 0; i <= n; i++) {
            v[i] = i * WIND_STEP_MS;
        }
        return v;
    }
}
