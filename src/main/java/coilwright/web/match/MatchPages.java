package coilwright.web.match;

import coilwright.service.ExampleCatalogue;
import coilwright.service.MatchingService;
import coilwright.system.EvaluationRequest;
import coilwright.system.HydroMatchRequest;
import coilwright.system.HydroMatchResult;
import coilwright.system.RunnerKind;
import coilwright.system.WindMatchRequest;
import coilwright.system.WindMatchResult;
import coilwright.web.Choice;
import coilwright.web.Figure;
import coilwright.web.FormBinder;
import coilwright.web.FormPage;
import coilwright.web.FormResult;
import coilwright.web.NotFoundException;
import coilwright.web.RecordBinder;
import io.javalin.http.Context;
import java.util.HashMap;
import java.util.List;
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
        ctx.render("match-wind", model(starting(WindPageForm.defaults(example(ctx, "axial-wind-48v")))));
    }

    public void windResult(Context ctx) {
        open(ctx, "match-wind");
        WindPageForm f = forms.bind(ctx.formParamMap(), WindPageForm.class);
        EvaluationRequest design = examples.require("example", f.example()).document().design();
        WindMatchRequest req = new WindMatchRequest(design.alternator(), design.load(), f.rotor().toRotor(), f.site(),
                f.wind(), 25.0);
        WindMatchResult result = matching.wind(req);
        ctx.render("match-wind", resultModel(ctx, result, MatchSummary.wind(result), Map.of(
                "matchingChart", MatchCharts.windMatching(req.rotor(), result),
                "powerChart", MatchCharts.windPowerCurve(result))));
    }

    public void hydroForm(Context ctx) {
        ctx.render("match-hydro", model(starting(HydroPageForm.defaults(example(ctx, "radial-hydro-48v")))));
    }

    public void hydroResult(Context ctx) {
        open(ctx, "match-hydro");
        HydroPageForm f = forms.bind(ctx.formParamMap(), HydroPageForm.class);
        EvaluationRequest design = examples.require("example", f.example()).document().design();
        HydroMatchResult result = matching.hydro(new HydroMatchRequest(design.alternator(), design.load(), f.site(),
                f.penstock(), f.runner(), f.driveRatio(), f.drivetrainEfficiency(), f.waterTempC()));
        ctx.render("match-hydro", resultModel(ctx, result, MatchSummary.hydro(result),
                Map.of("matchingChart", MatchCharts.hydroMatching(result))));
    }

    private static FormResult starting(Record defaults) {
        return FormResult.showing(FormBinder.flatten(defaults));
    }

    /** The page with the form as posted, the result, its summary figures and its charts. */
    private Map<String, Object> resultModel(Context ctx, Record result, List<Figure> summary, Map<String, String> charts) {
        Map<String, Object> model = model(FormResult.showing(FormPage.posted(ctx)));
        model.put("result", result);
        model.put("summary", summary);
        model.putAll(charts);
        return model;
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
