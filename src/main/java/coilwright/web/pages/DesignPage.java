package coilwright.web.pages;

import coilwright.service.EvaluationService;
import coilwright.service.ExampleCatalogue;
import coilwright.system.EvaluationRequest;
import coilwright.web.FormPage;
import coilwright.web.FormResult;
import coilwright.web.NotFoundException;
import coilwright.web.units.Units;
import io.javalin.http.Context;
import java.util.HashMap;
import java.util.Map;

/**
 * The design form ({@code GET /design/new}, {@code POST /design}) and the results of the examples
 * ({@code GET /design/results}). A rejected form is shown again by {@code ErrorMapping}.
 */
public final class DesignPage {
    private final EvaluationService service;
    private final ExampleCatalogue examples;
    private final DesignForm forms = new DesignForm();

    public DesignPage(EvaluationService service, ExampleCatalogue examples) {
        this.service = service;
        this.examples = examples;
    }

    /** A fresh form, an example's values ({@code ?example=slug}) or values handed back from a results page. */
    public void newDesign(Context ctx) {
        Units units = Units.of(ctx);
        String slug = ctx.queryParam("example");
        EvaluationRequest design = slug == null ? DesignDefaults.AXIAL_BATTERY : known(slug).document().design();
        Map<String, String> values = DesignDefaults.formValues(design, units);
        ctx.queryParamMap().forEach((k, v) -> values.put(k, v.isEmpty() ? "" : v.get(0)));
        ctx.render("design", DesignFormModel.of(FormResult.showing(values), units));
    }

    public void submit(Context ctx) {
        Units units = Units.of(ctx);
        Map<String, String> typed = FormPage.posted(ctx);
        FormPage.open(ctx, new FormPage("design", typed, form -> DesignFormModel.of(form, units),
                field -> Rejection.onForm(field, typed.keySet())));
        EvaluationRequest request = forms.bind(ctx.formParamMap(), units);
        ctx.render("results", ResultsModel.of("Your design", DesignFormModel.editLink(typed), request,
                service.evaluate(request), units));
    }

    /** {@code GET /design/results?example=slug}: an example's results one click from the home page. */
    public void exampleResults(Context ctx) {
        ExampleCatalogue.Example example = examples.require("example", ctx.queryParam("example"));
        EvaluationRequest request = example.document().design();
        Map<String, Object> model = new HashMap<>(ResultsModel.of(example.title(),
                "/design/new?example=" + example.slug(), request, service.evaluate(request), Units.of(ctx)));
        model.put("notes", example.document().notes());
        ctx.render("results", model);
    }

    private ExampleCatalogue.Example known(String slug) {
        return examples.find(slug).orElseThrow(() -> new NotFoundException("No example design named \"" + slug
                + "\"; the examples are: " + String.join(", ", examples.slugs())));
    }
}
