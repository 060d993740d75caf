package coilwright.sizing;

/**
 * When nothing meets every limit: the design that comes closest on one limit while meeting all the others.
 *
 * @param limit    the limit that binds, e.g. {@code currentDensity}
 * @param field    the request field that sets it
 * @param allowed  the limit's value
 * @param needed   what the closest design needs (its figure under the full model)
 * @param unit     the unit of both
 * @param message  in words, e.g. "nothing at most 5 A/mm^2 ... reaches cut-in at 3.0 m/s; the closest needs 6.1 A/mm^2"
 * @param design   the closest design
 */
public record NearMiss(String limit, String field, double allowed, double needed, String unit, String message,
                       SizedDesign design) {
}
