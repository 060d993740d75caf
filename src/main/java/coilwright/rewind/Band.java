package coilwright.rewind;

/**
 * A derived value with its uncertainty band, from first-order propagation of the stated measurement
 * accuracies: for a product or quotient of independent readings the relative uncertainties add in quadrature
 * (JCGM 100:2008, "GUM", section 5.1, eq. 10 with relative sensitivities of +-1).
 *
 * @param value               the best estimate
 * @param low                 value * (1 - relativeUncertainty)
 * @param high                value * (1 + relativeUncertainty)
 * @param relativeUncertainty relative half-width of the band, &gt;= 0
 */
public record Band(double value, double low, double high, double relativeUncertainty) {
    public Band {
        if (!Double.isFinite(value) || !(relativeUncertainty >= 0) || !Double.isFinite(relativeUncertainty)) {
            throw new IllegalArgumentException("band of " + value + " +- " + relativeUncertainty + " is not finite");
        }
    }

    /** A band of +- relativeUncertainty around value. */
    public static Band of(double value, double relativeUncertainty) {
        return new Band(value, value * (1 - relativeUncertainty), value * (1 + relativeUncertainty),
                relativeUncertainty);
    }

    /** Relative uncertainty of a product or quotient of readings with these relative uncertainties (root sum square). */
    public static double quadrature(double... relativeUncertainties) {
        double sum = 0;
        for (double u : relativeUncertainties) {
            sum += u * u;
        }
        return Math.sqrt(sum);
    }

    /** The same band scaled by a factor taken as exact. */
    public Band times(double factor) {
        return of(value * factor, relativeUncertainty);
    }
}
