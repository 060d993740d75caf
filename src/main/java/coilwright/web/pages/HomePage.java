package coilwright.web.pages;

import io.javalin.http.Context;
import io.javalin.http.Handler;
import java.util.Map;

/** {@code GET /}: the home page (a placeholder until the demo designs and start link land). */
public final class HomePage implements Handler {
    @Override
    public void handle(Context ctx) {
        ctx.render("home", Map.of("title", "Coilwright"));
    }
}
