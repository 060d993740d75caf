package coilwright.web.pages;

import io.javalin.http.Context;
import io.javalin.http.Handler;
import java.util.Map;

/** {@code GET /}: what the tool is for, the example designs one click away and a start-a-design link. */
public final class HomePage implements Handler {
    @Override
    public void handle(Context ctx) {
        ctx.render("home", Map.of("title", "Coilwright", "examples", Examples.all()));
    }
}
