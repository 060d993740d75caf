package coilwright.turbine;

import java.util.OptionalDouble;

/**
 * Small wind turbine classes of IEC 61400-2 (edition 3, 2013), Table 1: reference wind speed Vref
 * (10-minute extreme with a 50-year return period) and annual average wind speed Vave at hub height,
 * Vave = 0.2 Vref. Class S has values the designer specifies.
 */
public enum SmallWindClass {
    I(50.0, 10.0),
    II(42.5, 8.5),
    III(37.5, 7.5),
    IV(30.0, 6.0),
    S(Double.NaN, Double.NaN);

    private final double referenceWindSpeedMs;
    private final double annualAverageWindSpeedMs;

    SmallWindClass(double referenceWindSpeedMs, double annualAverageWindSpeedMs) {
        this.referenceWindSpeedMs = referenceWindSpeedMs;
        this.annualAverageWindSpeedMs = annualAverageWindSpeedMs;
    }

    /** Vref, m/s; empty for class S. */
    public OptionalDouble referenceWindSpeedMs() {
        return this == S ? OptionalDouble.empty() : OptionalDouble.of(referenceWindSpeedMs);
    }

    /** Vave, m/s; empty for class S. */
    public OptionalDouble annualAverageWindSpeedMs() {
        return this == S ? OptionalDouble.empty() : OptionalDouble.of(annualAverageWindSpeedMs);
    }

    /**
     * The class a turbine needs for a site: the one whose Vave is the smallest at or above the site's
     * annual mean (class IV for the calmest sites); class S above 10 m/s.
     *
     * @param meanWindSpeedMs the site's annual mean wind speed at hub height, m/s, > 0 and <= 30
     */
    public static WindClassAssessment classFor(double meanWindSpeedMs) {
        new coilwright.validation.Checks().rangeExclusiveMin("meanWindSpeedMs", meanWindSpeedMs, 0.0, 30.0)
                .throwIfAny();
        for (SmallWindClass k : new SmallWindClass[] {IV, III, II, I}) {
            if (meanWindSpeedMs <= k.annualAverageWindSpeedMs) {
                return new WindClassAssessment(k, meanWindSpeedMs, String.format(java.util.Locale.ROOT,
                        "Site mean %.1f m/s is within class %s (Vave %.1f m/s, Vref %.1f m/s; IEC 61400-2:2013 Table 1). "
                                + "The class sets design loads; it is context here, not a certification.",
                        meanWindSpeedMs, k, k.annualAverageWindSpeedMs, k.referenceWindSpeedMs));
            }
        }
        return new WindClassAssessment(S, meanWindSpeedMs, String.format(java.util.Locale.ROOT,
                "Site mean %.1f m/s is above the class I average of 10.0 m/s: only a class S turbine, with "
                        + "design values stated by its maker, suits it (IEC 61400-2:2013 Table 1).", meanWindSpeedMs));
    }
}
