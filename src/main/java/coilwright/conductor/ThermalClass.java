package coilwright.conductor;

import coilwright.validation.Checks;

/**
 * Thermal classes of electrical insulation by IEC 60085, used here as the temperature limit of the
 * magnet-wire enamel and the winding's insulation system.
 */
public enum ThermalClass {
    A(105), E(120), B(130), F(155), H(180);

    private final double limitC;

    ThermalClass(double limitC) {
        this.limitC = limitC;
    }

    /** The class's maximum (hot-spot) temperature, C (IEC 60085). */
    public double limitC() {
        return limitC;
    }

    /**
     * Whether a winding temperature is within the class.
     *
     * @param windingTemperatureC hot-spot winding temperature, -50 to 250 C
     */
    public boolean allows(double windingTemperatureC) {
        return marginK(windingTemperatureC) >= 0.0;
    }

    /**
     * Limit minus temperature: positive when within the class, negative when above it.
     *
     * @param windingTemperatureC hot-spot winding temperature, -50 to 250 C
     * @return margin, K
     */
    public double marginK(double windingTemperatureC) {
        new Checks().range("windingTemperatureC", windingTemperatureC, Copper.MIN_TEMPERATURE_C,
                Copper.MAX_TEMPERATURE_C).throwIfAny();
        return limitC - windingTemperatureC;
    }
}
