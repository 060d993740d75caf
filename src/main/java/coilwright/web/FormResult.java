package coilwright.web;

import java.util.Map;

/**
 * A form as a page shows it: the text the user entered (or the starting values) and, when the form was rejected, the
 * messages by field. Templates read {@code form.value('winding.slots')} and {@code form.errors}.
 */
public record FormResult(FieldErrors errors, Map<String, String> values) {
    public FormResult {
        values = Map.copyOf(values);
    }

    /** A form showing these values (e.g. defaults from {@link FormBinder#flatten}) and no errors. */
    public static FormResult showing(Map<String, String> values) {
        return new FormResult(FieldErrors.none(), values);
    }

    /** The entered text of a field, or an empty string. */
    public String value(String field) {
        return values.getOrDefault(field, "");
    }
}
