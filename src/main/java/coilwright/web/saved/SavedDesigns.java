package coilwright.web.saved;

import coilwright.service.Services;
import coilwright.web.Route;

import java.util.List;

/** Every route of saved designs: the API under {@code /api/v1} and the pages under {@code /d}, {@code /saved}. */
public final class SavedDesigns {
    private SavedDesigns() {
    }

    public static List<Route> routes(Services services) {
        SavedDesignApi api = new SavedDesignApi(services.designs());
        SavedDesignPages pages = new SavedDesignPages(services.designs());
        return List.of(
                Route.post("/api/v1/designs", api::create),
                Route.post("/api/v1/designs/import", api::importFile),
                Route.post("/api/v1/designs/{designId}/revisions", api::revise),
                Route.get("/api/v1/designs/{designId}", api::design),
                Route.get("/api/v1/designs/{designId}/export", api::exportDesign),
                Route.get("/api/v1/designs/{designId}/curves.csv", api::designCurves),
                Route.get("/api/v1/revisions/{revisionId}", api::revision),
                Route.get("/api/v1/revisions/{revisionId}/export", api::exportRevision),
                Route.get("/api/v1/revisions/{revisionId}/curves.csv", api::revisionCurves),
                Route.get("/api/v1/revisions/{revisionId}/recomputed", api::recomputed),
                Route.get("/api/v1/compare", api::compare),
                Route.get("/api/v1/demos", api::demos),
                Route.get("/saved/new", pages::newForm),
                Route.post("/saved", pages::save),
                Route.get("/d/{designId}", pages::latest),
                Route.get("/d/{designId}/r/{revisionId}", pages::revision),
                Route.get("/d/{designId}/r/{revisionId}/recomputed", pages::recomputed),
                Route.get("/d/{designId}/r/{revisionId}/print", pages::print),
                Route.get("/d/{designId}/revise", pages::reviseForm),
                Route.post("/d/{designId}/revise", pages::revise),
                Route.get("/compare", pages::compare),
                Route.get("/demos", pages::demos));
    }
}
