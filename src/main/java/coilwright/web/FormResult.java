package coilwright.web;

import java.util.Map;
import java.util.Optional;

/**
 * A bound form: the record when every field was valid, the errors by field otherwise, and the text the
 * user entered (to re-render the form as it was). Templates read {@code form.value('winding.slots')}
 * and {@code form.errors}.
 *
 * @param <T> the input record
 */
public record FormResult<T>(Optional<T> record, FieldErrors errors, Map<String, String> values) {
    public FormResult {
        values = Map.copyOf(values);
    }

    /** A fresh form showing these values (e.g. defaults from {@link FormBinder#flatten}) and no errors. */
    public static <T> FormResult<T> showing(Map<String, String> values) {
        return new FormResult<>(Optional.empty(), FieldErrors.none(), values);
    }

    public boolean valid() {
        return record.isPresent();
    }

    /** The entered text of a field, or an empty string. */
    public String value(String field) {
        return values.getOrDefault(field, "");
    }
}
