package coilwright.web.units;

/**
 * Quantities that change unit between SI and imperial display, with exact factors from NIST SP 811 (2008)
 * Appendix B: 1 ft = 0.3048 m, 1 in = 25.4 mm, 1 mi/h = 0.44704 m/s, 1 lb = 0.45359237 kg,
 * 1 US gal = 3.785411784 L, 1 lbf = 4.4482216152605 N (= lb x 9.80665 m/s^2), t/degF = 1.8 t/degC + 32.
 * Power stays in W. Together with {@link Units} (the system a request chose), {@link Shown} (the unit a field is
 * shown in) and {@link Fmt} (significant figures for pages), this is the one place where units are converted.
 */
public enum Quantity {
    LENGTH("m", "ft", 0.3048),
    SMALL_LENGTH("mm", "in", 25.4),
    SMALL_AREA("mm²", "in²", 25.4 * 25.4),
    SPEED("m/s", "mph", 0.44704),
    FLOW("m³/s", "US gpm", 3.785411784e-3 / 60.0),
    /** Water flow as a stream is gauged: litres per second, or US gallons per minute. */
    SMALL_FLOW("L/s", "US gpm", 3.785411784 / 60.0),
    MASS("kg", "lb", 0.45359237),
    TORQUE("N·m", "lbf·ft", 4.4482216152605 * 0.3048),
    POWER("W", "W", 1.0),
    TEMPERATURE("°C", "°F", Double.NaN);

    private final String siSymbol;
    private final String imperialSymbol;
    /** SI units per one imperial unit (unused for temperature, which has an offset). */
    private final double siPerImperial;

    Quantity(String siSymbol, String imperialSymbol, double siPerImperial) {
        this.siSymbol = siSymbol;
        this.imperialSymbol = imperialSymbol;
        this.siPerImperial = siPerImperial;
    }

    public double toImperial(double si) {
        return this == TEMPERATURE ? si * 1.8 + 32.0 : si / siPerImperial;
    }

    public double fromImperial(double imperial) {
        return this == TEMPERATURE ? (imperial - 32.0) / 1.8 : imperial * siPerImperial;
    }

    public String siSymbol() {
        return siSymbol;
    }

    public String imperialSymbol() {
        return imperialSymbol;
    }
}
