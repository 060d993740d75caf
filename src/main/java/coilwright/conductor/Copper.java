package coilwright.conductor;

import coilwright.validation.Checks;

/**
 * Annealed copper by the IEC 60028 international standard of resistance for copper:
 * resistivity 1/58 Ohm*mm^2/m at 20 C, temperature coefficient 0.00393 /K at 20 C, density 8890 kg/m^3.
 * Resistivity is taken linear in temperature, rho(T) = rho20 * (1 + alpha20 * (T - 20)).
 */
public final class Copper {
    /** Resistivity at 20 C, Ohm*m (IEC 60028: 1/58 Ohm*mm^2/m = 0.017241 Ohm*mm^2/m). */
    public static final double RESISTIVITY_20C_OHM_M = 1.0 / 58.0 * 1e-6;
    /** Temperature coefficient of resistance at 20 C, 1/K (IEC 60028). */
    public static final double ALPHA_20C_PER_K = 0.00393;
    /** Density, kg/m^3 (IEC 60028). */
    public static final double DENSITY_KG_PER_M3 = 8890.0;
    /** Lowest temperature accepted, C. */
    public static final double MIN_TEMPERATURE_C = -50.0;
    /** Highest temperature accepted, C. */
    public static final double MAX_TEMPERATURE_C = 250.0;

    private Copper() {
    }

    /**
     * Resistivity at a temperature.
     *
     * @param temperatureC copper temperature, -50 to 250 C
     * @return resistivity, Ohm*m
     */
    public static double resistivityOhmM(double temperatureC) {
        return RESISTIVITY_20C_OHM_M * resistanceRatio(temperatureC);
    }

    /**
     * R(T)/R(20 C) = 1 + 0.00393 * (T - 20) (IEC 60028).
     *
     * @param temperatureC copper temperature, -50 to 250 C
     */
    public static double resistanceRatio(double temperatureC) {
        checkTemperature("temperatureC", temperatureC);
        return 1.0 + ALPHA_20C_PER_K * (temperatureC - 20.0);
    }

    /**
     * DC resistance of a copper conductor.
     *
     * @param lengthM      conductor length, m, &gt; 0
     * @param areaM2       copper cross-section, m^2, &gt; 0
     * @param temperatureC copper temperature, -50 to 250 C
     * @return resistance, Ohm
     */
    public static double resistanceOhm(double lengthM, double areaM2, double temperatureC) {
        new Checks().positive("lengthM", lengthM).positive("areaM2", areaM2)
                .range("temperatureC", temperatureC, MIN_TEMPERATURE_C, MAX_TEMPERATURE_C).throwIfAny();
        return resistivityOhmM(temperatureC) * lengthM / areaM2;
    }

    /** Mass of copper of a given volume, kg. */
    public static double massKg(double volumeM3) {
        new Checks().nonNegative("volumeM3", volumeM3).throwIfAny();
        return DENSITY_KG_PER_M3 * volumeM3;
    }

    static void checkTemperature(String field, double temperatureC) {
        new Checks().range(field, temperatureC, MIN_TEMPERATURE_C, MAX_TEMPERATURE_C).throwIfAny();
    }
}
