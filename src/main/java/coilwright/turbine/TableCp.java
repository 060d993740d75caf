package coilwright.turbine;

import coilwright.validation.Checks;
import coilwright.validation.SolverFailedException;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.interpolation.AkimaSplineInterpolator;
import org.apache.commons.math3.analysis.interpolation.LinearInterpolator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;

import java.util.Arrays;

/**
 * The user's own Cp curve as a table of (tip-speed ratio, Cp) points. Between points it is interpolated
 * with Commons Math: an Akima spline (Akima 1970, no overshoot at flat stretches) for 5 or more points,
 * straight lines for 3 or 4. Below the first point Cp runs on a straight line from (0, 0), which keeps the
 * starting torque finite; beyond the last point Cp is 0. The interpolant is clamped to [0, 16/27].
 * Field names in errors are {@code cpTable[i].tipSpeedRatio} and {@code cpTable[i].cp}.
 *
 * @param tipSpeedRatios strictly increasing, >= 0, at least 3 points; a point at 0 must have Cp 0
 * @param cps            Cp at each point, 0 to 16/27 (Betz 1920)
 */
public record TableCp(double[] tipSpeedRatios, double[] cps) implements PowerCoefficientCurve {
    private static final int SAMPLES = 2000;
    private static final int MAX_EVAL = 200;
    private static final double SOLVER_ABS_TOL_TSR = 1e-9;

    public TableCp {
        Checks c = new Checks();
        c.present("cpTable.tipSpeedRatio", tipSpeedRatios).present("cpTable.cp", cps).throwIfAny();
        tipSpeedRatios = tipSpeedRatios.clone();
        cps = cps.clone();
        c.require(tipSpeedRatios.length == cps.length, "cpTable", tipSpeedRatios.length + " tip-speed ratios, "
                + cps.length + " Cp values", "must have one Cp per tip-speed ratio", "equal counts");
        c.require(tipSpeedRatios.length >= 3, "cpTable", tipSpeedRatios.length + " points",
                "needs at least 3 points", ">= 3 points");
        c.throwIfAny();
        for (int i = 0; i < tipSpeedRatios.length; i++) {
            String lambdaField = "cpTable[" + i + "].tipSpeedRatio";
            String cpField = "cpTable[" + i + "].cp";
            c.range(lambdaField, tipSpeedRatios[i], 0.0, 30.0);
            c.nonNegative(cpField, cps[i]);
            if (Double.isFinite(cps[i])) {
                c.require(cps[i] <= BETZ_LIMIT, cpField, cps[i], "must be <= " + BETZ_TEXT + " (Betz limit)",
                        "0 to " + BETZ_TEXT);
            }
            if (i > 0 && Double.isFinite(tipSpeedRatios[i]) && Double.isFinite(tipSpeedRatios[i - 1])) {
                c.require(tipSpeedRatios[i] > tipSpeedRatios[i - 1], lambdaField, tipSpeedRatios[i],
                        "must be > cpTable[" + (i - 1) + "].tipSpeedRatio = " + Checks.fmt(tipSpeedRatios[i - 1])
                                + " (strictly increasing)", "> " + Checks.fmt(tipSpeedRatios[i - 1]));
            }
        }
        c.require(!(tipSpeedRatios[0] == 0.0 && cps[0] != 0.0), "cpTable[0].cp", cps[0],
                "must be 0 at tip-speed ratio 0 (a still rotor delivers no power)", "0");
        c.require(Arrays.stream(cps).anyMatch(v -> v > 0), "cpTable", "all Cp = 0",
                "needs at least one Cp > 0", "some Cp > 0");
        c.throwIfAny();
    }

    private UnivariateFunction interpolant() {
        return tipSpeedRatios.length >= 5
                ? new AkimaSplineInterpolator().interpolate(tipSpeedRatios, cps)
                : new LinearInterpolator().interpolate(tipSpeedRatios, cps);
    }

    /** Cp before clamping (may dip below 0 between points); 0 outside the table's upper end. */
    private double rawCp(UnivariateFunction f, double lambda) {
        double first = tipSpeedRatios[0];
        double last = tipSpeedRatios[tipSpeedRatios.length - 1];
        if (lambda > last) {
            return 0.0;
        }
        if (lambda < first) {
            return cps[0] * lambda / first;
        }
        return f.value(lambda);
    }

    private static double clamp(double cp) {
        return Math.min(BETZ_LIMIT, Math.max(0.0, cp));
    }

    @Override
    public double cp(double tipSpeedRatio) {
        PowerCoefficientCurve.checkTipSpeedRatio(tipSpeedRatio);
        return clamp(rawCp(interpolant(), tipSpeedRatio));
    }

    @Override
    public double torqueCoefficient(double tipSpeedRatio) {
        PowerCoefficientCurve.checkTipSpeedRatio(tipSpeedRatio);
        if (tipSpeedRatio > 0) {
            return cp(tipSpeedRatio) / tipSpeedRatio;
        }
        if (tipSpeedRatios[0] > 0) {
            return cps[0] / tipSpeedRatios[0];
        }
        double h = 1e-6 * tipSpeedRatios[tipSpeedRatios.length - 1];
        return cp(h) / h;
    }

    @Override
    public double optimumTipSpeedRatio() {
        UnivariateFunction f = interpolant();
        double first = tipSpeedRatios[0];
        double step = (tipSpeedRatios[tipSpeedRatios.length - 1] - first) / SAMPLES;
        int best = 0;
        for (int i = 1; i <= SAMPLES; i++) {
            if (clamp(f.value(first + i * step)) > clamp(f.value(first + best * step))) {
                best = i;
            }
        }
        double lo = first + Math.max(0, best - 1) * step;
        double hi = first + Math.min(SAMPLES, best + 1) * step;
        double refined;
        try {
            refined = new BrentOptimizer(1e-10, 1e-12).optimize(new MaxEval(MAX_EVAL), GoalType.MAXIMIZE,
                    new UnivariateObjectiveFunction(v -> clamp(f.value(v))),
                    new SearchInterval(lo, hi, first + best * step)).getPoint();
        } catch (org.apache.commons.math3.exception.MathIllegalStateException e) {
            // the best sample stands: the table's own resolution
            refined = first + best * step;
        }
        return clamp(f.value(refined)) >= clamp(f.value(first + best * step)) ? refined : first + best * step;
    }

    @Override
    public double maxCp() {
        return cp(optimumTipSpeedRatio());
    }

    @Override
    public double runawayTipSpeedRatio() {
        UnivariateFunction f = interpolant();
        double opt = optimumTipSpeedRatio();
        double last = tipSpeedRatios[tipSpeedRatios.length - 1];
        double step = (last - opt) / SAMPLES;
        for (int i = 1; i <= SAMPLES; i++) {
            double a = opt + (i - 1) * step;
            double b = opt + i * step;
            if (f.value(b) <= 0.0) {
                try {
                    return f.value(b) == 0.0 ? b
                            : new BrentSolver(SOLVER_ABS_TOL_TSR).solve(MAX_EVAL, f, a, b);
                } catch (org.apache.commons.math3.exception.MathIllegalStateException
                         | org.apache.commons.math3.exception.MathIllegalArgumentException e) {
                    throw new SolverFailedException("points", "The runaway tip-speed ratio of the Cp table was not "
                            + "found between " + a + " and " + b + " (" + e.getMessage() + "); check the table's points.", e);
                }
            }
        }
        return last;
    }

    @Override
    public double[] tipSpeedRatios() {
        return tipSpeedRatios.clone();
    }

    @Override
    public double[] cps() {
        return cps.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof TableCp t && Arrays.equals(tipSpeedRatios, t.tipSpeedRatios) && Arrays.equals(cps, t.cps);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(tipSpeedRatios) + Arrays.hashCode(cps);
    }

    @Override
    public String toString() {
        return "TableCp[tipSpeedRatios=" + Arrays.toString(tipSpeedRatios) + ", cps=" + Arrays.toString(cps) + "]";
    }
}
