package coilwright.load;

/**
 * Newton's method on the periodic residual of the bridge (Map(x0) unshifted minus x0, on the independent branch
 * currents at anchor time anchorS, s), with the exact Jacobian that every residual's trace carries (the state transition of
 * each linear segment and the saltation at each event, see {@link SymmetryIntervalTrace#endSensitivity}); a forward-difference
 * Jacobian only where that is not finite (an event met tangentially). {@link #damped} searches the line further (the
 * fallback). Convergence is tested against the state's size and against the rounding noise of the trace's
 * waveforms. See {@link BridgeSolver} for the method and the fallbacks around it.
 */
final class BridgeNewton {
    private static final int MAX_NEWTON = 60;
    private static final int MAX_DAMPED_NEWTON = 80;
    private static final double NEWTON_TOLERANCE = 1e-13;
    private static final double ACCEPT_TOLERANCE = 1e-9;
    private static final int MAX_POLISH_STEPS = 3;

    private final BridgeModel model;
    private final double anchorS;
    private final double[] startCurrentsA;
    /** A longer line search and more steps (the fallback). */
    boolean damped;

    BridgeNewton(BridgeModel model, double anchorS, double[] startCurrentsA) {
        this.model = model;
        this.anchorS = anchorS;
        this.startCurrentsA = startCurrentsA;
    }

    SymmetryIntervalTrace solve() {
        int n = model.branches - 1;
        double[] y = startCurrentsA;
        double scale = model.currentScaleA();
        Residual r = new Residual(model, anchorS, y);
        int maxSteps = damped ? MAX_DAMPED_NEWTON : MAX_NEWTON;
        double minLambda = damped ? 1e-6 : 1e-3;
        for (int it = 0; it < maxSteps; it++) {
            double size = Math.max(norm(y), 1e-3 * scale);
            double noise = BridgeSolver.NOISE_TOLERANCE * r.trace.coefficientMagnitudeA;
            if (norm(r.value) <= NEWTON_TOLERANCE * size) {
                return r.trace;
            }
            if (norm(r.value) <= noise
                    || it >= maxSteps / 2 && norm(r.value) <= Math.max(ACCEPT_TOLERANCE * size, noise)) {
                return polished(r).trace;
            }
            double[][] jac = finite(r.jacobian) ? r.jacobian : finiteDifferenceJacobian(model, anchorS, y, r.value, size);
            double[] step = solveSmall(jac, r.value);
            if (!finite(step)) {
                throw new NoPeriodicSolution("singular Newton matrix (residual " + norm(r.value) + " A)");
            }
            Residual next = null;
            for (double lambda = 1; lambda > minLambda; lambda /= 2) {
                double[] yt = y.clone();
                for (int i = 0; i < n; i++) {
                    yt[i] -= lambda * step[i];
                }
                Residual trial = new Residual(model, anchorS, yt);
                if (norm(trial.value) < norm(r.value)) {
                    next = trial;
                    break;
                }
            }
            if (next == null) {
                if (norm(r.value) <= Math.max(ACCEPT_TOLERANCE * size, noise)) {
                    return r.trace;
                }
                double[] fp = new double[model.branches];
                model.unshift(r.trace.endCurrentsA, fp);
                next = new Residual(model, anchorS, java.util.Arrays.copyOf(fp, n));
            }
            r = next;
            y = next.y;
        }
        throw new NoPeriodicSolution("no periodic solution after " + maxSteps
                + " Newton steps (residual " + norm(r.value) + " A)");
    }

    /**
     * Full Newton steps from a state accepted at the trace's rounding-noise floor, kept while they shrink the
     * residual (at most {@link #MAX_POLISH_STEPS}). The noise floor is an estimate from the waveform's largest
     * coefficient; where that coefficient is thousands of times the current (a large reactance over a tiny
     * resistance near cut-in), the state it accepts can still be improved, and the energy balance shows it.
     */
    private Residual polished(Residual r) {
        for (int k = 0; k < MAX_POLISH_STEPS; k++) {
            double[][] jac = finite(r.jacobian) ? r.jacobian : null;
            if (jac == null) {
                return r;
            }
            double[] step = solveSmall(jac, r.value);
            if (!finite(step)) {
                return r;
            }
            double[] yt = r.y.clone();
            for (int i = 0; i < yt.length; i++) {
                yt[i] -= step[i];
            }
            Residual trial = new Residual(model, anchorS, yt);
            if (!(norm(trial.value) < norm(r.value))) {
                return r;
            }
            r = trial;
        }
        return r;
    }

    /** The exact Jacobian of the residual at y (anchor time anchorS). */
    static double[][] exactJacobian(BridgeModel model, double anchorS, double[] y) {
        return new Residual(model, anchorS, y).jacobian;
    }

    /** Forward-difference Jacobian of the residual r at y, steps of 1e-7 of {@code size}. */
    static double[][] finiteDifferenceJacobian(BridgeModel model, double anchorS, double[] y, double[] r, double size) {
        int n = y.length;
        double[][] jac = new double[n][n];
        for (int j = 0; j < n; j++) {
            double[] yj = y.clone();
            double h = 1e-7 * size;
            yj[j] += h;
            Residual rj = new Residual(model, anchorS, yj);
            for (int i = 0; i < n; i++) {
                jac[i][j] = (rj.value[i] - r[i]) / h;
            }
        }
        return jac;
    }

    /** Map(x0) unshifted minus x0, on the independent branch currents, and its exact Jacobian. */
    static final class Residual {
        final double[] y;
        final double[] value;
        /** d value / d y, from the trace's exact sensitivity. */
        final double[][] jacobian;
        final SymmetryIntervalTrace trace;

        Residual(BridgeModel model, double t0, double[] y) {
            this.y = y;
            double[] x0 = new double[model.branches];
            double sum = 0;
            for (int i = 0; i < y.length; i++) {
                x0[i] = y[i];
                sum += y[i];
            }
            x0[model.branches - 1] = -sum;
            trace = new SymmetryIntervalTrace(model, t0, x0, true);
            double[] back = new double[model.branches];
            model.unshift(trace.endCurrentsA, back);
            value = new double[y.length];
            for (int i = 0; i < y.length; i++) {
                value[i] = back[i] - y[i];
            }
            int n = y.length;
            jacobian = new double[n][n];
            double[] column = new double[model.branches];
            double[] shifted = new double[model.branches];
            for (int c = 0; c < n; c++) {
                for (int k = 0; k < model.branches; k++) {
                    column[k] = trace.endSensitivity[k][c];
                }
                model.unshift(column, shifted);
                for (int i = 0; i < n; i++) {
                    jacobian[i][c] = shifted[i] - (i == c ? 1 : 0);
                }
            }
        }
    }

    private static double[] solveSmall(double[][] a, double[] b) {
        if (a.length == 1) {
            return new double[] {b[0] / a[0][0]};
        }
        double det = a[0][0] * a[1][1] - a[0][1] * a[1][0];
        return new double[] {(b[0] * a[1][1] - a[0][1] * b[1]) / det, (a[0][0] * b[1] - a[1][0] * b[0]) / det};
    }

    private static boolean finite(double[][] a) {
        for (double[] row : a) {
            if (!finite(row)) {
                return false;
            }
        }
        return true;
    }

    private static boolean finite(double[] v) {
        for (double d : v) {
            if (!Double.isFinite(d)) {
                return false;
            }
        }
        return true;
    }

    private static double norm(double[] v) {
        double n = 0;
        for (double d : v) {
            n = Math.max(n, Math.abs(d));
        }
        return n;
    }
}
