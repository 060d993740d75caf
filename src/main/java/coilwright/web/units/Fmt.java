package coilwright.web.units;

import coilwright.rewind.Band;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Locale;
import java.util.Optional;

/**
 * Numbers as pages show them, in the request's units: every page's model has one as {@code fmt}
 * ({@code ${fmt.sig(x, 4)}}, {@code ${fmt.temp(c)}}).
 */
public final class Fmt {
    private static final String NONE = "—";
    private final Units units;

    public Fmt(Units units) {
        this.units = units;
    }

    /** A value to {@code digits} significant figures in plain notation ("0.5", "1.6277"), as a form field shows it. */
    public static String plain(double v, int digits) {
        if (v == 0) {
            return "0";
        }
        return new BigDecimal(v).round(new MathContext(digits)).stripTrailingZeros().toPlainString();
    }

    /** A value to {@code digits} significant figures, plain notation for everyday magnitudes, else scientific. */
    public String sig(double v, int digits) {
        double a = Math.abs(v);
        if (v != 0 && (a < 1e-4 || a >= 1e7)) {
            return String.format(Locale.ROOT, "%." + (digits - 1) + "e", v);
        }
        return plain(v, digits);
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

    /** An SI value in the unit it is shown in, with its symbol: "1.63 mm". */
    public String shown(Shown how, double si, int digits) {
        return sig(how.fromSi(si, units), digits) + " " + how.symbol(units);
    }

    /** A temperature in the request's units with its symbol. */
    public String temp(double celsius) {
        return shown(Shown.CELSIUS, celsius, 3);
    }

    /** A length given in metres shown in mm (SI) or inches (imperial), with its symbol. */
    public String small(double metres) {
        return shown(Shown.MM, metres, 3);
    }

    /** A moment as people read it, to the minute in UTC: "2026-12-03 17:36 UTC". */
    public String when(java.time.Instant t) {
        return t == null ? NONE : java.time.format.DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'", Locale.ROOT)
                .withZone(java.time.ZoneOffset.UTC).format(t);
    }

    /** A conductor's copper area given in m² shown in mm² (SI) or square inches (imperial). */
    public String area(double squareMetres) {
        return shown(Shown.WIRE_AREA, squareMetres, 3);
    }
}
