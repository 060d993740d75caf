package coilwright.turbine;

/**
 * The IEC 61400-2 small wind class a site calls for.
 *
 * @param windClass        the class needed
 * @param meanWindSpeedMs  the site's annual mean wind speed, m/s
 * @param note             a sentence of context for the user
 */
public record WindClassAssessment(SmallWindClass windClass, double meanWindSpeedMs, String note) {
}
