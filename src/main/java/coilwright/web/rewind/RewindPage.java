package coilwright.web.rewind;

import coilwright.service.RewindRequest;
import coilwright.service.RewindService;
import coilwright.service.StatorOptionsRequest;
import coilwright.web.FormBinder;
import coilwright.web.FormPage;
import coilwright.web.FormResult;
import coilwright.web.units.Shown;
import coilwright.web.units.Units;
import io.javalin.http.Context;
import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Collectors;

/**
 * {@code GET/POST /rewind} and {@code POST /rewind/stator-options}: the rewind planner as a page. The planner's own
 * refusals (a resistance impossible for the stated turns and wire, a coil count that does not match the layout, an
 * unbalanced winding) come back beside their fields through {@code ErrorMapping}, as binding errors do. A plan or a
 * stator's options can also be asked for by GET with the form in the query (the units switch of a posted page leads
 * there, with {@code enteredIn} naming the units the temperatures were typed in).
 */
public final class RewindPage {
    static final String ENTERED_IN = "enteredIn";
    private final RewindService service;
    private final FormBinder forms;

    public RewindPage(RewindService service, FormBinder forms) {
        this.service = service;
        this.forms = forms;
    }

    public void show(Context ctx) {
        Units units = Units.of(ctx);
        if (ctx.queryParam("machine.slots") != null) {
            plan(ctx, query(ctx, units));
        } else if (ctx.queryParam("minPoles") != null) {
            statorOptions(ctx, query(ctx, units));
        } else {
            ctx.render("rewind", RewindModel.of(FormResult.showing(RewindForm.defaults(units)), statorDefaults()));
        }
    }

    public void plan(Context ctx) {
        plan(ctx, FormPage.posted(ctx));
    }

    private void plan(Context ctx, Map<String, String> typed) {
        Units units = Units.of(ctx);
        String back = unitsLink(typed, units);
        FormPage.open(ctx, "rewind", typed, form -> linked(RewindModel.of(form, statorDefaults()), back));
        RewindRequest request = forms.bind(RewindForm.prepare(FormBinder.single(typed)), RewindRequest.class, units,
                RewindForm.FIELD_UNITS);
        ctx.render("rewind", linked(RewindModel.planned(FormResult.showing(typed), request, service), back));
    }

    public void statorOptions(Context ctx) {
        statorOptions(ctx, FormPage.posted(ctx));
    }

    private void statorOptions(Context ctx, Map<String, String> typed) {
        FormResult planForm = FormResult.showing(RewindForm.defaults(Units.of(ctx)));
        String back = unitsLink(typed, Units.of(ctx));
        FormPage.open(ctx, "rewind", typed, form -> linked(RewindModel.of(planForm, form), back));
        StatorOptionsRequest request = forms.bind(FormBinder.single(typed), StatorOptionsRequest.class);
        var model = RewindModel.of(planForm, FormResult.showing(typed));
        model.put("statorResult", service.statorOptions(request));
        ctx.render("rewind", linked(model, back));
    }

    private static Map<String, Object> linked(Map<String, Object> model, String unitsLink) {
        model.put("unitsLink", unitsLink);
        return model;
    }

    private static String unitsLink(Map<String, String> typed, Units units) {
        Map<String, String> q = new LinkedHashMap<>(typed);
        q.remove(Units.PARAM);
        q.put(ENTERED_IN, units.name().toLowerCase(Locale.ROOT));
        return "/rewind?" + q.entrySet().stream().map(e -> enc(e.getKey()) + "=" + enc(e.getValue()))
                .collect(Collectors.joining("&"));
    }

    /** The form in the query, its temperatures converted from the units they were typed in. */
    private static Map<String, String> query(Context ctx, Units units) {
        Map<String, String> typed = new LinkedHashMap<>();
        ctx.queryParamMap().forEach((k, v) -> typed.put(k, v.isEmpty() ? "" : v.get(0).trim()));
        typed.remove(Units.PARAM);
        String from = typed.remove(ENTERED_IN);
        Units typedIn = from == null ? units : Units.choose(from, null);
        if (typedIn != units) {
            for (String field : RewindForm.FIELD_UNITS.keySet()) {
                String text = typed.get(field);
                try {
                    if (text != null && !text.isBlank()) {
                        typed.put(field, Shown.CELSIUS.text(Shown.CELSIUS.toSi(Double.parseDouble(text), typedIn), units));
                    }
                } catch (NumberFormatException e) {
                    // left as typed: the binder names it beside its field
                }
            }
        }
        return typed;
    }

    private static String enc(String s) {
        return URLEncoder.encode(s, StandardCharsets.UTF_8);
    }

    private static FormResult statorDefaults() {
        return FormResult.showing(RewindForm.statorDefaults());
    }
}
