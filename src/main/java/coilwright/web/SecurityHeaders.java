package coilwright.web;

import io.javalin.http.Context;
import java.util.Map;
import java.util.function.BiConsumer;

/**
 * The headers every response carries, pages, JSON, static files and the server's own error answers alike: a
 * Content-Security-Policy that allows scripts, styles, images and fonts from this origin only (no inline script or
 * style, no plugins, no framing, no {@code <base>}, forms posted only here), {@code nosniff}, and no referrer (a page
 * address may hold an edit token). Pages and charts are built so that they need nothing more.
 */
public final class SecurityHeaders {
    public static final String CONTENT_SECURITY_POLICY = "default-src 'self'; script-src 'self'; style-src 'self';"
            + " img-src 'self' data:; font-src 'self'; connect-src 'self'; object-src 'none'; base-uri 'none';"
            + " form-action 'self'; frame-ancestors 'none'";

    /** Name and value of each header, in the order they are sent. */
    public static final Map<String, String> HEADERS = headers();

    private SecurityHeaders() {
    }

    private static Map<String, String> headers() {
        java.util.LinkedHashMap<String, String> h = new java.util.LinkedHashMap<>();
        h.put("Content-Security-Policy", CONTENT_SECURITY_POLICY);
        h.put("X-Content-Type-Options", "nosniff");
        h.put("Referrer-Policy", "no-referrer");
        h.put("X-Frame-Options", "DENY");
        h.put("Cross-Origin-Opener-Policy", "same-origin");
        return java.util.Collections.unmodifiableMap(h);
    }

    /** A before-filter: sets every header on the response. */
    public static void apply(Context ctx) {
        HEADERS.forEach(ctx::header);
    }

    /** Sets every header through a setter of another kind of response (the server's own error answers). */
    public static void apply(BiConsumer<String, String> setter) {
        HEADERS.forEach(setter);
    }
}
