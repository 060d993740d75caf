package coilwright.web.pages;

import coilwright.service.ExampleCatalogue;
import io.javalin.http.Context;
import java.util.Map;

/** {@code GET /}: what the tool is for, the example designs one click away and a start-a-design link. */
public final class HomePage {
    private final ExampleCatalogue examples;

    public HomePage(ExampleCatalogue examples) {
        this.examples = examples;
    }

    public void show(Context ctx) {
        ctx.render("home", Map.of("title", "Coilwright", "examples", examples.all()));
    }
}
