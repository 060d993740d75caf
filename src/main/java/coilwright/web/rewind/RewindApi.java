package coilwright.web.rewind;

import coilwright.service.RewindService;
import coilwright.web.RecordBinder;
import io.javalin.http.Context;

/** {@code POST /api/v1/rewind} and {@code POST /api/v1/rewind/stator-options}. */
final class RewindApi {
    private final RewindService service;
    private final RecordBinder binder;

    RewindApi(RewindService service, RecordBinder binder) {
        this.service = service;
        this.binder = binder;
    }

    void plan(Context ctx) {
        RewindRequest r = binder.bind(ctx.body(), RewindRequest.class);
        ctx.json(service.plan(r.machine(), r.target()));
    }

    void statorOptions(Context ctx) {
        StatorOptionsRequest r = binder.bind(ctx.body(), StatorOptionsRequest.class);
        ctx.json(StatorOptionsResult.of(r,
                service.statorOptions(r.slots(), r.phases(), r.layers(), r.minPoles(), r.maxPoles())));
    }
}
