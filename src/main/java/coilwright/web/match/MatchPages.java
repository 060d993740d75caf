package coilwright.web.match;

import coilwright.service.ExampleCatalogue;
import coilwright.service.MatchingService;
import coilwright.system.HydroMatchRequest;
import coilwright.system.HydroMatchResult;
import coilwright.system.RunnerKind;
import coilwright.system.WindMatchRequest;
import coilwright.system.WindMatchResult;
import coilwright.web.Choice;
import coilwright.web.FormBinder;
import coilwright.web.FormPage;
import coilwright.web.FormResult;
import coilwright.web.NotFoundException;
import coilwright.web.RecordBinder;
import io.javalin.http.Context;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

/**
 * {@code /match/wind} and {@code /match/hydro}: a site-and-turbine form beside an example alternator design, and
 * on submit the matching chart, the matched power curve, the energy table and the cautions. A rejected form is
 * shown again by {@code ErrorMapping}; errors in the machine or its load land on the example choice.
 */
public final class MatchPages {
    private final MatchingService matching;
    private final ExampleCatalogue examples;
    private final FormBinder forms;

    public MatchPages(MatchingService matching, ExampleCatalogue examples, RecordBinder binder) {
        this.matching = matching;
        this.examples = examples;
        this.forms = new FormBinder(binder);
    }

    public void windForm(Context ctx) {
        String slug = example(ctx, "axial-wind-24v");
        ctx.render("match-wind", model(FormResult.showing(FormBinder.flatten(WindPageForm.defaults(slug)))));
    }

    public void windResult(Context ctx) {
        open(ctx, "match-wind");
        WindPageForm f = forms.bind(ctx.formParamMap(), WindPageForm.class);
        ExampleCatalogue.Example example = examples.require("example", f.example());
        WindMatchRequest req = new WindMatchRequest(example.document().design().alternator(),
                example.document().design().load(), f.rotor().toRotor(), f.site(), f.wind(), 25.0);
        WindMatchResult result = matching.wind(req);
        Map<String, Object> model = model(FormResult.showing(FormPage.posted(ctx)));
        model.put("result", result);
        model.put("summary", MatchSummary.wind(result));
        model.put("matchingChart", MatchCharts.windMatching(req.rotor(), result));
        model.put("powerChart", MatchCharts.windPowerCurve(result));
        ctx.render("match-wind", model);
    }

    public void hydroForm(Context ctx) {
        String slug = example(ctx, "radial-hydro-48v");
        ctx.render("match-hydro", model(FormResult.showing(FormBinder.flatten(HydroPageForm.defaults(slug)))));
    }

    public void hydroResult(Context ctx) {
        open(ctx, "match-hydro");
        HydroPageForm f = forms.bind(ctx.formParamMap(), HydroPageForm.class);
        ExampleCatalogue.Example example = examples.require("example", f.example());
        HydroMatchResult result = matching.hydro(new HydroMatchRequest(example.document().design().alternator(),
                example.document().design().load(), f.site(), f.penstock(), f.runner(), f.driveRatio(),
                f.drivetrainEfficiency(), f.waterTempC()));
        Map<String, Object> model = model(FormResult.showing(FormPage.posted(ctx)));
        model.put("result", result);
        model.put("summary", MatchSummary.hydro(result));
        model.put("matchingChart", MatchCharts.hydroMatching(result));
        ctx.render("match-hydro", model);
    }

    /** The example a form page starts from: the query's, else the page's default. */
    private String example(Context ctx, String fallback) {
        String slug = Optional.ofNullable(ctx.queryParam("example")).orElse(fallback);
        return examples.find(slug).orElseThrow(() -> new NotFoundException("There is no example design named '" + slug
                + "'. The examples are: " + String.join(", ", examples.slugs()) + ".")).slug();
    }

    /** The posted form, remembered so that a rejection shows it again; the machine and load are the example's. */
    private void open(Context ctx, String template) {
        FormPage.open(ctx, new FormPage(template, FormPage.posted(ctx), this::model, MatchPages::onForm));
    }

    static String onForm(String field) {
        return field.equals("alternator") || field.startsWith("alternator.") || field.equals("load")
                || field.startsWith("load.") ? "example" : field;
    }

    private Map<String, Object> model(FormResult form) {
        Map<String, Object> m = new HashMap<>();
        m.put("form", form);
        m.put("examples", examples.all().stream().map(e -> new Choice(e.slug(), e.title())).toList());
        m.put("runnerKinds", Choice.names(RunnerKind.values()));
        examples.find(form.value("example")).ifPresent(e -> m.put("design", e.document()));
        return m;
    }
}
