package coilwright.web.pages;

import coilwright.service.EvaluationService;
import coilwright.web.Choice;
import coilwright.web.FormBinder;
import coilwright.web.FormPage;
import coilwright.web.FormResult;
import coilwright.web.Json;
import coilwright.web.RecordBinder;
import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;
import coilwright.web.winding.RingDiagram;
import coilwright.web.winding.UnrolledWinding;
import coilwright.winding.Winding;
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
    /** Where {@link #drawing} answers. */
    public static final String DRAWING = "/winding/drawing.svg";
    private static final List<String> VIEWS = List.of("all", "wide", "narrow", "ring");
    private final EvaluationService service;
    private final FormBinder forms = new FormBinder(new RecordBinder(Json.mapper()));

    public WindingPage(EvaluationService service) {
        this.service = service;
    }

    public void show(Context ctx) {
        Map<String, String> typed = typed(ctx);
        FormPage.open(ctx, new FormPage("winding", typed, WindingPage::model, WindingPage::shortName));
        WindingSpec spec = forms.bind(apiNames(typed), WindingSpec.class);
        Map<String, Object> model = model(FormResult.showing(typed));
        model.put("winding", WindingView.of(service.layout(spec)));
        ctx.render("winding", model);
    }

    /**
     * {@code GET /winding/drawing.svg?<the page's parameters>&view=wide|narrow|all|ring}: one drawing of the winding
     * as an SVG document, so a long page (the design results) can show it as an image that the browser fetches
     * only when it is shown.
     */
    public void drawing(Context ctx) {
        String view = Optional.ofNullable(ctx.queryParam("view")).orElse("all");
        if (!VIEWS.contains(view)) {
            throw new InvalidInputException(List.of(new FieldError("view", view,
                    "view = " + view + ": must be one of " + String.join(", ", VIEWS), String.join(", ", VIEWS))));
        }
        Winding w = service.layout(forms.bind(apiNames(typed(ctx)), WindingSpec.class));
        if (view.equals("ring")) {
            ctx.result(RingDiagram.svg(w));
        } else {
            List<UnrolledWinding> drawings = UnrolledWinding.forPage(w);
            ctx.render("winding-drawing", Map.of("u", drawings.stream().filter(u -> u.variant().equals(view))
                    .findFirst().orElse(drawings.get(0))));
        }
        ctx.contentType("image/svg+xml; charset=utf-8");
    }

    /** The query of a winding as this page reads it. */
    static String query(WindingSpec s) {
        return "slots=" + s.slots() + "&poles=" + s.poles() + "&phases=" + s.phases() + "&layers=" + s.layers()
                + "&pitch=" + s.coilPitchSlots() + "&paths=" + s.parallelPaths() + "&skew=" + s.skewSlotPitches();
    }

    private static Map<String, String> typed(Context ctx) {
        Map<String, String> typed = new HashMap<>(START);
        PARAMS.keySet().forEach(k -> Optional.ofNullable(ctx.queryParam(k)).ifPresent(v -> typed.put(k, v)));
        return typed;
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
