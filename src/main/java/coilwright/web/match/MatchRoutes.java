package coilwright.web.match;

import coilwright.service.Services;
import coilwright.web.Json;
import coilwright.web.RecordBinder;
import coilwright.web.Route;

import java.util.List;

/** The turbine-matching routes: the JSON API and the pages. */
public final class MatchRoutes {
    private MatchRoutes() {
    }

    public static List<Route> routes(Services services) {
        RecordBinder binder = new RecordBinder(Json.mapper());
        MatchApi api = new MatchApi(services.matching(), binder);
        MatchPages pages = new MatchPages(services.matching(), binder);
        return List.of(
                Route.post("/api/v1/match/wind", api::wind),
                Route.post("/api/v1/match/hydro", api::hydro),
                Route.get("/match/wind", pages::windForm),
                Route.post("/match/wind", pages::windResult),
                Route.get("/match/hydro", pages::hydroForm),
                Route.post("/match/hydro", pages::hydroResult));
    }
}
