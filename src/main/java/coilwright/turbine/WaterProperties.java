package coilwright.turbine;

import coilwright.validation.Checks;

/** Properties of fresh liquid water at atmospheric pressure, 0 to 40 C. */
public final class WaterProperties {
    /** Density used for hydraulic power, kg/m^3 (within 0.3 % over 0 to 30 C; common practice). */
    public static final double NOMINAL_DENSITY_KG_M3 = 1000.0;
    /** Standard gravity, m/s^2. */
    public static final double GRAVITY_MS2 = 9.80665;

    private static final double VOGEL_A_PA_S = 0.02939e-3;
    private static final double VOGEL_B_K = 507.88;
    private static final double VOGEL_C_K = 149.3;

    private WaterProperties() {
    }

    /**
     * Dynamic viscosity by the Vogel equation mu = A exp(B / (T - C)) (Vogel 1921) with
     * A = 0.02939 mPa s, B = 507.88 K, C = 149.3 K (fitted constants, from memory; checked against
     * 1.0016 mPa s at 20 C in the reference test).
     *
     * @param temperatureC water temperature, C, 0 to 40
     * @return dynamic viscosity, Pa s
     */
    public static double dynamicViscosityPaS(double temperatureC) {
        check(temperatureC);
        return VOGEL_A_PA_S * Math.exp(VOGEL_B_K / (temperatureC + 273.15 - VOGEL_C_K));
    }

    /**
     * Density of air-free water by the formula of Tanaka et al., Metrologia 38 (2001) 301-309.
     *
     * @param temperatureC water temperature, C, 0 to 40
     * @return density, kg/m^3
     */
    public static double densityKgM3(double temperatureC) {
        check(temperatureC);
        double t = temperatureC;
        return 999.974950 * (1.0 - (t - 3.983035) * (t - 3.983035) * (t + 301.797) / (522528.9 * (t + 69.34881)));
    }

    /**
     * Kinematic viscosity mu / rho, m^2/s.
     *
     * @param temperatureC water temperature, C, 0 to 40
     */
    public static double kinematicViscosityM2s(double temperatureC) {
        return dynamicViscosityPaS(temperatureC) / densityKgM3(temperatureC);
    }

    private static void check(double temperatureC) {
        new Checks().range("waterTempC", temperatureC, 0.0, 40.0).throwIfAny();
    }
}
