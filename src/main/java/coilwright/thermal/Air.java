package coilwright.thermal;

import coilwright.validation.Checks;

/**
 * Dry air at atmospheric pressure: kinematic viscosity, thermal conductivity and Prandtl number by linear
 * interpolation in the table of Incropera &amp; DeWitt, "Fundamentals of Heat and Mass Transfer", Table A.4
 * (air at 1 atm; values at 200 to 500 K, from memory of that table). Density from the ideal-gas law.
 * Valid from -73 C to 227 C, which covers every film temperature of a winding within IEC 60085 class H.
 */
public final class Air {
    /** Lowest temperature of the table, C. */
    public static final double MIN_TEMPERATURE_C = -73.15;
    /** Highest temperature of the table, C. */
    public static final double MAX_TEMPERATURE_C = 226.85;
    /** Specific heat at constant pressure, J/(kg K) (Incropera Table A.4, 1007 at 300 K). */
    public static final double SPECIFIC_HEAT_J_PER_KG_K = 1007.0;
    /** Specific gas constant of dry air, J/(kg K). */
    public static final double GAS_CONSTANT_J_PER_KG_K = 287.05;
    /** Standard atmospheric pressure, Pa. */
    public static final double STANDARD_PRESSURE_PA = 101_325.0;

    private static final double[] T_K = {200, 250, 300, 350, 400, 450, 500};
    private static final double[] NU_M2_S = {7.590e-6, 11.44e-6, 15.89e-6, 20.92e-6, 26.41e-6, 32.39e-6, 38.79e-6};
    private static final double[] K_W_M_K = {18.1e-3, 22.3e-3, 26.3e-3, 30.0e-3, 33.8e-3, 37.3e-3, 40.7e-3};
    private static final double[] PR = {0.737, 0.720, 0.707, 0.700, 0.690, 0.686, 0.684};

    private Air() {
    }

    /** Kinematic viscosity at atmospheric pressure, m^2/s. @param temperatureC -73 to 227 C */
    public static double kinematicViscosityM2s(double temperatureC) {
        return interpolate(NU_M2_S, temperatureC);
    }

    /** Thermal conductivity, W/(m K). @param temperatureC -73 to 227 C */
    public static double conductivityWPerMK(double temperatureC) {
        return interpolate(K_W_M_K, temperatureC);
    }

    /** Prandtl number. @param temperatureC -73 to 227 C */
    public static double prandtl(double temperatureC) {
        return interpolate(PR, temperatureC);
    }

    /** Density at standard pressure by the ideal-gas law, kg/m^3. @param temperatureC -73 to 227 C */
    public static double densityKgM3(double temperatureC) {
        check(temperatureC);
        return STANDARD_PRESSURE_PA / (GAS_CONSTANT_J_PER_KG_K * (temperatureC + 273.15));
    }

    /**
     * A temperature moved into the table's range. Correlations are evaluated at film temperatures; a film
     * outside the table (a surface far beyond any insulation class) is taken at the nearest end.
     */
    public static double clampC(double temperatureC) {
        return Math.max(MIN_TEMPERATURE_C, Math.min(MAX_TEMPERATURE_C, temperatureC));
    }

    private static double interpolate(double[] values, double temperatureC) {
        check(temperatureC);
        double t = temperatureC + 273.15;
        int i = Math.min(T_K.length - 2, Math.max(0, (int) ((t - T_K[0]) / 50.0)));
        double w = (t - T_K[i]) / (T_K[i + 1] - T_K[i]);
        return values[i] + w * (values[i + 1] - values[i]);
    }

    private static void check(double temperatureC) {
        new Checks().range("airTemperatureC", temperatureC, MIN_TEMPERATURE_C, MAX_TEMPERATURE_C).throwIfAny();
    }
}
