package coilwright.web.saved;

import io.javalin.http.Context;

/** The edit token of a request: {@code Authorization: Bearer <token>} or {@code X-Edit-Token: <token>}. */
final class EditTokenHeader {
    static final String HEADER = "X-Edit-Token";
    private static final String BEARER = "Bearer ";

    private EditTokenHeader() {
    }

    /**
     * Marks a response that shows an edit token: no cache (browser, proxy) may keep it, and no link followed from
     * the page may carry its address to another site.
     */
    static void keepPrivate(Context ctx) {
        ctx.header("Cache-Control", "no-store");
        ctx.header("Referrer-Policy", "no-referrer");
    }

    /** The token presented, or null when there is none (the store then refuses the change). */
    static String of(Context ctx) {
        String auth = ctx.header("Authorization");
        if (auth != null && auth.regionMatches(true, 0, BEARER, 0, BEARER.length())) {
            return auth.substring(BEARER.length()).strip();
        }
        String token = ctx.header(HEADER);
        return token == null ? null : token.strip();
    }
}
