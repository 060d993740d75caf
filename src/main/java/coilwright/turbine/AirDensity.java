package coilwright.turbine;

import coilwright.validation.Checks;

/**
 * Air density at a site from the International Standard Atmosphere (ISA, ICAO Doc 7488/3, troposphere).
 * The <em>pressure</em> comes from the standard atmosphere at the given altitude; the <em>temperature</em>
 * is the site's own, so a hot high site gets a lower density than the ISA table shows.
 */
public final class AirDensity {
    /** ISA sea-level pressure, Pa. */
    public static final double SEA_LEVEL_PRESSURE_PA = 101_325.0;
    /** ISA sea-level temperature, K. */
    public static final double SEA_LEVEL_TEMPERATURE_K = 288.15;
    /** ISA tropospheric lapse rate, K/m. */
    public static final double LAPSE_RATE_K_PER_M = 0.0065;
    /** Standard gravity, m/s^2. */
    public static final double STANDARD_GRAVITY_MS2 = 9.80665;
    /** Specific gas constant of dry air used by the ISA, J/(kg K). */
    public static final double GAS_CONSTANT_AIR_J_PER_KG_K = 287.053;
    /** Lowest altitude accepted, m (below sea level, e.g. the Dead Sea shore). */
    public static final double MIN_ALTITUDE_M = -500.0;
    /** Top of the ISA troposphere, m; the lapse-rate formula holds up to here. */
    public static final double MAX_ALTITUDE_M = 11_000.0;

    private static final double ZERO_CELSIUS_K = 273.15;
    private static final double PRESSURE_EXPONENT =
            STANDARD_GRAVITY_MS2 / (GAS_CONSTANT_AIR_J_PER_KG_K * LAPSE_RATE_K_PER_M);

    private AirDensity() {
    }

    /**
     * Density of dry air at a site: p = p0 (1 - L h / T0)^(g0 / (R L)) (ISA troposphere), rho = p / (R T)
     * with T the site temperature.
     *
     * @param altitudeM     altitude above mean sea level, m, -500 to 11000
     * @param temperatureC  the site's air temperature, C, -60 to 60
     * @return air density, kg/m^3
     * @throws coilwright.validation.InvalidInputException naming the field out of range
     */
    public static double isa(double altitudeM, double temperatureC) {
        new Checks().range("altitudeM", altitudeM, MIN_ALTITUDE_M, MAX_ALTITUDE_M)
                .range("temperatureC", temperatureC, -60.0, 60.0)
                .throwIfAny();
        return pressurePa(altitudeM) / (GAS_CONSTANT_AIR_J_PER_KG_K * (temperatureC + ZERO_CELSIUS_K));
    }

    /**
     * Density of the standard atmosphere itself (ISA temperature T0 - L h at the altitude).
     *
     * @param altitudeM altitude above mean sea level, m, -500 to 11000
     * @return air density, kg/m^3 (1.225 at sea level)
     */
    public static double isaStandard(double altitudeM) {
        return isa(altitudeM, isaTemperatureC(altitudeM));
    }

    /**
     * ISA static pressure at an altitude, Pa (troposphere formula).
     *
     * @param altitudeM altitude above mean sea level, m, -500 to 11000
     */
    public static double pressurePa(double altitudeM) {
        new Checks().range("altitudeM", altitudeM, MIN_ALTITUDE_M, MAX_ALTITUDE_M).throwIfAny();
        return SEA_LEVEL_PRESSURE_PA
                * Math.pow(1.0 - LAPSE_RATE_K_PER_M * altitudeM / SEA_LEVEL_TEMPERATURE_K, PRESSURE_EXPONENT);
    }

    /**
     * ISA temperature at an altitude, C: 15 C at sea level falling 6.5 K per km.
     *
     * @param altitudeM altitude above mean sea level, m, -500 to 11000
     */
    public static double isaTemperatureC(double altitudeM) {
        new Checks().range("altitudeM", altitudeM, MIN_ALTITUDE_M, MAX_ALTITUDE_M).throwIfAny();
        return SEA_LEVEL_TEMPERATURE_K - LAPSE_RATE_K_PER_M * altitudeM - ZERO_CELSIUS_K;
    }
}
