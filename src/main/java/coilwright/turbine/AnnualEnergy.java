package coilwright.turbine;

import coilwright.validation.Checks;
import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

/**
 * Annual energy production by the method of bins of IEC 61400-12-1 (edition 2, 2017), clause 9.3:
 * <pre>  AEP = N_h * sum_i [F(V_i) - F(V_{i-1})] * (P_{i-1} + P_i) / 2,   N_h = 8760 h</pre>
 * with F the cumulative wind-speed distribution and P the power curve sampled at the bin edges
 * V_i = i * binWidth from 0 to the top wind speed (trapezoid between bins). Time above the top wind
 * speed counts as zero output, as for a turbine that shuts down there.
 */
public final class AnnualEnergy {
    /** Hours in a year used by IEC 61400-12-1. */
    public static final double HOURS_PER_YEAR = 8760.0;
    /** The standard bin width, m/s. */
    public static final double DEFAULT_BIN_WIDTH_MS = 0.5;
    /** Default top of the sum, m/s: a usual cut-out wind speed. */
    public static final double DEFAULT_MAX_WIND_MS = 25.0;

    private AnnualEnergy() {
    }

    /**
     * Annual energy with 0.5 m/s bins up to 25 m/s.
     *
     * @see #binMethod(DoubleUnaryOperator, WindDistribution, double, double, double)
     */
    public static AnnualEnergyResult binMethod(DoubleUnaryOperator powerCurveW, WindDistribution distribution,
                                               double ratedPowerW) {
        return binMethod(powerCurveW, distribution, DEFAULT_BIN_WIDTH_MS, DEFAULT_MAX_WIND_MS, ratedPowerW);
    }

    /**
     * Annual energy by the IEC 61400-12-1 bin method.
     *
     * @param powerCurveW   output power as a function of wind speed (m/s to W); must return a finite value >= 0
     * @param distribution  the site's wind-speed distribution
     * @param binWidthMs    bin width, m/s, 0.05 to 2 (0.5 in the standard)
     * @param maxWindMs     top wind speed of the sum, m/s, 5 to 50; must be at least one bin
     * @param ratedPowerW   rated power for the capacity factor, W, > 0
     * @return the energy per year and per day, capacity factor and the table of bins
     * @throws InvalidInputException naming the field, or {@code powerCurveW} when it returns a bad value
     */
    public static AnnualEnergyResult binMethod(DoubleUnaryOperator powerCurveW, WindDistribution distribution,
                                               double binWidthMs, double maxWindMs, double ratedPowerW) {
        Checks c = new Checks();
        c.present("powerCurveW", powerCurveW).present("distribution", distribution);
        c.range("binWidthMs", binWidthMs, 0.05, 2.0);
        c.range("maxWindMs", maxWindMs, 5.0, 50.0);
        c.positive("ratedPowerW", ratedPowerW);
        c.throwIfAny();
        int binCount = (int) Math.round(maxWindMs / binWidthMs);
        List<EnergyBin> bins = new ArrayList<>(binCount);
        double total = 0.0;
        double previousV = 0.0;
        double previousP = power(powerCurveW, 0.0);
        double previousF = distribution.cdf(0.0);
        for (int i = 1; i <= binCount; i++) {
            double v = Math.min(i * binWidthMs, maxWindMs);
            double p = power(powerCurveW, v);
            double f = distribution.cdf(v);
            double probability = f - previousF;
            double meanPowerW = 0.5 * (previousP + p);
            double energyKWh = HOURS_PER_YEAR * probability * meanPowerW / 1000.0;
            bins.add(new EnergyBin(previousV, v, probability, meanPowerW, energyKWh));
            total += energyKWh;
            previousV = v;
            previousP = p;
            previousF = f;
        }
        double meanPowerW = total * 1000.0 / HOURS_PER_YEAR;
        return new AnnualEnergyResult(total, total / 365.0, meanPowerW, ratedPowerW, meanPowerW / ratedPowerW,
                HOURS_PER_YEAR, bins);
    }

    private static double power(DoubleUnaryOperator powerCurveW, double windSpeedMs) {
        double p = powerCurveW.applyAsDouble(windSpeedMs);
        if (!Double.isFinite(p) || p < 0) {
            String value = Checks.fmt(p);
            throw new InvalidInputException(new FieldError("powerCurveW", value,
                    "powerCurveW = " + value + " at windSpeedMs = " + Checks.fmt(windSpeedMs)
                            + ": must be a finite power >= 0", ">= 0"));
        }
        return p;
    }
}
