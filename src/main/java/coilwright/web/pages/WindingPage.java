package coilwright.web.pages;

import coilwright.service.EvaluationService;
import coilwright.validation.InfeasibleDesignException;
import coilwright.web.FieldErrors;
import coilwright.web.FormBinder;
import coilwright.web.FormResult;
import coilwright.web.Json;
import coilwright.web.RecordBinder;
import coilwright.winding.WindingSpec;
import io.javalin.http.Context;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * {@code GET /winding?slots=..&poles=..&phases=..&layers=..&pitch=..&paths=..&skew=..}: a winding laid out on its own,
 * for a rewinder planning which coil goes where. Without parameters it shows a starting example.
 */
final class WindingPage {
    /** Short query names to the {@link WindingSpec} fields the API uses. */
    static final Map<String, String> PARAMS = Map.of("slots", "slots", "poles", "poles", "phases", "phases",
            "layers", "layers", "pitch", "coilPitchSlots", "paths", "parallelPaths", "skew", "skewSlotPitches");
    private static final Map<String, String> START = Map.of("slots", "12", "poles", "16", "phases", "3",
            "layers", "DOUBLE", "pitch", "0", "paths", "1", "skew", "0");
    private final EvaluationService service;
    private final FormBinder forms = new FormBinder(new RecordBinder(Json.mapper()));

    WindingPage(EvaluationService service) {
        this.service = service;
    }

    void show(Context ctx) {
        Map<String, String> typed = new HashMap<>(START);
        PARAMS.keySet().forEach(k -> Optional.ofNullable(ctx.queryParam(k)).ifPresent(v -> typed.put(k, v)));
        FormResult<WindingSpec> bound = forms.bind(apiNames(typed), WindingSpec.class);
        Map<String, Object> model = new HashMap<>(Map.of("layers", List.of("DOUBLE", "SINGLE"), "phases", List.of("3", "1")));
        model.put("form", new FormResult<>(bound.record(), shortNames(bound.errors()), typed));
        int status = bound.valid() ? 200 : 400;
        try {
            bound.record().ifPresent(spec -> model.put("winding", WindingView.of(service.layout(spec))));
        } catch (InfeasibleDesignException e) {
            model.put("form", new FormResult<WindingSpec>(Optional.empty(), shortNames(FieldErrors.of(e)), typed));
            status = 422;
        }
        ctx.status(status).render("winding", model);
    }

    private static Map<String, List<String>> apiNames(Map<String, String> typed) {
        Map<String, List<String>> out = new HashMap<>();
        typed.forEach((k, v) -> out.put(PARAMS.get(k), List.of(v)));
        return out;
    }

    /** Errors come back under the API's field names; the page shows them beside its short-named fields. */
    private static FieldErrors shortNames(FieldErrors errors) {
        List<coilwright.validation.FieldError> out = new java.util.ArrayList<>();
        errors.asMap().forEach((field, messages) -> {
            String shortName = PARAMS.entrySet().stream().filter(e -> e.getValue().equals(field)).map(Map.Entry::getKey)
                    .findFirst().orElse(field);
            messages.forEach(m -> out.add(new coilwright.validation.FieldError(shortName, "", m, "")));
        });
        return FieldErrors.of(out);
    }
}
