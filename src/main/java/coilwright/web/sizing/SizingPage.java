package coilwright.web.sizing;

import coilwright.service.SizingAnswer;
import coilwright.service.SizingJob;
import coilwright.service.SizingJobs;
import coilwright.sizing.SizingRequest;
import coilwright.web.Choice;
import coilwright.web.FormPage;
import coilwright.web.FormResult;
import coilwright.web.NotFoundException;
import coilwright.web.RecordBinder;
import coilwright.web.units.Units;
import io.javalin.http.Context;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * "Size an alternator": the requirements form ({@code GET /sizing}), the search ({@code POST /sizing}) answered on
 * the same page, or, for a long search, a progress page that refreshes itself until the designs are ready
 * ({@code GET /sizing/jobs/{jobId}}, works without JavaScript) and can be cancelled.
 */
public final class SizingPage {
    private static final String PROGRESS_PREFIX = "/sizing/jobs/";
    private final SizingJobs jobs;
    private final SizingForm form;

    public SizingPage(SizingJobs jobs, RecordBinder binder) {
        this.jobs = jobs;
        this.form = new SizingForm(binder);
    }

    /** {@code GET /sizing}. */
    public void show(Context ctx) {
        ctx.render("sizing", model(FormResult.showing(SizingForm.defaults())));
    }

    /** {@code POST /sizing}. */
    public void size(Context ctx) {
        Map<String, String> typed = FormPage.posted(ctx);
        FormPage.open(ctx, new FormPage("sizing", typed, SizingPage::model, SizingForm::onForm));
        SizingRequest request = form.bind(typed);
        SizingAnswer answer = jobs.answer(request, false);
        if (answer.job().isPresent()) {
            ctx.redirect(PROGRESS_PREFIX + answer.job().get().id(), io.javalin.http.HttpStatus.SEE_OTHER);
            return;
        }
        Map<String, Object> model = model(FormResult.showing(typed));
        model.putAll(SizingView.of(request, answer.result().orElseThrow(), Units.of(ctx)));
        ctx.render("sizing", model);
    }

    /** {@code GET /sizing/jobs/{jobId}}: progress, refreshed every 2 s, then the designs. */
    public void job(Context ctx) {
        String id = ctx.pathParam("jobId");
        SizingJob job = jobs.find(id).orElseThrow(() -> new NotFoundException("There is no design search " + id
                + " (finished searches are kept for 15 minutes). Start a new one at /sizing."));
        Map<String, Object> model = model(FormResult.showing(SizingForm.defaults()));
        model.put("job", job);
        model.put("percent", Math.round(100 * job.fraction()));
        if (!job.finished()) {
            ctx.header("Refresh", "2");
        } else if (job.result().isPresent()) {
            jobs.requestOf(id).ifPresent(r -> model.putAll(SizingView.of(r, job.result().get(), Units.of(ctx))));
        }
        ctx.render("sizing", model);
    }

    /** {@code POST /sizing/jobs/{jobId}/cancel}. */
    public void cancel(Context ctx) {
        String id = ctx.pathParam("jobId");
        jobs.cancel(id).orElseThrow(() -> new NotFoundException("There is no design search " + id + "."));
        ctx.redirect(PROGRESS_PREFIX + id, io.javalin.http.HttpStatus.SEE_OTHER);
    }

    private static Map<String, Object> model(FormResult form) {
        Map<String, Object> m = new HashMap<>();
        m.put("title", "Size an alternator");
        m.put("form", form);
        m.put("drives", List.of(new Choice("WIND", "Wind rotor"), new Choice("HYDRO", "Hydro (impulse runner)")));
        m.put("builds", List.of(new Choice("AXIAL", "Axial flux, air-cored coils between two magnet discs"),
                new Choice("RADIAL", "Radial, magnets inside a slotted stator you have")));
        m.put("chemistries", List.of(new Choice("LEAD_ACID", "Lead-acid (2 V a cell)"),
                new Choice("LIFEPO4", "LiFePO4 (3.2 V a cell)")));
        m.put("objectives", List.of(new Choice("ANNUAL_ENERGY", "Most energy per year"),
                new Choice("OUTPUT_AT_RATED", "Most output at rated"),
                new Choice("EFFICIENCY_AT_RATED", "Best efficiency at rated"),
                new Choice("ACTIVE_MASS", "Least copper and magnet"),
                new Choice("MATERIAL_COST", "Least material cost")));
        m.put("grades", coilwright.magnet.MagnetGrades.names().stream().map(g -> new Choice(g, g)).toList());
        return m;
    }
}
