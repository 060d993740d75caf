package coilwright.validation;

/**
 * Input that is well-formed and in range but physically impossible, e.g. an unbalanced slot/pole/phase
 * combination or wire that cannot fit its window (the API answers 422). The message states the reason
 * with the offending values.
 */
public class InfeasibleDesignException extends RuntimeException {
    private final String field;

    public InfeasibleDesignException(String field, String reason) {
        super(reason);
        this.field = field == null ? "" : field;
    }

    /** The input field (or dotted path) most responsible, or an empty string when the whole design is. */
    public String field() {
        return field;
    }
}
