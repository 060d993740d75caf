package coilwright.web.api;

import coilwright.service.EvaluationService;
import coilwright.service.Services;
import coilwright.web.Json;
import coilwright.web.RecordBinder;
import coilwright.web.Route;
import coilwright.winding.WindingSpec;
import java.util.List;

/**
 * The JSON API under {@value #PREFIX}: evaluate a design, lay out a winding, the catalogues and the example designs.
 * Handlers only bind, call the service and write; errors are thrown and mapped by {@code ErrorMapping}
 * (400 invalid input listing every field, 422 infeasible design, 404 unknown example, 413 body too large).
 */
public final class ApiV1 {
    public static final String PREFIX = "/api/v1";

    private ApiV1() {
    }

    /** The routes, with the example designs read once here (at start-up). */
    public static List<Route> routes(Services services) {
        RecordBinder binder = new RecordBinder(Json.mapper());
        EvaluationService evaluation = services.evaluation();
        ExampleLibrary examples = ExampleLibrary.fromClasspath(binder);
        return List.of(
                Route.post(PREFIX + "/evaluate",
                        new EvaluateHandler(evaluation, binder, EvaluateHandler.CACHE_BUDGET_BYTES)),
                Route.post(PREFIX + "/winding",
                        ctx -> ctx.json(evaluation.layout(binder.bind(ctx.body(), WindingSpec.class)))),
                Route.get(PREFIX + "/catalogue", ctx -> ctx.json(evaluation.catalogue())),
                Route.get(PREFIX + "/examples", ctx -> ctx.json(examples.summaries())),
                Route.get(PREFIX + "/examples/{slug}", ctx -> ctx.json(examples.get(ctx.pathParam("slug")))));
    }
}
