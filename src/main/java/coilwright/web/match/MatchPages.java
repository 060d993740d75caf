package coilwright.web.match;

import coilwright.service.ExampleCatalogue;
import coilwright.service.MatchingService;
import coilwright.system.EvaluationRequest;
import coilwright.system.HydroMatchRequest;
import coilwright.system.HydroMatchResult;
import coilwright.system.RunnerKind;
import coilwright.system.WindMatchRequest;
import coilwright.system.WindMatchResult;
import coilwright.web.CarriedDesign;
import coilwright.web.Choice;
import coilwright.web.Figure;
import coilwright.web.FormBinder;
import coilwright.web.FormPage;
import coilwright.web.FormResult;
import coilwright.web.NextSteps;
import coilwright.web.NotFoundException;
import coilwright.web.RecordBinder;
import coilwright.web.pages.DesignEdit;
import coilwright.web.units.Fmt;
import coilwright.web.units.Units;
import io.javalin.http.Context;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * {@code /match/wind} and {@code /match/hydro}: a site-and-turbine form beside any alternator design, and on submit
 * the matching chart, the matched power curve, the energy table and the cautions. The alternator is the design the
 * page was handed ({@code ?design=}, {@link CarriedDesign}, kept in a hidden field) or an example
 * ({@code ?example=slug}); its battery, rectifier and cables are the design form's own fields, editable here. A
 * result can also be reached by GET with the form's fields in the query (the units switch and bookmarks lead
 * there). A rejected form is shown again by {@code ErrorMapping}; errors in the machine land on the design.
 */
public final class MatchPages {
    /** A query field every full wind or hydro form has: its presence in a GET means "show the result". */
    private static final String WIND_MARK = "rotor.diameterM";
    private static final String HYDRO_MARK = "site.grossHeadM";
    /** The hidden field holding the design's title, when it has one. */
    private static final String TITLE = "title";
    private final MatchingService matching;
    private final ExampleCatalogue examples;
    private final FormBinder forms;

    public MatchPages(MatchingService matching, ExampleCatalogue examples, RecordBinder binder) {
        this.matching = matching;
        this.examples = examples;
        this.forms = new FormBinder(binder);
    }

    public void windForm(Context ctx) {
        if (ctx.queryParam(WIND_MARK) != null) {
            wind(ctx, fields(ctx.queryParamMap(), Units.of(ctx)));
            return;
        }
        ctx.render("match-wind", model(starting(ctx, WindPageForm.defaults(), "axial-wind-48v"), Units.of(ctx)));
    }

    public void windResult(Context ctx) {
        wind(ctx, FormPage.posted(ctx));
    }

    private void wind(Context ctx, Map<String, String> typed) {
        Units units = Units.of(ctx);
        open(ctx, "match-wind", typed, units);
        WindPageForm f = forms.bind(FormBinder.single(MatchFields.SHOWN.toSi(typed, units)), WindPageForm.class);
        EvaluationRequest design = DesignEdit.withLoad(alternator(typed), typed, units);
        WindMatchRequest req = new WindMatchRequest(design.alternator(), design.load(), f.rotor().toRotor(), f.site(),
                f.wind(), 25.0);
        WindMatchResult result = matching.wind(req);
        Map<String, Object> model = resultModel(ctx.path(), typed, units, design, result, MatchSummary.wind(result, new Fmt(units),
                design.alternator().ambientTempC()), Map.of(
                "matchingChart", MatchCharts.windMatching(req.rotor(), result),
                "powerChart", MatchCharts.windPowerCurve(result)));
        model.put("ratedChoices", RatedSpeed.wind(result, units));
        ctx.render("match-wind", model);
    }

    public void hydroForm(Context ctx) {
        if (ctx.queryParam(HYDRO_MARK) != null) {
            hydro(ctx, fields(ctx.queryParamMap(), Units.of(ctx)));
            return;
        }
        ctx.render("match-hydro", model(starting(ctx, HydroPageForm.defaults(), "radial-hydro-48v"), Units.of(ctx)));
    }

    public void hydroResult(Context ctx) {
        hydro(ctx, FormPage.posted(ctx));
    }

    private void hydro(Context ctx, Map<String, String> typed) {
        Units units = Units.of(ctx);
        open(ctx, "match-hydro", typed, units);
        HydroPageForm f = forms.bind(FormBinder.single(MatchFields.SHOWN.toSi(typed, units)), HydroPageForm.class);
        EvaluationRequest design = DesignEdit.withLoad(alternator(typed), typed, units);
        HydroMatchResult result = matching.hydro(new HydroMatchRequest(design.alternator(), design.load(), f.site(),
                f.penstock(), f.runner(), f.driveRatio(), f.drivetrainEfficiency(), f.waterTempC()));
        Map<String, Object> model = resultModel(ctx.path(), typed, units, design, result, MatchSummary.hydro(result, new Fmt(units),
                design.alternator().insulationClass(), design.alternator().ambientTempC()),
                Map.of("matchingChart", MatchCharts.hydroMatching(result)));
        model.put("ratedChoices", RatedSpeed.hydro(result));
        ctx.render("match-hydro", model);
    }

    /** The starting form: the turbine's defaults, the design handed on (or an example) and its load fields. */
    private FormResult starting(Context ctx, Record defaults, String fallbackExample) {
        Units units = Units.of(ctx);
        String carried = ctx.queryParam(CarriedDesign.FIELD);
        ExampleCatalogue.Example example = carried != null ? null
                : example(Optional.ofNullable(ctx.queryParam("example")).orElse(fallbackExample));
        EvaluationRequest design = example == null ? CarriedDesign.decode(carried) : example.document().design();
        Map<String, String> values = new LinkedHashMap<>(MatchFields.SHOWN.fromSi(FormBinder.flatten(defaults), units));
        values.put(TITLE, example == null ? Optional.ofNullable(ctx.queryParam(TITLE)).orElse("") : example.title());
        values.putAll(loadFields(DesignEdit.formValues(design, units)));
        values.put(CarriedDesign.FIELD, CarriedDesign.encode(design));
        return FormResult.showing(values);
    }

    private static Map<String, String> loadFields(Map<String, String> designValues) {
        Map<String, String> load = new LinkedHashMap<>();
        designValues.forEach((k, v) -> {
            if (k.equals("loadType") || k.startsWith("load.")) {
                load.put(k, v);
            }
        });
        return load;
    }

    /** The alternator of a posted form: the design it carries, or an example named by an older form. */
    private EvaluationRequest alternator(Map<String, String> typed) {
        String carried = typed.get(CarriedDesign.FIELD);
        if ((carried == null || carried.isBlank()) && typed.get("example") != null) {
            return examples.require("example", typed.get("example")).document().design();
        }
        return CarriedDesign.decode(carried);
    }

    /** The page with the form as posted, the result, its summary figures, charts and next steps. */
    private Map<String, Object> resultModel(String path, Map<String, String> typed, Units units, EvaluationRequest design,
                                            Record result, List<Figure> summary, Map<String, String> charts) {
        Map<String, Object> model = withUnitsLink(model(FormResult.showing(typed), units), path, typed, units);
        model.put("result", result);
        model.put("summary", summary);
        model.put("next", NextSteps.of(design, "Matched design"));
        model.put("matchedDesign", CarriedDesign.encode(design));
        model.putAll(charts);
        return model;
    }

    private ExampleCatalogue.Example example(String slug) {
        return examples.find(slug).orElseThrow(() -> new NotFoundException("There is no example design named '" + slug
                + "'. The examples are: " + String.join(", ", examples.slugs()) + "."));
    }

    /** The form as typed, remembered so that a rejection shows it again. */
    private void open(Context ctx, String template, Map<String, String> typed, Units units) {
        String path = ctx.path();
        FormPage.open(ctx, new FormPage(template, typed, form -> withUnitsLink(model(form, units), path, typed, units),
                MatchPages::onForm));
    }

    private static Map<String, Object> withUnitsLink(Map<String, Object> model, String path, Map<String, String> typed,
                                                     Units units) {
        model.put("unitsLink", DesignEdit.unitsLink(path, typed, units));
        return model;
    }

    /** The form field an error belongs to: the load's own fields, else the design for the rest of the machine. */
    static String onForm(String field) {
        return field.equals("alternator") || field.startsWith("alternator.") || field.equals("load")
                ? CarriedDesign.FIELD : field;
    }

    private Map<String, Object> model(FormResult form, Units units) {
        Map<String, Object> m = new HashMap<>(DesignEdit.loadModel(units));
        m.put("form", form);
        m.put("examples", examples.all().stream().map(e -> new Choice(e.slug(), e.title())).toList());
        m.put("runnerKinds", Choice.names(RunnerKind.values()));
        m.put("matchUnit", new MatchFields.Symbols(units));
        m.put("unitHints", UnitHints.of(form.values(), units));
        String carried = form.value(CarriedDesign.FIELD);
        if (!carried.isBlank()) {
            try {
                EvaluationRequest design = CarriedDesign.decode(carried);
                m.put("machine", DesignEdit.describe(design));
                m.put("changeLink", CarriedDesign.link("/design/new", design));
            } catch (coilwright.validation.InvalidInputException e) {
                m.put("machine", "the design handed to this page cannot be read");
            }
        }
        return m;
    }

    /** A form in a query, its site, turbine and load fields converted from the units they were typed in. */
    private static Map<String, String> fields(Map<String, List<String>> query, Units units) {
        Map<String, String> typed = new LinkedHashMap<>();
        query.forEach((k, v) -> {
            if (!k.equals(Units.PARAM)) {
                typed.put(k, v.isEmpty() ? "" : v.get(0).trim());
            }
        });
        String enteredIn = typed.get(DesignEdit.ENTERED_IN);
        Units from = enteredIn == null ? units : Units.choose(enteredIn, null);
        return new LinkedHashMap<>(DesignEdit.typedIn(MatchFields.SHOWN.convert(typed, from, units), units));
    }
}
