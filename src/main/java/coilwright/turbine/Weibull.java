package coilwright.turbine;

import coilwright.validation.Checks;
import org.apache.commons.math3.special.Gamma;

/**
 * Two-parameter Weibull distribution of wind speed: F(v) = 1 - exp(-(v/c)^k),
 * mean = c Gamma(1 + 1/k) (Justus et al. 1978; Manwell, McGowan &amp; Rogers, section 2.4).
 *
 * @param shapeK   shape factor k, 1 to 5 (about 2 at most inland sites)
 * @param scaleCMs scale factor c, m/s, > 0 and <= 40
 */
public record Weibull(double shapeK, double scaleCMs) implements WindDistribution {
    public Weibull {
        new Checks().range("shapeK", shapeK, 1.0, 5.0).rangeExclusiveMin("scaleCMs", scaleCMs, 0.0, 40.0)
                .throwIfAny();
    }

    /**
     * The Weibull distribution with a given shape and mean: c = mean / Gamma(1 + 1/k).
     *
     * @param shapeK          shape factor, 1 to 5
     * @param meanWindSpeedMs long-term mean wind speed, m/s, > 0 and <= 30
     */
    public static Weibull fromMean(double shapeK, double meanWindSpeedMs) {
        new Checks().range("shapeK", shapeK, 1.0, 5.0).rangeExclusiveMin("meanWindSpeedMs", meanWindSpeedMs, 0.0, 30.0)
                .throwIfAny();
        return new Weibull(shapeK, meanWindSpeedMs / Gamma.gamma(1.0 + 1.0 / shapeK));
    }

    @Override
    public double pdf(double windSpeedMs) {
        WindDistribution.checkWindSpeed(windSpeedMs);
        double x = windSpeedMs / scaleCMs;
        return shapeK / scaleCMs * Math.pow(x, shapeK - 1.0) * Math.exp(-Math.pow(x, shapeK));
    }

    @Override
    public double cdf(double windSpeedMs) {
        WindDistribution.checkWindSpeed(windSpeedMs);
        return -Math.expm1(-Math.pow(windSpeedMs / scaleCMs, shapeK));
    }

    @Override
    public double meanWindSpeedMs() {
        return scaleCMs * Gamma.gamma(1.0 + 1.0 / shapeK);
    }
}
