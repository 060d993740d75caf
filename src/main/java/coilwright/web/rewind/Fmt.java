package coilwright.web.rewind;

import coilwright.rewind.Band;
import coilwright.web.Quantity;
import coilwright.web.Units;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Locale;
import java.util.Optional;

/** Number formatting for the rewind page ({@code ${fmt.sig(x, 4)}}): significant figures, bands, units. */
public final class Fmt {
    private static final String NONE = "—";
    private final Units units;

    Fmt(Units units) {
        this.units = units;
    }

    /** A value to {@code digits} significant figures, plain notation for everyday magnitudes. */
    public String sig(double v, int digits) {
        if (v == 0) {
            return "0";
        }
        double a = Math.abs(v);
        if (a < 1e-4 || a >= 1e7) {
            return String.format(Locale.ROOT, "%." + (digits - 1) + "e", v);
        }
        return new BigDecimal(v).round(new MathContext(digits)).stripTrailingZeros().toPlainString();
    }

    /** An optional value, or a dash. */
    public String sig(Optional<Double> v, int digits) {
        return v.map(x -> sig(x, digits)).orElse(NONE);
    }

    /** A relative deviation as a signed percentage, e.g. "+2.4 %". */
    public String pct(double relative) {
        return String.format(Locale.ROOT, "%+.1f %%", 100 * relative);
    }

    /** A fraction as a percentage, e.g. "41 %". */
    public String percent(double fraction) {
        return String.format(Locale.ROOT, "%.0f %%", 100 * fraction);
    }

    /** "value (low to high, ±u %)" (not named band: that is an OGNL operator). */
    public String ranged(Band b, int digits) {
        return sig(b.value(), digits) + " (" + sig(b.low(), digits) + " to " + sig(b.high(), digits) + ", ±"
                + String.format(Locale.ROOT, "%.1f", 100 * b.relativeUncertainty()) + " %)";
    }

    /** An optional band, or a dash. */
    public String ranged(Optional<Band> b, int digits) {
        return b.map(x -> ranged(x, digits)).orElse(NONE);
    }

    /** A temperature in the request's units with its symbol. */
    public String temp(double celsius) {
        return sig(units.show(Quantity.TEMPERATURE, celsius), 3) + " " + units.symbol(Quantity.TEMPERATURE);
    }

    /** A length given in metres shown in mm (SI) or inches (imperial), with its symbol. */
    public String small(double metres) {
        double mm = metres * 1000.0;
        return sig(units.show(Quantity.SMALL_LENGTH, mm), 3) + " " + units.symbol(Quantity.SMALL_LENGTH);
    }

    /** An area given in m^2 shown in mm^2 (SI) or square inches (imperial). */
    public String area(double squareMetres) {
        double mm2 = squareMetres * 1e6;
        return units == Units.SI ? sig(mm2, 3) + " mm²" : sig(mm2 / (25.4 * 25.4), 3) + " in²";
    }
}
