package coilwright.system;

import coilwright.validation.Checks;
import coilwright.validation.SolverFailedException;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.exception.MathIllegalStateException;

import java.util.Locale;

import java.util.function.DoubleUnaryOperator;

/**
 * The steady speed a turbine settles at when it drives an alternator from rest.
 *
 * <p>With the residual R(n) = T_turbine(n) - T_alternator(n) (both at the alternator shaft, n in rpm),
 * the rotor accelerates while R &gt; 0 and slows while R &lt; 0. Started from rest it therefore runs up to
 * the <em>first</em> speed where R crosses from positive to zero or negative: the lowest stable equilibrium
 * (dR/dn &lt; 0 there). Higher crossings, if any, are not reached from rest without outside help (a gust
 * carrying the rotor through the unstable crossing); this rule neglects rotor inertia and is the
 * quasi-static start-up from rest.
 *
 * <p>Method: the residual is scanned on the caller's speed grid (plus the upper bound itself) for the first
 * sign change, then the bracket is refined with the Brent solver (Brent 1973, Commons Math
 * {@link BrentSolver}) to {@link #ABSOLUTE_ACCURACY_RPM}. Two crossings closer than one grid step can be
 * missed; the grid is the caller's choice of resolution.
 */
public final class TorqueMatch {
    /** Speed tolerance of the Brent solver, rpm: far below any meaningful speed, so the torque balance at the solved point holds to about 1e-9 relative. */
    public static final double ABSOLUTE_ACCURACY_RPM = 1e-9;
    private static final double RELATIVE_ACCURACY = 1e-14;
    private static final int MAX_EVAL = 200;

    private TorqueMatch() {
    }

    /**
     * The first stable crossing of a residual from rest.
     *
     * @param residualNm  R(n), N m, at alternator speed n rpm; finite
     * @param gridRpm     increasing scan speeds starting at 0, rpm
     * @param upperRpm    the highest speed to consider (the turbine's free-spinning or runaway speed), rpm, >= 0;
     *                    grid speeds above it are ignored
     * @return the matched speed, rpm: 0 when R(0) &lt;= 0 (the turbine cannot start), {@code upperRpm} when R
     *         stays positive up to it
     */
    public static double firstStableCrossingRpm(DoubleUnaryOperator residualNm, double[] gridRpm, double upperRpm) {
        new Checks().present("residualNm", residualNm).present("gridRpm", gridRpm).nonNegative("upperRpm", upperRpm)
                .throwIfAny();
        double previousN = 0.0;
        double previousR = residualNm.applyAsDouble(0.0);
        if (previousR <= 0.0 || upperRpm == 0.0) {
            return 0.0;
        }
        int i = 0;
        while (i < gridRpm.length && gridRpm[i] <= 0.0) {
            i++;
        }
        while (true) {
            boolean last = i >= gridRpm.length || gridRpm[i] >= upperRpm;
            double n = last ? upperRpm : gridRpm[i];
            double r = residualNm.applyAsDouble(n);
            if (r <= 0.0) {
                return r == 0.0 ? n : refine(residualNm, previousN, n);
            }
            if (last) {
                return upperRpm;
            }
            previousN = n;
            i++;
        }
    }

    private static double refine(DoubleUnaryOperator residualNm, double lowRpm, double highRpm) {
        UnivariateFunction f = residualNm::applyAsDouble;
        try {
            return new BrentSolver(RELATIVE_ACCURACY, ABSOLUTE_ACCURACY_RPM).solve(MAX_EVAL, f, lowRpm, highRpm);
        } catch (MathIllegalStateException | MathIllegalArgumentException e) {
            throw new SolverFailedException("", String.format(Locale.ROOT, "The torque balance between the turbine "
                    + "and the alternator was not settled between %.6g and %.6g rpm at the alternator (%s). A slightly "
                    + "different drive ratio or turbine size usually avoids it; please report the design if it does "
                    + "not.", lowRpm, highRpm, e.getMessage()), e);
        }
    }

    /**
     * An evenly spaced scan grid from 0 to a top speed.
     *
     * @param topRpm top speed, rpm, > 0
     * @param steps  number of intervals, 1 to 10000
     */
    public static double[] grid(double topRpm, int steps) {
        new Checks().positive("topRpm", topRpm).intRange("steps", steps, 1, 10_000).throwIfAny();
        double[] g = new double[steps + 1];
        for (int k = 0; k <= steps; k++) {
            g[k] = topRpm * k / steps;
        }
        return g;
    }
}
