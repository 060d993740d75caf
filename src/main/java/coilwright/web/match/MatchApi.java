package coilwright.web.match;

import coilwright.service.MatchingService;
import coilwright.system.HydroMatchRequest;
import coilwright.system.WindMatchRequest;
import coilwright.web.RecordBinder;
import io.javalin.http.Context;

/** {@code POST /api/v1/match/wind} and {@code POST /api/v1/match/hydro}: bind, match, answer; errors are mapped centrally. */
public final class MatchApi {
    private final MatchingService matching;
    private final RecordBinder binder;

    public MatchApi(MatchingService matching, RecordBinder binder) {
        this.matching = matching;
        this.binder = binder;
    }

    public void wind(Context ctx) {
        ctx.json(matching.wind(binder.bind(ctx.body(), WindMatchRequest.class)));
    }

    public void hydro(Context ctx) {
        ctx.json(matching.hydro(binder.bind(ctx.body(), HydroMatchRequest.class)));
    }
}
