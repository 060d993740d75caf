package coilwright.web.pages;

import coilwright.service.EvaluationService;
import coilwright.web.Choice;
import coilwright.web.FormBinder;
import coilwright.web.FormPage;
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
 * for a rewinder planning which coil goes where. Without parameters it shows a starting example; a refused
 * combination is shown again by {@code ErrorMapping}, each message beside its short-named field.
 */
public final class WindingPage {
    /** Short query names to the {@link WindingSpec} fields the API uses. */
    static final Map<String, String> PARAMS = Map.of("slots", "slots", "poles", "poles", "phases", "phases",
            "layers", "layers", "pitch", "coilPitchSlots", "paths", "parallelPaths", "skew", "skewSlotPitches");
    private static final Map<String, String> START = Map.of("slots", "12", "poles", "16", "phases", "3",
            "layers", "DOUBLE", "pitch", "0", "paths", "1", "skew", "0");
    private final EvaluationService service;
    private final FormBinder forms = new FormBinder(new RecordBinder(Json.mapper()));

    public WindingPage(EvaluationService service) {
        this.service = service;
    }

    public void show(Context ctx) {
        Map<String, String> typed = new HashMap<>(START);
        PARAMS.keySet().forEach(k -> Optional.ofNullable(ctx.queryParam(k)).ifPresent(v -> typed.put(k, v)));
        FormPage.open(ctx, new FormPage("winding", typed, WindingPage::model, WindingPage::shortName));
        WindingSpec spec = forms.bind(apiNames(typed), WindingSpec.class);
        Map<String, Object> model = model(FormResult.showing(typed));
        model.put("winding", WindingView.of(service.layout(spec)));
        ctx.render("winding", model);
    }

    private static Map<String, Object> model(FormResult form) {
        return new HashMap<>(Map.of("form", form, "layers", Choice.LAYERS, "phases", Choice.of("3", "1")));
    }

    private static Map<String, List<String>> apiNames(Map<String, String> typed) {
        Map<String, List<String>> out = new HashMap<>();
        typed.forEach((k, v) -> out.put(PARAMS.get(k), List.of(v)));
        return out;
    }

    /** Errors come back under the API's field names; the page shows them beside its short-named fields. */
    static String shortName(String field) {
        return PARAMS.entrySet().stream().filter(e -> e.getValue().equals(field)).map(Map.Entry::getKey)
                .findFirst().orElse(field);
    }
}
