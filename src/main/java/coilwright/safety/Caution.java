package coilwright.safety;

import java.util.Objects;

/**
 * One caution shown with a result.
 *
 * @param code      stable machine-readable code, e.g. {@code OPEN_CIRCUIT_VOLTAGE}
 * @param severity  how serious it is
 * @param title     a short heading
 * @param message   what applies to this design, with its numbers, and what to do
 * @param reference the standard or practice it refers to (the local code always governs)
 */
public record Caution(String code, Severity severity, String title, String message, String reference) {
    public Caution {
        Objects.requireNonNull(code, "code");
        Objects.requireNonNull(severity, "severity");
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(message, "message");
        reference = reference == null ? "" : reference;
    }

    /** Ordered from most to least serious. */
    public enum Severity { DANGER, WARNING, NOTICE }
}
