package coilwright.load;

/**
 * Copper resistivity at temperature, kept locally so the load package stands alone.
 * Annealed copper: rho20 = 1/58 Ohm*mm^2/m = 1/58e6 Ohm*m and alpha20 = 0.00393 /K (IEC 60028:1925).
 * The conductor package holds the shared copy; this duplicate is deliberate until the two are merged.
 */
public final class CableResistance {
    /** Resistivity of annealed copper at 20 C, Ohm*m (IEC 60028). */
    public static final double COPPER_RESISTIVITY_20C_OHM_M = 1.0 / 58e6;
    /** Temperature coefficient of copper resistance at 20 C, 1/K (IEC 60028). */
    public static final double COPPER_ALPHA_20C_PER_K = 0.00393;

    private CableResistance() {
    }

    /** Copper resistivity in Ohm*m at {@code temperatureC} (linear law of IEC 60028). */
    public static double copperResistivityOhmM(double temperatureC) {
        return COPPER_RESISTIVITY_20C_OHM_M * (1 + COPPER_ALPHA_20C_PER_K * (temperatureC - 20));
    }

    /** Resistance in Ohm of one copper conductor of {@code lengthM} and cross-section {@code areaM2}. */
    public static double conductorOhm(double lengthM, double areaM2, double temperatureC) {
        return copperResistivityOhmM(temperatureC) * lengthM / areaM2;
    }
}
