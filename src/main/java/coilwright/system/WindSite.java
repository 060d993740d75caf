package coilwright.system;

import coilwright.turbine.AirDensity;
import coilwright.validation.Checks;

/**
 * Where a wind turbine stands: its air density, either entered or from the International Standard
 * Atmosphere pressure at the altitude and the site's own air temperature ({@link AirDensity#isa}).
 *
 * @param altitudeM       altitude above mean sea level, m, -500 to 11000
 * @param temperatureC    mean air temperature at the site, C, -60 to 60
 * @param airDensityKgM3  entered air density, kg/m^3, 0.5 to 1.6; 0 = from altitude and temperature (ISA)
 */
public record WindSite(double altitudeM, double temperatureC, double airDensityKgM3) {
    public WindSite {
        Checks c = new Checks();
        c.range("altitudeM", altitudeM, AirDensity.MIN_ALTITUDE_M, AirDensity.MAX_ALTITUDE_M);
        c.range("temperatureC", temperatureC, -60.0, 60.0);
        c.range("airDensityKgM3", airDensityKgM3, 0.0, 1.6);
        if (Double.isFinite(airDensityKgM3) && airDensityKgM3 > 0) {
            c.require(airDensityKgM3 >= 0.5, "airDensityKgM3", airDensityKgM3,
                    "must be 0 (from altitude and temperature) or 0.5 to 1.6", "0, or 0.5 to 1.6");
        }
        c.throwIfAny();
    }

    /** A sea-level site at 15 C (ISA standard, 1.225 kg/m^3). */
    public static WindSite standard() {
        return new WindSite(0.0, 15.0, 0.0);
    }

    /** The air density in use, kg/m^3. */
    public double effectiveAirDensityKgM3() {
        return airDensityKgM3 > 0 ? airDensityKgM3 : AirDensity.isa(altitudeM, temperatureC);
    }

    /** True when the density was entered rather than computed. */
    public boolean densityEntered() {
        return airDensityKgM3 > 0;
    }
}
