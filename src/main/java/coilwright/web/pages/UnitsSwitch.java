package coilwright.web.pages;

import coilwright.web.units.Units;
import io.javalin.http.Context;
import io.javalin.http.HandlerType;
import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

/**
 * Where the units switch of a page leads: the same address with the same query (the units choice replaced), so a
 * page with a link of its own keeps what it shows. A page reached by POST (a form's result or its rejection) names
 * its own GET twin as {@code unitsLink} in its model; failing that, the switch leads to the GET address of the same
 * path with the posted fields as its query, which the form pages read as their starting values.
 */
final class UnitsSwitch {
    /** A field never written into an address: the edit token of a saved design. */
    static final String SECRET = "editToken";
    private UnitsSwitch() {
    }

    static String here(Context ctx) {
        Map<String, List<String>> fields = ctx.method() == HandlerType.GET ? ctx.queryParamMap() : postedFields(ctx);
        String query = fields.entrySet().stream()
                .filter(e -> !e.getKey().equals(Units.PARAM) && !e.getKey().equals(SECRET))
                .flatMap(e -> e.getValue().stream().map(v -> enc(e.getKey()) + "=" + enc(v)))
                .collect(Collectors.joining("&"));
        return query.isEmpty() ? ctx.path() : ctx.path() + "?" + query;
    }

    /** The posted fields, or none when the body could not be read (a malformed multipart body being refused). */
    private static Map<String, List<String>> postedFields(Context ctx) {
        try {
            return ctx.formParamMap();
        } catch (Exception unreadableBody) { // a ServletException is thrown unchecked here
            return Map.of();
        }
    }

    private static String enc(String s) {
        return URLEncoder.encode(s, StandardCharsets.UTF_8);
    }
}
