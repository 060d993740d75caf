package coilwright.validation;

import java.util.Objects;

/**
 * One invalid input field: where it is, what was given, what is wrong and what is allowed.
 *
 * @param field   the field's name, or a dotted path such as {@code rotor.magnetThicknessM}
 * @param value   the offending value as text (e.g. {@code "-1.0"}, {@code "NaN"}, {@code "missing"})
 * @param message what is wrong, in a sentence that starts with the field, e.g. {@code "airGapM = -1.0: must be > 0"}
 * @param allowed the allowed range or set, e.g. {@code "> 0"} or {@code "1 or 3"}
 */
public record FieldError(String field, String value, String message, String allowed) {
    public FieldError {
        Objects.requireNonNull(field, "field");
        Objects.requireNonNull(message, "message");
        value = value == null ? "null" : value;
        allowed = allowed == null ? "" : allowed;
    }

    /** The same error with its field placed under {@code prefix} (for nested inputs). */
    public FieldError under(String prefix) {
        if (prefix == null || prefix.isEmpty()) {
            return this;
        }
        String path = prefix + "." + field;
        String msg = message.startsWith(field) ? path + message.substring(field.length()) : message;
        return new FieldError(path, value, msg, allowed);
    }
}
