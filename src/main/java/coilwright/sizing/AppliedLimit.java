package coilwright.sizing;

/**
 * A limit as the search applied it, defaults resolved.
 *
 * @param limit    key, e.g. {@code openCircuitVoltage}
 * @param field    the request field that sets it
 * @param allowed  the value in force
 * @param unit     its unit
 * @param text     what it means, in words, with where a default came from
 */
public record AppliedLimit(String limit, String field, double allowed, String unit, String text) {
}
