package coilwright.web.units;

/**
 * How a form field or result figure is shown against the SI value the core holds: millimetres where builders
 * think in millimetres, mm² for cable, mH for inductance, and the imperial unit of its {@link Quantity} on request.
 * Conversion happens here, at the page edge, and nowhere else.
 */
public enum Shown {
    /** Metres shown as mm (inches in imperial). */
    MM(Quantity.SMALL_LENGTH, 1e-3, null),
    /** Metres shown as m (feet in imperial). */
    METRE(Quantity.LENGTH, 1.0, null),
    /** Metres per second (miles per hour in imperial). */
    METRE_PER_SECOND(Quantity.SPEED, 1.0, null),
    /** Cubic metres per second shown as L/s (US gal/min in imperial). */
    LITRE_PER_SECOND(Quantity.SMALL_FLOW, 1e-3, null),
    /** Square metres shown as mm² in both systems (cable is sold by mm² or AWG, never by in²). */
    MM2(null, 1e-6, "mm²"),
    /** Square metres of copper in a conductor shown as mm² (square inches in imperial). */
    WIRE_AREA(Quantity.SMALL_AREA, 1e-6, null),
    /** Henry shown as mH. */
    MILLIHENRY(null, 1e-3, "mH"),
    CELSIUS(Quantity.TEMPERATURE, 1.0, null),
    KILOGRAM(Quantity.MASS, 1.0, null),
    NEWTON_METRE(Quantity.TORQUE, 1.0, null);

    /** Digits kept when a value is written back into a form field. */
    static final int FIELD_DIGITS = 6;
    private final Quantity quantity;
    private final double siPerBase;
    private final String fixedSymbol;

    Shown(Quantity quantity, double siPerBase, String fixedSymbol) {
        this.quantity = quantity;
        this.siPerBase = siPerBase;
        this.fixedSymbol = fixedSymbol;
    }

    /** An entered number to the core's SI value. */
    public double toSi(double shown, Units units) {
        double base = quantity != null && units == Units.IMPERIAL ? quantity.fromImperial(shown) : shown;
        return base * siPerBase;
    }

    /** An SI value as shown. */
    public double fromSi(double si, Units units) {
        double base = si / siPerBase;
        return quantity != null && units == Units.IMPERIAL ? quantity.toImperial(base) : base;
    }

    /** An SI value as shown, as plain text with at most six significant digits ("0.5", "1.6277"), for form fields. */
    public String text(double si, Units units) {
        return Fmt.plain(fromSi(si, units), FIELD_DIGITS);
    }

    public String symbol(Units units) {
        return fixedSymbol != null ? fixedSymbol : units.symbol(quantity);
    }
}
