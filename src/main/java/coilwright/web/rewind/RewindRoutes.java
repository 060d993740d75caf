package coilwright.web.rewind;

import coilwright.service.Services;
import coilwright.web.FormBinder;
import coilwright.web.Json;
import coilwright.web.RecordBinder;
import coilwright.web.Route;
import java.util.List;

/** The rewind planner's routes: the JSON API and the page. */
public final class RewindRoutes {
    private RewindRoutes() {
    }

    public static List<Route> routes(Services services) {
        RecordBinder binder = new RecordBinder(Json.mapper());
        RewindApi api = new RewindApi(services.rewind(), binder);
        RewindPage page = new RewindPage(services.rewind(), new FormBinder(binder));
        return List.of(
                Route.post("/api/v1/rewind", api::plan),
                Route.post("/api/v1/rewind/stator-options", api::statorOptions),
                Route.get("/rewind", page::show),
                Route.post("/rewind", page::plan),
                Route.post("/rewind/stator-options", page::statorOptions));
    }
}
