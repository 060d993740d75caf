package coilwright.turbine;

/**
 * The probability distribution of hourly mean wind speed at a site (Manwell, McGowan &amp; Rogers,
 * "Wind Energy Explained", section 2.4). Wind speeds in m/s.
 */
public sealed interface WindDistribution permits Rayleigh, Weibull {
    /**
     * Probability density at a wind speed, 1/(m/s).
     *
     * @param windSpeedMs wind speed, m/s, >= 0
     */
    double pdf(double windSpeedMs);

    /**
     * Probability that the wind speed is at or below a value.
     *
     * @param windSpeedMs wind speed, m/s, >= 0
     */
    double cdf(double windSpeedMs);

    /** The long-term mean wind speed, m/s. */
    double meanWindSpeedMs();

    /** Refuses a negative or non-finite wind speed. */
    static void checkWindSpeed(double windSpeedMs) {
        new coilwright.validation.Checks().nonNegative("windSpeedMs", windSpeedMs).throwIfAny();
    }
}
