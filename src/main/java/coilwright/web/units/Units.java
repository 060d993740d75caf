package coilwright.web.units;

import io.javalin.http.Context;
import java.util.Locale;

/**
 * Unit choice at the edge: the core is SI; a request may ask for imperial display and entry with
 * {@code ?units=imperial} (remembered in a cookie) or the cookie alone. Factors are the exact
 * definitions of NIST SP 811 (2008), Appendix B.
 */
public enum Units {
    SI, IMPERIAL;

    public static final String PARAM = "units";
    public static final String COOKIE = "coilwright-units";

    /** The system a request asked for: query parameter first, then cookie, else SI. */
    public static Units choose(String queryParam, String cookie) {
        Units fromQuery = parse(queryParam);
        if (fromQuery != null) {
            return fromQuery;
        }
        Units fromCookie = parse(cookie);
        return fromCookie == null ? SI : fromCookie;
    }

    public static Units of(Context ctx) {
        return choose(ctx.queryParam(PARAM), ctx.cookie(COOKIE));
    }

    /** Before-filter for pages: a {@code ?units=} choice is remembered for one year. */
    public static void remember(Context ctx) {
        Units asked = parse(ctx.queryParam(PARAM));
        if (asked != null) {
            ctx.cookie(COOKIE, asked.name().toLowerCase(Locale.ROOT), 365 * 24 * 3600);
        }
    }

    private static Units parse(String text) {
        if (text == null) {
            return null;
        }
        return switch (text.trim().toLowerCase(Locale.ROOT)) {
            case "imperial", "us" -> IMPERIAL;
            case "si", "metric" -> SI;
            default -> null;
        };
    }

    /** SI value to the shown value. */
    public double show(Quantity q, double si) {
        return this == SI ? si : q.toImperial(si);
    }

    /** Entered value to SI. */
    public double enter(Quantity q, double shown) {
        return this == SI ? shown : q.fromImperial(shown);
    }

    /** As {@link #symbol(Quantity)} by name, for templates: {@code ${units.symbol('LENGTH')}}. */
    public String symbol(String quantity) {
        return symbol(Quantity.valueOf(quantity));
    }

    /** The unit symbol shown beside a field. */
    public String symbol(Quantity q) {
        return this == SI ? q.siSymbol() : q.imperialSymbol();
    }
}
