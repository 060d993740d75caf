package coilwright.load;

import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;

/**
 * An isolated current pulse of one diode pair in discontinuous conduction, computed without cancellation.
 * <p>
 * The pair (k up, j down) starts from zero current where e_k - e_j = A cos(psi) first exceeds V0 (psi = -theta,
 * cos(theta) = V0 / A). With x = psi + theta, the loop equation L' di/dt + R' i = A (cos psi - cos theta),
 * L' = 2L, R' = 2R + Rdc, becomes di/dx + kappa i = I0 (sin(theta) sin x - cos(theta) (1 - cos x)) with
 * kappa = R' / (w L') and I0 = A / (w L'). Its solution from i(0) = 0 is a power series in x whose coefficients
 * follow from the equation term by term: i = I0 * sum f_n x^n. Near cut-in (small theta) the general closed
 * form of {@link BridgeSegment} subtracts terms of the size of the short-circuit current to obtain a pulse
 * of size I0 theta^3, losing most digits; the series keeps full relative accuracy. Where kappa x exceeds 2
 * (a resistive loop) the closed form p(x) - p(0) exp(-kappa x), with p the particular solution written in
 * 1 - cos x, is used instead. The pulse ends at the first root of i after its peak; averages are composite
 * Gauss-Legendre quadratures on panels doubling in length from x = 2 / kappa (exact to rounding here).
 */
final class BridgePulse {
    /** Largest window half-width handled as an isolated pulse, radians (isolated as long as it ends before psi = 0.45, short of the 30 degrees where a third phase could join). */
    static final double MAX_WINDOW_RAD = 0.2;
    /** Largest kappa * x for which the series is summed; beyond it the closed form has no cancellation. */
    private static final double MAX_KAPPA_X = 2;
    private static final double MAX_END_PSI_RAD = 0.45;
    private static final int TERMS = 60;
    /** Largest series coefficient kept (its term is negligible long before; see coefficients). */
    private static final double COEFFICIENT_LIMIT = 1e250;
    private static final GaussIntegrator UNIT = new GaussIntegratorFactory().legendre(24, 0, 1);

    /** The pair: the branch on the upper rail and the one on the lower rail. */
    final int upperBranch;
    final int lowerBranch;
    /** Pulse length, electrical radians. */
    final double lengthRad;
    /** Integrals over the pulse, in seconds: of i, of i^2 and of (e_k - e_j) i. */
    final double chargeC;
    final double squareA2s;
    final double emfEnergyJ;
    /** Peak current, A. */
    final double peakA;

    /** Taylor coefficients f_n of i / I0 in x. */
    private final double[] taylor;
    private final double theta;
    private final double kappa;
    private final double xSeries;

    private BridgePulse(double theta, double kappa, double[] f) {
        this.upperBranch = -1;
        this.lowerBranch = -1;
        this.taylor = f;
        this.theta = theta;
        this.kappa = kappa;
        this.xSeries = MAX_KAPPA_X / kappa;
        lengthRad = 0;
        chargeC = 0;
        squareA2s = 0;
        emfEnergyJ = 0;
        peakA = 0;
    }

    private BridgePulse(BridgeModel model, int k, int j, BridgePulse shape, double lengthRad) {
        this.upperBranch = k;
        this.lowerBranch = j;
        this.taylor = shape.taylor;
        this.theta = shape.theta;
        this.kappa = shape.kappa;
        this.xSeries = shape.xSeries;
        this.lengthRad = lengthRad;
        double scale = model.emfPeakPairV / (model.omega * 2 * model.inductanceH);
        double q1 = 0;
        double q2 = 0;
        double pe = 0;
        double a = 0;
        double b = Math.min(lengthRad, xSeries);
        while (a < lengthRad) {
            for (int n = 0; n < UNIT.getNumberOfPoints(); n++) {
                double x = a + (b - a) * UNIT.getPoint(n);
                double wgt = (b - a) * UNIT.getWeight(n);
                double fx = series(x);
                q1 += wgt * fx;
                q2 += wgt * fx * fx;
                pe += wgt * Math.cos(x - theta) * fx;
            }
            a = b;
            b = Math.min(lengthRad, 2 * b);
        }
        chargeC = scale * q1 / model.omega;
        squareA2s = scale * scale * q2 / model.omega;
        emfEnergyJ = model.emfPeakPairV * scale * pe / model.omega;
        double top = new BrentOptimizer(1e-13, 1e-300).optimize(new MaxEval(200),
                new UnivariateObjectiveFunction(this::series), GoalType.MAXIMIZE,
                new SearchInterval(0, lengthRad)).getValue();
        peakA = scale * Math.max(top, 0);
    }

    /**
     * The pulse of pair (k, j) starting at its window start, or null when it is not isolated (window too wide,
     * series out of range, or the pulse running past the remaining time).
     *
     * @param remainingRad electrical angle left in the sweep
     */
    static BridgePulse of(BridgeModel model, int k, int j, double remainingRad) {
        double theta = model.windowHalfRad;
        double kappa = (2 * model.resistanceOhm + model.dcResistanceOhm) / (model.omega * 2 * model.inductanceH);
        double xMax = MAX_END_PSI_RAD + theta;
        if (theta > MAX_WINDOW_RAD) {
            return null;
        }
        BridgePulse shape = new BridgePulse(theta, kappa, coefficients(theta, kappa));
        // i / x^2 is positive at 0 and has no double root there: bracket its first root by stepping
        double lo = theta;
        double hi = lo;
        while (shape.reduced(hi) > 0) {
            lo = hi;
            hi += 0.25 * theta;
            if (hi > xMax) {
                return null;
            }
        }
        double length = new BrentSolver(1e-15, 1e-300).solve(200, shape::reduced, lo, hi);
        if (length > remainingRad) {
            return null;
        }
        return new BridgePulse(model, k, j, shape, length);
    }

    /** Series coefficients f_n (n >= 2; f_0 = f_1 = 0) of i / I0. */
    private static double[] coefficients(double theta, double kappa) {
        double[] f = new double[TERMS];
        double s = Math.sin(theta);
        double c = Math.cos(theta);
        double fact = 1;
        for (int n = 1; n < TERMS - 1; n++) {
            fact *= n;
            // Taylor coefficient of sin(theta) sin x - cos(theta) (1 - cos x) at x^n
            double gamma = n % 2 == 1 ? s * ((n / 2) % 2 == 0 ? 1 : -1) / fact
                    : -c * ((n / 2) % 2 == 1 ? 1 : -1) / fact;
            f[n + 1] = (gamma - kappa * f[n]) / (n + 1);
            if (!Double.isFinite(f[n + 1]) || Math.abs(f[n + 1]) > COEFFICIENT_LIMIT) {
                // a strongly resistive loop: |f_n| grows like kappa^n / n!, but the series is summed only for
                // x <= 2 / kappa, where these terms are below 2^n / n! of the sum: the rest is dropped
                f[n + 1] = 0;
                break;
            }
        }
        return f;
    }

    /** i(x) / I0. */
    double series(double x) {
        return x <= xSeries ? x * x * horner(x) : closed(x);
    }

    /** i(x) / (I0 x^2). */
    double reduced(double x) {
        return x <= xSeries ? horner(x) : closed(x) / (x * x);
    }

    private double horner(double x) {
        double sum = 0;
        for (int n = taylor.length - 1; n >= 2; n--) {
            sum = sum * x + taylor[n];
        }
        return sum;
    }

    /** p(x) - p(0) exp(-kappa x), p the particular solution, for kappa x > 2. */
    private double closed(double x) {
        double s = Math.sin(theta);
        double c = Math.cos(theta);
        double c2 = 2 * Math.sin(x / 2) * Math.sin(x / 2);
        double sx = Math.sin(x);
        double k2 = 1 + kappa * kappa;
        double p = (kappa * s * sx - s * Math.cos(x) - c * (1 + kappa * kappa * c2) / kappa + c * sx) / k2;
        double p0 = (-s - c / kappa) / k2;
        return p - p0 * Math.exp(-kappa * x);
    }
}
