package coilwright.web.pages;

import java.util.Collection;

/**
 * Where a refusal of the design form is shown. The service names every field by its path in the request, which is
 * the form's own name for it; a reason about a whole part ({@code alternator.wire}) goes beside the first field of
 * that part, and a reason that names no field stays a message at the top of the form.
 */
final class Rejection {
    private Rejection() {
    }

    /** The form field a request path belongs to. */
    static String onForm(String field, Collection<String> formFields) {
        if (field.isEmpty() || formFields.contains(field)) {
            return field;
        }
        return formFields.stream().filter(f -> f.startsWith(field + ".")).sorted().findFirst().orElse(field);
    }
}
