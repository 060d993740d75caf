package coilwright.web;

import com.fasterxml.jackson.annotation.JsonInclude;
import coilwright.validation.FieldError;
import java.util.List;

/**
 * An RFC 9457 problem detail ({@code application/problem+json}). Members beyond the standard five:
 * {@code errors} (every invalid field, 400), {@code field} (the field most responsible, 422) and
 * {@code id} (a reference to the server log, 500). Empty members are left out.
 */
@JsonInclude(JsonInclude.Include.NON_EMPTY)
public record Problem(String type, String title, int status, String detail, String instance,
                      List<FieldError> errors, String field, String id) {
    public static final String MEDIA_TYPE = "application/problem+json";

    public Problem {
        errors = errors == null ? List.of() : List.copyOf(errors);
    }

    /** A problem with no field list, field or id. */
    public static Problem of(String typeSlug, String title, int status, String detail, String instance) {
        return new Problem(type(typeSlug), title, status, detail, instance, List.of(), null, null);
    }

    /** The type URI reference for a short slug such as {@code invalid-input}. */
    public static String type(String slug) {
        return "/problems/" + slug;
    }

    public Problem withErrors(List<FieldError> fieldErrors) {
        return new Problem(type, title, status, detail, instance, fieldErrors, field, id);
    }

    public Problem withField(String responsibleField) {
        return new Problem(type, title, status, detail, instance, errors, responsibleField, id);
    }

    public Problem withId(String logId) {
        return new Problem(type, title, status, detail, instance, errors, field, logId);
    }
}
