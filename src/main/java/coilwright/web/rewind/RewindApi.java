package coilwright.web.rewind;

import coilwright.service.RewindRequest;
import coilwright.service.RewindService;
import coilwright.service.StatorOptionsRequest;
import coilwright.web.RecordBinder;
import io.javalin.http.Context;

/** {@code POST /api/v1/rewind} and {@code POST /api/v1/rewind/stator-options}. */
public final class RewindApi {
    private final RewindService service;
    private final RecordBinder binder;

    public RewindApi(RewindService service, RecordBinder binder) {
        this.service = service;
        this.binder = binder;
    }

    public void plan(Context ctx) {
        ctx.json(service.plan(binder.bind(ctx.body(), RewindRequest.class)));
    }

    public void statorOptions(Context ctx) {
        ctx.json(service.statorOptions(binder.bind(ctx.body(), StatorOptionsRequest.class)));
    }
}
