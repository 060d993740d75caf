package coilwright.sizing;

/**
 * How many candidates one limit (or reason) removed.
 *
 * @param limit  the limit's key or the reason
 * @param count  candidates (or layouts) removed
 */
public record LimitCount(String limit, long count) {
}
