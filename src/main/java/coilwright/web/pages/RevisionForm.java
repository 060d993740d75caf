package coilwright.web.pages;

import coilwright.service.DesignDocument;
import coilwright.service.DesignLibrary;
import coilwright.service.SaveReceipt;
import coilwright.service.SavedRevision;
import coilwright.system.EvaluationRequest;
import coilwright.web.FormPage;
import coilwright.web.FormResult;
import coilwright.web.Json;
import coilwright.web.RecordBinder;
import coilwright.web.units.Units;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;
import java.util.HashMap;
import java.util.Map;

/**
 * {@code GET/POST /d/{designId}/revise}: the design form filled from a saved design's latest revision, with its
 * title, notes and a field for the edit token. Submitting adds a revision and leads to it; a refused one (an
 * invalid field, an impossible design, a wrong token) comes back as the same form with the input as typed and each
 * message beside its field ({@code ErrorMapping}). A design file posted as {@code document} (JSON) is still taken.
 */
public final class RevisionForm {
    static final String TITLE = "revision.title";
    static final String NOTES = "revision.notes";
    static final String TOKEN = "editToken";
    private final DesignLibrary library;
    private final DesignForm forms = new DesignForm();
    private final RecordBinder binder = new RecordBinder(Json.mapper());

    public RevisionForm(DesignLibrary library) {
        this.library = library;
    }

    public void show(Context ctx) {
        Units units = Units.of(ctx);
        SavedRevision latest = library.latest(ctx.pathParam("designId"));
        Map<String, String> values = DesignDefaults.formValues(library.document(latest).design(), units);
        values.put(TITLE, latest.title());
        values.put(NOTES, latest.notes());
        Map<String, String> query = new HashMap<>();
        ctx.queryParamMap().forEach((k, v) -> query.put(k, v.isEmpty() ? "" : v.get(0)));
        query.remove(Units.PARAM);
        query.remove(TOKEN);
        values.putAll(DesignFormModel.convertTyped(query, units));
        ctx.render("design", model(FormResult.showing(values), units, latest));
    }

    public void revise(Context ctx) {
        String designId = ctx.pathParam("designId");
        if (ctx.formParam("document") != null && ctx.formParam(Topology.FIELD) == null) {
            SaveReceipt o = library.revise(designId, ctx.formParam(TOKEN), binder.bind(ctx.formParam("document"),
                    DesignDocument.class));
            ctx.redirect("/d/" + o.designId() + "/r/" + o.revisionId(), HttpStatus.SEE_OTHER);
            return;
        }
        Units units = Units.of(ctx);
        SavedRevision latest = library.latest(designId);
        Map<String, String> typed = new HashMap<>(FormPage.posted(ctx));
        typed.remove(TOKEN);
        FormPage.open(ctx, new FormPage("design", typed, form -> model(form, units, latest),
                field -> field.startsWith("design.") ? Rejection.onForm(field.substring(7), typed.keySet())
                        : field.equals("title") ? TITLE : field.equals("notes") ? NOTES
                        : Rejection.onForm(field, typed.keySet())));
        EvaluationRequest design = forms.bind(ctx.formParamMap(), units);
        DesignDocument doc = new DesignDocument(DesignDocument.SCHEMA_VERSION, typed.getOrDefault(TITLE, ""),
                typed.getOrDefault(NOTES, ""), design);
        SaveReceipt o = library.revise(designId, ctx.formParam(TOKEN), doc);
        ctx.redirect("/d/" + o.designId() + "/r/" + o.revisionId(), HttpStatus.SEE_OTHER);
    }

    private static Map<String, Object> model(FormResult form, Units units, SavedRevision latest) {
        Map<String, Object> m = DesignFormModel.of(form, units);
        m.put("revise", latest);
        m.put("formAction", "/d/" + latest.designId() + "/revise");
        m.put("unitsLink", DesignFormModel.unitsLink("/d/" + latest.designId() + "/revise", form.values(), units));
        return m;
    }
}
