package coilwright.web.saved;

import io.javalin.http.Context;

/** The edit token of a request: {@code Authorization: Bearer <token>} or {@code X-Edit-Token: <token>}. */
final class EditTokenHeader {
    static final String HEADER = "X-Edit-Token";
    private static final String BEARER = "Bearer ";

    private EditTokenHeader() {
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
