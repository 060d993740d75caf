package coilwright.web.rewind;

import coilwright.service.RewindRequest;
import coilwright.service.RewindService;
import coilwright.service.StatorOptionsRequest;
import coilwright.web.FormBinder;
import coilwright.web.FormPage;
import coilwright.web.FormResult;
import coilwright.web.units.Units;
import io.javalin.http.Context;

/**
 * {@code GET/POST /rewind} and {@code POST /rewind/stator-options}: the rewind planner as a page. The planner's own
 * refusals (a resistance impossible for the stated turns and wire, a coil count that does not match the layout, an
 * unbalanced winding) come back beside their fields through {@code ErrorMapping}, as binding errors do.
 */
public final class RewindPage {
    private final RewindService service;
    private final FormBinder forms;

    public RewindPage(RewindService service, FormBinder forms) {
        this.service = service;
        this.forms = forms;
    }

    public void show(Context ctx) {
        ctx.render("rewind", RewindModel.of(FormResult.showing(RewindForm.defaults(Units.of(ctx))), statorDefaults()));
    }

    public void plan(Context ctx) {
        Units units = Units.of(ctx);
        FormPage.open(ctx, "rewind", FormPage.posted(ctx), form -> RewindModel.of(form, statorDefaults()));
        RewindRequest request = forms.bind(RewindForm.prepare(ctx.formParamMap()), RewindRequest.class, units,
                RewindForm.FIELD_UNITS);
        ctx.render("rewind", RewindModel.planned(FormResult.showing(FormPage.posted(ctx)), request, service));
    }

    public void statorOptions(Context ctx) {
        FormResult planForm = FormResult.showing(RewindForm.defaults(Units.of(ctx)));
        FormPage.open(ctx, "rewind", FormPage.posted(ctx), form -> RewindModel.of(planForm, form));
        StatorOptionsRequest request = forms.bind(ctx.formParamMap(), StatorOptionsRequest.class);
        var model = RewindModel.of(planForm, FormResult.showing(FormPage.posted(ctx)));
        model.put("statorResult", service.statorOptions(request));
        ctx.render("rewind", model);
    }

    private static FormResult statorDefaults() {
        return FormResult.showing(RewindForm.statorDefaults());
    }
}
