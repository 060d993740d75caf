package coilwright.system;

import coilwright.turbine.Rayleigh;
import coilwright.turbine.Weibull;
import coilwright.turbine.WindDistribution;
import coilwright.validation.Checks;

/**
 * A site's long-term wind: its annual mean speed at hub height and the Weibull shape factor k of the
 * distribution of hourly speeds (Justus et al. 1978). k = 2 is the Rayleigh distribution, the usual
 * assumption when only the mean is known.
 *
 * @param meanWindSpeedMs annual mean wind speed at hub height, m/s, > 0 and <= 30
 * @param weibullShapeK   Weibull shape factor k, 1 to 5; 2 = Rayleigh
 */
public record WindRegime(double meanWindSpeedMs, double weibullShapeK) {
    public WindRegime {
        new Checks().rangeExclusiveMin("meanWindSpeedMs", meanWindSpeedMs, 0.0, 30.0)
                .range("weibullShapeK", weibullShapeK, 1.0, 5.0).throwIfAny();
    }

    /** The Rayleigh regime (k = 2) of a mean wind speed. */
    public static WindRegime rayleigh(double meanWindSpeedMs) {
        return new WindRegime(meanWindSpeedMs, 2.0);
    }

    /** True for k = 2. */
    public boolean isRayleigh() {
        return weibullShapeK == 2.0;
    }

    /** The distribution: {@link Rayleigh} for k = 2, else the {@link Weibull} with this mean and shape. */
    public WindDistribution distribution() {
        return isRayleigh() ? new Rayleigh(meanWindSpeedMs) : Weibull.fromMean(weibullShapeK, meanWindSpeedMs);
    }
}
