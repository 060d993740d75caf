package coilwright.system;

import coilwright.load.Load;
import coilwright.machine.AlternatorSpec;
import coilwright.turbine.FurlingControl;
import coilwright.turbine.WindRotor;
import coilwright.validation.Checks;

import java.util.Optional;
import java.util.OptionalDouble;

/**
 * A wind system to match: rotor, alternator, load, site and wind regime.
 *
 * @param alternator      the machine
 * @param load            its battery (through a rectifier) or resistors
 * @param rotor           the wind rotor with its Cp curve, speed limit, drive ratio and drivetrain efficiency
 * @param site            air density (entered, or from altitude and temperature)
 * @param wind            annual mean wind speed and distribution shape, for the annual energy
 * @param maxWindSpeedMs  top of the wind-speed table and of the annual sum, m/s, 25 to 40 (0.5 m/s steps)
 * @param furling         over-speed control as the wind the rotor effectively sees (tail furling or a power-limit
 *                        curve); absent: none, the rotor always faces the whole wind (an rpm limit on the rotor
 *                        still applies)
 * @param availability    share of the year the turbine can run, 0.5 to 1; absent:
 *                        {@link coilwright.turbine.EnergyAssumptions#DEFAULT_AVAILABILITY}
 */
public record WindMatchRequest(AlternatorSpec alternator, Load load, WindRotor rotor, WindSite site, WindRegime wind,
                               double maxWindSpeedMs, Optional<FurlingControl> furling, OptionalDouble availability) {
    /** Step of the wind-speed table and bin width of the annual sum, m/s (IEC 61400-12-1). */
    public static final double WIND_STEP_MS = 0.5;

    public WindMatchRequest {
        furling = furling == null ? Optional.empty() : furling;
        availability = availability == null ? OptionalDouble.empty() : availability;
        Checks c = new Checks().present("alternator", alternator).present("load", load).present("rotor", rotor)
                .present("site", site).present("wind", wind).range("maxWindSpeedMs", maxWindSpeedMs, 25.0, 40.0);
        if (Double.isFinite(maxWindSpeedMs)) {
            c.require(Math.rint(maxWindSpeedMs / WIND_STEP_MS) * WIND_STEP_MS == maxWindSpeedMs, "maxWindSpeedMs",
                    maxWindSpeedMs, "must be a multiple of 0.5 m/s", "25 to 40 in 0.5 m/s steps");
        }
        if (availability.isPresent()) {
            c.range("availability", availability.getAsDouble(), 0.5, 1.0);
        }
        c.throwIfAny();
    }

    /** No over-speed control beyond the rotor's rpm limit, and the default availability. */
    public WindMatchRequest(AlternatorSpec alternator, Load load, WindRotor rotor, WindSite site, WindRegime wind,
                            double maxWindSpeedMs) {
        this(alternator, load, rotor, site, wind, maxWindSpeedMs, Optional.empty(), OptionalDouble.empty());
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
