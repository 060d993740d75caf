package coilwright.validation;

import java.util.List;
import java.util.stream.Collectors;

/**
 * Input that is malformed or out of range (the API answers 400). Carries every invalid field found at once.
 */
public class InvalidInputException extends IllegalArgumentException {
    private final transient List<FieldError> errors;

    public InvalidInputException(List<FieldError> errors) {
        super(errors.stream().map(FieldError::message).collect(Collectors.joining("; ")));
        if (errors.isEmpty()) {
            throw new IllegalArgumentException("an InvalidInputException needs at least one field error");
        }
        this.errors = List.copyOf(errors);
    }

    public InvalidInputException(FieldError error) {
        this(List.of(error));
    }

    public List<FieldError> errors() {
        return errors;
    }

    /** The same errors with every field placed under {@code prefix}. */
    public InvalidInputException under(String prefix) {
        return new InvalidInputException(errors.stream().map(e -> e.under(prefix)).toList());
    }
}
