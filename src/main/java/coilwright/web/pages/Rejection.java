package coilwright.web.pages;

import coilwright.system.EvaluationRequest;
import coilwright.validation.FieldError;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import coilwright.web.FieldErrors;
import coilwright.web.FormResult;
import java.util.Collection;
import java.util.List;
import java.util.Set;

/**
 * A design the calculation refused, put back on the form: each reason beside the field it names. The core names
 * fields relative to the part it checks ({@code winding.slots} for the machine); those are placed under
 * {@code alternator.} so they land on the form field with the API path.
 */
final class Rejection {
    private static final Set<String> TOP_LEVEL = Set.of("alternator", "load", "speedRange", "ratedSpeedRpm", "maxSpeedRpm");

    private Rejection() {
    }

    static FormResult<EvaluationRequest> of(FormResult<EvaluationRequest> form, InfeasibleDesignException e) {
        return DesignForm.failed(form.values(), FieldErrors.of(List.of(new FieldError(onForm(e.field(), form.values().keySet()), "", e.getMessage(), ""))));
    }

    static FormResult<EvaluationRequest> of(FormResult<EvaluationRequest> form, InvalidInputException e) {
        return DesignForm.failed(form.values(), FieldErrors.of(e.errors().stream()
                .map(f -> new FieldError(onForm(f.field(), form.values().keySet()), f.value(), f.message(), f.allowed())).toList()));
    }

    /**
     * The form field a core field path belongs to: the path itself under {@code alternator.} when the core named it
     * relative to the machine, or, for a whole part such as {@code alternator.wire}, the first form field of that part.
     */
    static String onForm(String field, Collection<String> formFields) {
        if (field.isEmpty()) {
            return field;
        }
        String first = field.split("[.\\[]", 2)[0];
        String path = TOP_LEVEL.contains(first) ? field : "alternator." + field;
        return formFields.contains(path) ? path
                : formFields.stream().filter(f -> f.startsWith(path + ".")).sorted().findFirst().orElse(path);
    }
}
