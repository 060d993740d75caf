package coilwright.web.pages;

import coilwright.system.EvaluationRequest;
import coilwright.web.units.Units;
import java.util.Map;

/**
 * A design as the design form's fields, for other pages that hand a design on to the design form or its results
 * (a sized design opened from the sizing page).
 */
public final class DesignFormValues {
    private DesignFormValues() {
    }

    /** Every field of the design form, in its shown unit, with this design's values. */
    public static Map<String, String> of(EvaluationRequest design, Units units) {
        return DesignDefaults.formValues(design, units);
    }
}
