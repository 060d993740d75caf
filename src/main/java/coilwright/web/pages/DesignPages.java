package coilwright.web.pages;

import coilwright.service.Services;
import coilwright.web.Route;
import java.util.List;

/** The routes of the design pages: the form, its results, the examples' results and the winding layout. */
public final class DesignPages {
    private DesignPages() {
    }

    public static List<Route> routes(Services services) {
        DesignPage design = new DesignPage(services.evaluation());
        WindingPage winding = new WindingPage(services.evaluation());
        return List.of(
                Route.get("/design/new", design::newDesign),
                Route.post("/design", design::submit),
                Route.get("/design/results", design::exampleResults),
                Route.get("/winding", winding::show));
    }
}
