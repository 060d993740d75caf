package coilwright.turbine;

import coilwright.validation.Checks;

/**
 * A smooth two-parameter Cp curve. With x = lambda / lambdaOpt:
 * <pre>  Cp = cpMax * x * (1 + x - x^2)   for 0 <= x <= (1 + sqrt 5) / 2,   0 beyond</pre>
 * The cubic is this project's own modelling choice, fixed by four conditions: Cp(0) = 0,
 * Cp(lambdaOpt) = cpMax, dCp/dlambda = 0 at lambdaOpt, and a finite starting-torque coefficient
 * Cq(0) = cpMax / lambdaOpt. It puts the torque peak at lambdaOpt / 2 and the runaway at
 * 1.618 lambdaOpt, inside the 1.5 to 2 times lambdaOpt usually seen on small rotors (common practice).
 *
 * @param cpMax            the peak power coefficient, > 0 and <= 16/27 (Betz 1920)
 * @param tipSpeedRatioOpt the tip-speed ratio of the peak, 0.5 to 15
 */
public record ParametricCp(double cpMax, double tipSpeedRatioOpt) implements PowerCoefficientCurve {
    /** Runaway tip-speed ratio as a multiple of the optimum: the golden ratio, root of 1 + x - x^2. */
    public static final double RUNAWAY_RATIO = (1.0 + Math.sqrt(5.0)) / 2.0;

    public ParametricCp {
        Checks c = new Checks();
        c.positive("cpMax", cpMax);
        if (Double.isFinite(cpMax)) {
            c.require(cpMax <= BETZ_LIMIT, "cpMax", cpMax, "must be <= " + BETZ_TEXT + " (Betz limit)",
                    "> 0 and <= " + BETZ_TEXT);
        }
        c.range("tipSpeedRatioOpt", tipSpeedRatioOpt, 0.5, 15.0);
        c.throwIfAny();
    }

    @Override
    public double cp(double tipSpeedRatio) {
        PowerCoefficientCurve.checkTipSpeedRatio(tipSpeedRatio);
        double x = tipSpeedRatio / tipSpeedRatioOpt;
        return x >= RUNAWAY_RATIO ? 0.0 : Math.max(0.0, cpMax * x * (1.0 + x - x * x));
    }

    @Override
    public double torqueCoefficient(double tipSpeedRatio) {
        PowerCoefficientCurve.checkTipSpeedRatio(tipSpeedRatio);
        double x = tipSpeedRatio / tipSpeedRatioOpt;
        return x >= RUNAWAY_RATIO ? 0.0 : Math.max(0.0, cpMax / tipSpeedRatioOpt * (1.0 + x - x * x));
    }

    @Override
    public double optimumTipSpeedRatio() {
        return tipSpeedRatioOpt;
    }

    @Override
    public double maxCp() {
        return cpMax;
    }

    @Override
    public double runawayTipSpeedRatio() {
        return RUNAWAY_RATIO * tipSpeedRatioOpt;
    }
}
