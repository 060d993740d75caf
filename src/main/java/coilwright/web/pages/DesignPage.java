package coilwright.web.pages;

import coilwright.service.EvaluationService;
import coilwright.service.ExampleCatalogue;
import coilwright.system.EvaluationRequest;
import coilwright.web.CarriedDesign;
import coilwright.web.FormPage;
import coilwright.web.FormResult;
import coilwright.web.NextSteps;
import coilwright.web.NotFoundException;
import coilwright.web.units.Units;
import io.javalin.http.Context;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

/**
 * The design form ({@code GET /design/new}, {@code POST /design}) and the results of the examples
 * ({@code GET /design/results}). A rejected form is shown again by {@code ErrorMapping}.
 */
public final class DesignPage {
    private final EvaluationService service;
    private final ExampleCatalogue examples;
    private static final String YOUR_DESIGN = "Your design";
    private final DesignForm forms = new DesignForm();

    public DesignPage(EvaluationService service, ExampleCatalogue examples) {
        this.service = service;
        this.examples = examples;
    }

    /**
     * A fresh form, an example's values ({@code ?example=slug}), a design handed on by another page
     * ({@code ?design=}, {@link CarriedDesign}), or field values in the query (a match page's rated speed, or the
     * form as typed when the units were switched: {@code enteredIn} names the units they were typed in).
     */
    public void newDesign(Context ctx) {
        Units units = Units.of(ctx);
        Map<String, String> values = DesignDefaults.formValues(starting(ctx), units);
        Map<String, String> query = new HashMap<>();
        ctx.queryParamMap().forEach((k, v) -> query.put(k, v.isEmpty() ? "" : v.get(0)));
        query.remove(CarriedDesign.FIELD);
        query.remove(Units.PARAM);
        values.putAll(DesignFormModel.convertTyped(query, units));
        ctx.render("design", DesignFormModel.of(FormResult.showing(values), units));
    }

    private EvaluationRequest starting(Context ctx) {
        String slug = ctx.queryParam("example");
        String carried = ctx.queryParam(CarriedDesign.FIELD);
        if (carried != null) {
            return CarriedDesign.decode(carried);
        }
        return slug == null ? DesignDefaults.AXIAL_BATTERY : known(slug).document().design();
    }

    public void submit(Context ctx) {
        Units units = Units.of(ctx);
        Map<String, String> typed = FormPage.posted(ctx);
        FormPage.open(ctx, new FormPage("design", typed, form -> DesignFormModel.of(form, units),
                field -> Rejection.onForm(field, typed.keySet())));
        EvaluationRequest request = forms.bind(ctx.formParamMap(), units);
        ctx.render("results", ResultsModel.of(YOUR_DESIGN, request, service.evaluate(request), units));
    }

    /**
     * {@code GET /design/results?example=slug}: an example's results one click from the home page;
     * {@code ?design=} ({@link CarriedDesign}): the results of a design handed on, the bookmarkable twin of
     * {@code POST /design} (its units switch leads here).
     */
    public void exampleResults(Context ctx) {
        if (ctx.queryParam(CarriedDesign.FIELD) != null) {
            EvaluationRequest request = CarriedDesign.decode(ctx.queryParam(CarriedDesign.FIELD));
            ctx.render("results", ResultsModel.of(YOUR_DESIGN, request, service.evaluate(request), Units.of(ctx)));
            return;
        }
        ExampleCatalogue.Example example = examples.require("example", ctx.queryParam("example"));
        EvaluationRequest request = example.document().design();
        Map<String, Object> model = new HashMap<>(ResultsModel.of(example.title(), request,
                service.evaluate(request), Units.of(ctx)));
        model.put("notes", example.document().notes());
        ctx.render("results", model);
    }

    /**
     * {@code GET /design/bench?design=} (or {@code ?example=slug}): the design's bench sheet, its open-circuit
     * voltage at {@code testRpm} (default: the rated speed).
     */
    public void bench(Context ctx) {
        String carried = ctx.queryParam(CarriedDesign.FIELD);
        ExampleCatalogue.Example example = carried == null ? examples.require("example", ctx.queryParam("example")) : null;
        EvaluationRequest request = example == null ? CarriedDesign.decode(carried) : example.document().design();
        double testRpm = TestSpeed.parse(ctx.queryParam("testRpm"), request.effectiveRatedSpeedRpm());
        String title = example == null ? Optional.ofNullable(ctx.queryParam("title")).filter(t -> !t.isBlank())
                .orElse(YOUR_DESIGN) : example.title();
        Map<String, Object> model = BenchSheet.of(title, request, service.evaluate(request), testRpm, Units.of(ctx));
        model.put("next", NextSteps.of(request, title));
        model.put("carried", CarriedDesign.encode(request));
        ctx.render("bench", model);
    }

    private ExampleCatalogue.Example known(String slug) {
        return examples.find(slug).orElseThrow(() -> new NotFoundException("No example design named \"" + slug
                + "\"; the examples are: " + String.join(", ", examples.slugs())));
    }
}
