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

import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Locale;
import java.util.TreeMap;
import java.util.stream.Collectors;
import java.util.List;
import java.util.Map;

/**
 * "Size an alternator": the requirements form ({@code GET /sizing}), the search ({@code POST /sizing}) answered on
 * the same page, or, for a long search, a progress page that refreshes itself until the designs are ready
 * ({@code GET /sizing/jobs/{jobId}}, works without JavaScript) and can be cancelled.
 */
public final class SizingPage {
    private static final String PROGRESS_PREFIX = "/sizing/jobs/";
    /** The units the fields of a units-switch address were typed in. */
    static final String ENTERED_IN = "enteredIn";
    private final SizingJobs jobs;
    private final SizingForm form;

    public SizingPage(SizingJobs jobs, RecordBinder binder) {
        this.jobs = jobs;
        this.form = new SizingForm(binder);
    }

    /**
     * {@code GET /sizing}: the defaults, or the fields in the query (the units switch carries what was typed, with
     * {@code enteredIn} naming the units it was typed in), shown in the units chosen.
     */
    public void show(Context ctx) {
        Units units = Units.of(ctx);
        Map<String, String> query = new java.util.LinkedHashMap<>();
        ctx.queryParamMap().forEach((k, v) -> query.put(k, v.isEmpty() ? "" : v.get(0).trim()));
        String from = query.remove(ENTERED_IN);
        query.remove(Units.PARAM);
        Map<String, String> typed = query.containsKey(SizingForm.DRIVE) ? query : SizingForm.defaults();
        Units typedIn = from != null ? Units.choose(from, null) : query.containsKey(SizingForm.DRIVE) ? units : Units.SI;
        Map<String, String> shown = SizingForm.convert(typed, typedIn, units);
        Map<String, Object> model = model(units, FormResult.showing(shown));
        model.put("unitsLink", unitsLink(shown, units));
        ctx.render("sizing", model);
    }

    /** {@code POST /sizing}. */
    public void size(Context ctx) {
        Units units = Units.of(ctx);
        Map<String, String> typed = FormPage.posted(ctx);
        FormPage.open(ctx, new FormPage("sizing", typed, f -> model(units, f), SizingForm::onForm));
        SizingRequest request = form.bind(typed, units);
        SizingAnswer answer = jobs.answer(request, false);
        if (answer.job().isPresent()) {
            ctx.redirect(PROGRESS_PREFIX + answer.job().get().id(), io.javalin.http.HttpStatus.SEE_OTHER);
            return;
        }
        Map<String, Object> model = model(units, FormResult.showing(typed));
        model.putAll(SizingView.of(request, answer.result().orElseThrow(), units));
        model.put("unitNotes", SizingForm.notes(typed, units));
        model.put("unitsLink", unitsLink(typed, units));
        ctx.render("sizing", model);
    }

    /** The form's own address with what was typed, so switching units keeps it (converted on arrival). */
    private static String unitsLink(Map<String, String> typed, Units units) {
        Map<String, String> q = new TreeMap<>(typed);
        q.remove(Units.PARAM);
        q.put(ENTERED_IN, units.name().toLowerCase(Locale.ROOT));
        return "/sizing?" + q.entrySet().stream().map(e -> enc(e.getKey()) + "=" + enc(e.getValue()))
                .collect(Collectors.joining("&"));
    }

    private static String enc(String s) {
        return URLEncoder.encode(s, StandardCharsets.UTF_8);
    }

    /**
     * {@code GET /sizing/jobs/{jobId}}: progress, refreshed every 2 s, then the designs; with {@code ?live=1} (asked
     * for by the progress script, which follows the job's events) without the refresh.
     */
    public void job(Context ctx) {
        String id = ctx.pathParam("jobId");
        SizingJob job = jobs.find(id).orElseThrow(() -> new NotFoundException("There is no design search " + id
                + " (finished searches are kept for 15 minutes). Start a new one at /sizing."));
        Units units = Units.of(ctx);
        Map<String, Object> model = model(units, FormResult.showing(SizingForm.defaults()));
        model.put("job", job);
        model.put("percent", Math.round(100 * job.fraction()));
        if (!job.finished() && !"1".equals(ctx.queryParam("live"))) {
            // without script the page reloads itself; the progress script asks for ?live=1 and follows the events
            ctx.header("Refresh", "2");
        } else if (job.result().isPresent()) {
            jobs.requestOf(id).ifPresent(r -> model.putAll(SizingView.of(r, job.result().get(), units)));
        }
        ctx.render("sizing", model);
    }

    /** {@code POST /sizing/jobs/{jobId}/cancel}. */
    public void cancel(Context ctx) {
        String id = ctx.pathParam("jobId");
        jobs.cancel(id).orElseThrow(() -> new NotFoundException("There is no design search " + id + "."));
        ctx.redirect(PROGRESS_PREFIX + id, io.javalin.http.HttpStatus.SEE_OTHER);
    }

    private static Map<String, Object> model(Units units, FormResult form) {
        Map<String, Object> m = new HashMap<>();
        m.put("u", SizingForm.symbols(units));
        m.put("unitNotes", List.of());
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
