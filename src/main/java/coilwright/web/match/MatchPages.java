package coilwright.web.match;

import coilwright.service.DesignDocument;
import coilwright.service.MatchingService;
import coilwright.system.HydroMatchRequest;
import coilwright.system.HydroMatchResult;
import coilwright.system.RunnerKind;
import coilwright.system.WindMatchRequest;
import coilwright.system.WindMatchResult;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import coilwright.web.FieldErrors;
import coilwright.web.FormBinder;
import coilwright.web.FormResult;
import coilwright.web.RecordBinder;
import io.javalin.http.Context;

import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

/**
 * {@code /match/wind} and {@code /match/hydro}: a site-and-turbine form beside an example alternator design, and
 * on submit the matching chart, the matched power curve, the energy table and the cautions.
 */
final class MatchPages {
    private final MatchingService matching;
    private final FormBinder forms;

    MatchPages(MatchingService matching, RecordBinder binder) {
        this.matching = matching;
        this.forms = new FormBinder(binder);
    }

    void windForm(Context ctx) {
        String slug = Optional.ofNullable(ctx.queryParam("example")).orElse("axial-wind-24v");
        Examples.load(slug);
        ctx.render("match-wind", model(FormResult.showing(FormBinder.flatten(WindPageForm.defaults(slug))), slug));
    }

    void windResult(Context ctx) {
        FormResult<WindPageForm> form = forms.bind(ctx.formParamMap(), WindPageForm.class);
        if (!form.valid()) {
            ctx.status(400).render("match-wind", model(form, form.value("example")));
            return;
        }
        WindPageForm f = form.record().orElseThrow();
        DesignDocument doc = Examples.load(f.example());
        WindMatchRequest req = new WindMatchRequest(doc.design().alternator(), doc.design().load(), f.rotor().toRotor(),
                f.site(), f.wind(), 25.0);
        WindMatchResult result;
        try {
            result = matching.wind(req);
        } catch (InfeasibleDesignException e) {
            ctx.status(422).render("match-wind", model(withErrors(form, FieldErrors.of(e)), f.example()));
            return;
        }
        Map<String, Object> model = model(form, f.example());
        model.put("result", result);
        model.put("matchingChart", MatchCharts.windMatching(req.rotor(), result));
        model.put("powerChart", MatchCharts.windPowerCurve(result));
        ctx.render("match-wind", model);
    }

    void hydroForm(Context ctx) {
        String slug = Optional.ofNullable(ctx.queryParam("example")).orElse("radial-hydro-48v");
        Examples.load(slug);
        ctx.render("match-hydro", model(FormResult.showing(FormBinder.flatten(HydroPageForm.defaults(slug))), slug));
    }

    void hydroResult(Context ctx) {
        FormResult<HydroPageForm> form = forms.bind(ctx.formParamMap(), HydroPageForm.class);
        if (!form.valid()) {
            ctx.status(400).render("match-hydro", model(form, form.value("example")));
            return;
        }
        HydroPageForm f = form.record().orElseThrow();
        DesignDocument doc = Examples.load(f.example());
        HydroMatchResult result;
        try {
            result = matching.hydro(new HydroMatchRequest(doc.design().alternator(), doc.design().load(), f.site(),
                    f.penstock(), f.runner(), f.driveRatio(), f.drivetrainEfficiency(), f.waterTempC()));
        } catch (InvalidInputException e) {
            ctx.status(400).render("match-hydro", model(withErrors(form, FieldErrors.of(e)), f.example()));
            return;
        } catch (InfeasibleDesignException e) {
            ctx.status(422).render("match-hydro", model(withErrors(form, FieldErrors.of(e)), f.example()));
            return;
        }
        Map<String, Object> model = model(form, f.example());
        model.put("result", result);
        model.put("matchingChart", MatchCharts.hydroMatching(result));
        ctx.render("match-hydro", model);
    }

    private static <T> FormResult<T> withErrors(FormResult<T> form, FieldErrors errors) {
        return new FormResult<>(Optional.empty(), errors, form.values());
    }

    private static Map<String, Object> model(FormResult<?> form, String slug) {
        Map<String, Object> m = new HashMap<>();
        m.put("form", form);
        m.put("examples", Examples.SLUGS);
        m.put("runnerKinds", Arrays.stream(RunnerKind.values()).map(Enum::name).toList());
        if (Examples.SLUGS.contains(slug)) {
            m.put("design", Examples.load(slug));
        }
        return m;
    }
}
