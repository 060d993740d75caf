package coilwright.web.pages;

import coilwright.system.EvaluationRequest;
import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;
import coilwright.web.CarriedDesign;
import coilwright.web.FormBinder;
import coilwright.web.Words;
import coilwright.web.units.Units;
import java.util.HashMap;
import java.util.Map;

/**
 * The design form's pieces for other pages: the match pages show a carried design's battery, rectifier and cables
 * in the design form's own fields ({@code fragments/design :: load}) and bind the edited ones back into the design
 * with the design form's conversions and messages.
 */
public final class DesignEdit {
    /** The query field naming the units a form's values were typed in (see {@link #unitsLink}). */
    public static final String ENTERED_IN = DesignFormModel.ENTERED_IN;
    private static final DesignForm FORMS = new DesignForm();

    private DesignEdit() {
    }

    /** Every field of the design form for this design, in the units shown; the load fields among them. */
    public static Map<String, String> formValues(EvaluationRequest design, Units units) {
        return DesignDefaults.formValues(design, units);
    }

    /** The load fieldset's choices and units, for a page model. */
    public static Map<String, Object> loadModel(Units units) {
        return DesignFormModel.loadChoices(units);
    }

    /**
     * The design with the load as posted ({@code loadType} and the {@code load.*} fields) in place of its own.
     *
     * @throws InvalidInputException the load's errors under their own fields; an error in the rest of the design
     *                               under {@value CarriedDesign#FIELD}
     */
    public static EvaluationRequest withLoad(EvaluationRequest design, Map<String, String> posted, Units units) {
        Map<String, String> values = new HashMap<>(DesignDefaults.formValues(design, units));
        posted.forEach((k, v) -> {
            if (k.equals(DesignForm.LOAD_TYPE) || k.startsWith("load.")) {
                values.put(k, v);
            }
        });
        try {
            return FORMS.bind(FormBinder.single(values), units);
        } catch (InvalidInputException e) {
            throw new InvalidInputException(e.errors().stream().map(DesignEdit::onLoadPage).toList());
        }
    }

    private static FieldError onLoadPage(FieldError e) {
        boolean load = e.field().equals(DesignForm.LOAD_TYPE) || e.field().startsWith("load.") || e.field().equals("load");
        return load ? e : new FieldError(CarriedDesign.FIELD, e.value(), e.field() + ": " + e.message(), e.allowed());
    }

    /**
     * The GET address of a form with these typed values and the units they were typed in, for the units switch of a
     * page reached by POST; {@link #typedIn} reads them back converted.
     */
    public static String unitsLink(String path, Map<String, String> typed, Units units) {
        return DesignFormModel.unitsLink(path, typed, units);
    }

    /** Query values typed in the units the query names ({@code enteredIn}) as shown in {@code units}. */
    public static Map<String, String> typedIn(Map<String, String> query, Units units) {
        return DesignFormModel.convertTyped(query, units);
    }

    /** A one-line description of the machine: "9 coils, 12 poles, 3 phases, 40 turns per coil, star". */
    public static String describe(EvaluationRequest design) {
        var a = design.alternator();
        var w = a.winding();
        return w.slots() + " slots, " + w.poles() + " poles, " + w.phases() + (w.phases() == 1 ? " phase, " : " phases, ")
                + a.turnsPerCoil() + " turns per coil, " + Words.of(a.connection());
    }
}
