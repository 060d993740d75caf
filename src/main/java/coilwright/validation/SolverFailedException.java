package coilwright.validation;

/**
 * A numerical method gave up on an input that passed every check: a periodic steady state that would not
 * converge, a root that could not be bracketed, an evaluation limit of a library solver. The API answers 422;
 * the message names the operating point (speed, wind speed or flow) and the circuit, and what to change.
 * Distinct from {@link InfeasibleDesignException}: the design may well be buildable, the method failed on it.
 */
public class SolverFailedException extends RuntimeException {
    private final String field;

    /**
     * @param field  the input field (dotted path) whose value the failure is tied to, or empty for the whole request
     * @param reason what failed, where (speed, circuit) and what the user may change
     */
    public SolverFailedException(String field, String reason) {
        super(reason);
        this.field = field == null ? "" : field;
    }

    public SolverFailedException(String field, String reason, Throwable cause) {
        super(reason, cause);
        this.field = field == null ? "" : field;
    }

    /** The input field (or dotted path) most responsible, or an empty string when none is. */
    public String field() {
        return field;
    }

    /** The same failure with its field placed under a part of the request ({@code alternator} + {@code x}). */
    public SolverFailedException under(String part) {
        return new SolverFailedException(field.isEmpty() ? part : part + "." + field, getMessage(), getCause());
    }
}
