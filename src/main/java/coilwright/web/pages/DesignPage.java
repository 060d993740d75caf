package coilwright.web.pages;

import coilwright.service.EvaluationService;
import coilwright.system.AlternatorEvaluation;
import coilwright.system.EvaluationRequest;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import coilwright.web.FormResult;
import coilwright.web.Units;
import io.javalin.http.Context;
import java.util.HashMap;
import java.util.Map;

/** The design form ({@code GET /design/new}, {@code POST /design}) and the results of the examples ({@code GET /design/results}). */
final class DesignPage {
    private final EvaluationService service;
    private final DesignForm forms = new DesignForm();

    DesignPage(EvaluationService service) {
        this.service = service;
    }

    /** A fresh form, an example's values ({@code ?example=slug}) or values handed back from a results page. */
    void newDesign(Context ctx) {
        Units units = Units.of(ctx);
        String slug = ctx.queryParam("example");
        EvaluationRequest design = slug == null ? DesignDefaults.AXIAL_BATTERY : Examples.find(slug).document().design();
        Map<String, String> values = DesignDefaults.formValues(design, units);
        ctx.queryParamMap().forEach((k, v) -> values.put(k, v.isEmpty() ? "" : v.get(0)));
        DesignFormModel.render(ctx, 200, FormResult.showing(values));
    }

    void submit(Context ctx) {
        Units units = Units.of(ctx);
        FormResult<EvaluationRequest> form = forms.bind(ctx.formParamMap(), units);
        if (!form.valid()) {
            DesignFormModel.render(ctx, 400, form);
            return;
        }
        EvaluationRequest request = form.record().orElseThrow();
        try {
            AlternatorEvaluation e = service.evaluate(request);
            ctx.render("results", ResultsModel.of("Your design", DesignFormModel.editLink(form.values()), request, e, units));
        } catch (InfeasibleDesignException e) {
            DesignFormModel.render(ctx, 422, Rejection.of(form, e));
        } catch (InvalidInputException e) {
            DesignFormModel.render(ctx, 400, Rejection.of(form, e));
        }
    }

    /** {@code GET /design/results?example=slug}: an example's results one click from the home page. */
    void exampleResults(Context ctx) {
        Examples.Example example = Examples.find(Examples.requiredSlug(ctx.queryParam("example")));
        EvaluationRequest request = example.document().design();
        Map<String, Object> model = new HashMap<>(ResultsModel.of(example.document().title(),
                "/design/new?example=" + example.slug(), request, service.evaluate(request), Units.of(ctx)));
        model.put("notes", example.document().notes());
        ctx.render("results", model);
    }
}
