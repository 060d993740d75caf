package coilwright.turbine;

import coilwright.validation.Checks;

/**
 * Rayleigh distribution of wind speed from the mean alone: F(v) = 1 - exp(-(pi/4) (v/vmean)^2), the
 * Weibull distribution with k = 2 (Manwell, McGowan &amp; Rogers, "Wind Energy Explained", section 2.4).
 *
 * @param meanWindSpeedMs long-term mean wind speed, m/s, > 0 and <= 30
 */
public record Rayleigh(double meanWindSpeedMs) implements WindDistribution {
    public Rayleigh {
        new Checks().rangeExclusiveMin("meanWindSpeedMs", meanWindSpeedMs, 0.0, 30.0).throwIfAny();
    }

    @Override
    public double pdf(double windSpeedMs) {
        WindDistribution.checkWindSpeed(windSpeedMs);
        double x = windSpeedMs / meanWindSpeedMs;
        return Math.PI / 2.0 * x / meanWindSpeedMs * Math.exp(-Math.PI / 4.0 * x * x);
    }

    @Override
    public double cdf(double windSpeedMs) {
        WindDistribution.checkWindSpeed(windSpeedMs);
        double x = windSpeedMs / meanWindSpeedMs;
        return -Math.expm1(-Math.PI / 4.0 * x * x);
    }
}
