package coilwright.web.rewind;

import coilwright.service.RewindService;
import coilwright.web.FormBinder;
import coilwright.web.FormResult;
import coilwright.web.Units;
import io.javalin.http.Context;
import java.util.Map;

/** {@code GET/POST /rewind} and {@code POST /rewind/stator-options}: the rewind planner as a page. */
final class RewindPage {
    private final RewindService service;
    private final FormBinder forms;

    RewindPage(RewindService service, FormBinder forms) {
        this.service = service;
        this.forms = forms;
    }

    void show(Context ctx) {
        ctx.render("rewind", RewindModel.empty(Units.of(ctx)));
    }

    void plan(Context ctx) {
        Units units = Units.of(ctx);
        FormResult<RewindRequest> form = forms.bind(RewindForm.prepare(ctx.formParamMap()), RewindRequest.class,
                units, RewindForm.FIELD_UNITS);
        render(ctx, RewindModel.planned(form, service, units));
    }

    void statorOptions(Context ctx) {
        Units units = Units.of(ctx);
        FormResult<StatorOptionsRequest> form = forms.bind(ctx.formParamMap(), StatorOptionsRequest.class);
        render(ctx, RewindModel.stator(form, service, units));
    }

    private static void render(Context ctx, Map<String, Object> model) {
        ctx.status((Integer) model.get("status")).render("rewind", model);
    }
}
