package coilwright.turbine;

import coilwright.validation.Checks;
import coilwright.validation.SolverFailedException;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

/** Darcy friction factor of full pipe flow. */
public final class PipeFriction {
    /** Below this Reynolds number the flow is taken as laminar, f = 64 / Re. */
    public static final double LAMINAR_LIMIT_RE = 2300.0;
    private static final double MIN_TURBULENT_RE = 2000.0;
    private static final double MAX_RE = 1e9;
    private static final double MAX_RELATIVE_ROUGHNESS = 0.05;
    private static final int MAX_EVAL = 100;
    private static final double SOLVER_ABS_TOL = 1e-13;
    /** Bracket on x = 1/sqrt(f): f from 0.0004 to 4 covers the whole Moody chart. */
    private static final double X_MIN = 0.5;
    private static final double X_MAX = 50.0;

    private PipeFriction() {
    }

    /**
     * Darcy friction factor for any flow: 64/Re when laminar (Hagen-Poiseuille), else Colebrook. The
     * transition zone 2300 to 4000 uses Colebrook, the larger and safer value.
     *
     * @param reynoldsNumber     Re, > 0 and <= 1e9
     * @param relativeRoughness  eps / D, 0 to 0.05
     */
    public static double darcy(double reynoldsNumber, double relativeRoughness) {
        new Checks().rangeExclusiveMin("reynoldsNumber", reynoldsNumber, 0.0, MAX_RE)
                .range("relativeRoughness", relativeRoughness, 0.0, MAX_RELATIVE_ROUGHNESS).throwIfAny();
        return reynoldsNumber < LAMINAR_LIMIT_RE ? 64.0 / reynoldsNumber : colebrook(reynoldsNumber, relativeRoughness);
    }

    /**
     * Colebrook-White equation (Colebrook 1939): 1/sqrt(f) = -2 log10(eps/(3.7 D) + 2.51/(Re sqrt f)),
     * solved for x = 1/sqrt(f) with Commons Math's Brent solver started from Swamee-Jain.
     *
     * @param reynoldsNumber     Re, 2000 to 1e9 (turbulent)
     * @param relativeRoughness  eps / D, 0 to 0.05
     */
    public static double colebrook(double reynoldsNumber, double relativeRoughness) {
        checkTurbulent(reynoldsNumber, relativeRoughness);
        UnivariateFunction residual = x -> x + 2.0 * Math.log10(relativeRoughness / 3.7 + 2.51 * x / reynoldsNumber);
        double start = 1.0 / Math.sqrt(swameeJain(reynoldsNumber, relativeRoughness));
        double x;
        try {
            x = new BrentSolver(SOLVER_ABS_TOL).solve(MAX_EVAL, residual, X_MIN, X_MAX,
                    Math.min(X_MAX, Math.max(X_MIN, start)));
        } catch (org.apache.commons.math3.exception.MathIllegalStateException
                 | org.apache.commons.math3.exception.MathIllegalArgumentException e) {
            throw new SolverFailedException("roughnessM", String.format(java.util.Locale.ROOT, "The Colebrook friction "
                    + "factor was not found at Reynolds number %.6g and relative roughness %.4g (%s). Check the pipe's "
                    + "roughness and diameter.", reynoldsNumber, relativeRoughness, e.getMessage()), e);
        }
        return 1.0 / (x * x);
    }

    /**
     * Swamee-Jain explicit approximation (Swamee &amp; Jain, J. Hydraulics Div. ASCE 102, 1976):
     * f = 0.25 / [log10(eps/(3.7 D) + 5.74 / Re^0.9)]^2, within about 1 % of Colebrook for
     * 1e-6 <= eps/D <= 1e-2 and 5e3 <= Re <= 1e8.
     *
     * @param reynoldsNumber     Re, 2000 to 1e9
     * @param relativeRoughness  eps / D, 0 to 0.05
     */
    public static double swameeJain(double reynoldsNumber, double relativeRoughness) {
        checkTurbulent(reynoldsNumber, relativeRoughness);
        double log = Math.log10(relativeRoughness / 3.7 + 5.74 / Math.pow(reynoldsNumber, 0.9));
        return 0.25 / (log * log);
    }

    private static void checkTurbulent(double reynoldsNumber, double relativeRoughness) {
        new Checks().range("reynoldsNumber", reynoldsNumber, MIN_TURBULENT_RE, MAX_RE)
                .range("relativeRoughness", relativeRoughness, 0.0, MAX_RELATIVE_ROUGHNESS).throwIfAny();
    }
}
