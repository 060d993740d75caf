package coilwright.load;

/**
 * Newton's method on the periodic residual of the bridge (Map(x0) unshifted minus x0, on the independent branch
 * currents at anchor time ta), with a forward-difference Jacobian kept as a chord while it converges fast and
 * updated by Broyden's formula; {@link #damped} recomputes it at every step and searches the line further (the
 * fallback). Convergence is tested against the state's size and against the rounding noise of the sweep's
 * waveforms. See {@link BridgeSolver} for the method and the fallbacks around it.
 */
final class BridgeNewton {
    private static final int MAX_NEWTON = 60;
    private static final int MAX_DAMPED_NEWTON = 80;
    private static final double NEWTON_TOLERANCE = 1e-13;
    private static final double ACCEPT_TOLERANCE = 1e-9;

    private final BridgeModel md;
    private final double ta;
    private final double[] y0;
    double[][] jac;
    /** Fresh Jacobian at every step and a longer line search (the fallback). */
    boolean damped;

    BridgeNewton(BridgeModel md, double ta, double[] y0, double[][] jac) {
        this.md = md;
        this.ta = ta;
        this.y0 = y0;
        this.jac = jac;
    }

    BridgeSweep solve() {
        int n = md.m - 1;
        double[] y = y0;
        double scale = md.currentScaleA();
        Residual r = new Residual(md, ta, y);
        int maxSteps = damped ? MAX_DAMPED_NEWTON : MAX_NEWTON;
        double minLambda = damped ? 1e-6 : 1e-3;
        for (int it = 0; it < maxSteps; it++) {
            double size = Math.max(norm(y), 1e-3 * scale);
            double noise = BridgeSolver.NOISE_TOLERANCE * r.sweep.coefficientMagnitudeA;
            if (norm(r.value) <= Math.max(NEWTON_TOLERANCE * size, noise)
                    || it >= maxSteps / 2 && norm(r.value) <= Math.max(ACCEPT_TOLERANCE * size, noise)) {
                return r.sweep;
            }
            if (jac == null || damped) {
                jac = jacobian(md, ta, y, r, size);
            }
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
                Residual trial = new Residual(md, ta, yt);
                if (norm(trial.value) < norm(r.value)) {
                    next = trial;
                    break;
                }
            }
            if (next == null) {
                if (norm(r.value) <= Math.max(ACCEPT_TOLERANCE * size, noise)) {
                    return r.sweep;
                }
                double[] fp = new double[md.m];
                md.unshift(r.sweep.end, fp);
                next = new Residual(md, ta, java.util.Arrays.copyOf(fp, n));
            }
            if (norm(next.value) > 0.1 * norm(r.value)) {
                jac = null;
            } else if (jac != null && next.y != null) {
                broyden(jac, y, r.value, next.y, next.value);
            }
            r = next;
            y = next.y;
        }
        throw new NoPeriodicSolution("no periodic solution after " + maxSteps
                + " Newton steps (residual " + norm(r.value) + " A)");
    }

    /**
     * Broyden's rank-one update of the Jacobian after the step y0 -> y1 with residuals r0 -> r1 (Broyden, "A class
     * of methods for solving nonlinear simultaneous equations", Math. Comp. 19, 1965): the chord becomes secant.
     */
    private static void broyden(double[][] jac, double[] y0, double[] r0, double[] y1, double[] r1) {
        int n = y0.length;
        double ss = 0;
        double[] s = new double[n];
        for (int i = 0; i < n; i++) {
            s[i] = y1[i] - y0[i];
            ss += s[i] * s[i];
        }
        if (!(ss > 0)) {
            return;
        }
        for (int i = 0; i < n; i++) {
            double js = 0;
            for (int j = 0; j < n; j++) {
                js += jac[i][j] * s[j];
            }
            double u = (r1[i] - r0[i] - js) / ss;
            for (int j = 0; j < n; j++) {
                jac[i][j] += u * s[j];
            }
        }
    }

    /** Forward-difference Jacobian of the residual (reused while it keeps converging fast: a chord method). */
    private static double[][] jacobian(BridgeModel md, double ta, double[] y, Residual r, double size) {
        int n = y.length;
        double[][] jac = new double[n][n];
        for (int j = 0; j < n; j++) {
            double[] yj = y.clone();
            double h = 1e-7 * size;
            yj[j] += h;
            Residual rj = new Residual(md, ta, yj);
            for (int i = 0; i < n; i++) {
                jac[i][j] = (rj.value[i] - r.value[i]) / h;
            }
        }
        return jac;
    }

    /** Map(x0) unshifted minus x0, on the independent branch currents. */
    private static final class Residual {
        final double[] y;
        final double[] value;
        final BridgeSweep sweep;

        Residual(BridgeModel md, double t0, double[] y) {
            this.y = y;
            double[] x0 = new double[md.m];
            double sum = 0;
            for (int i = 0; i < y.length; i++) {
                x0[i] = y[i];
                sum += y[i];
            }
            x0[md.m - 1] = -sum;
            sweep = new BridgeSweep(md, t0, x0);
            double[] back = new double[md.m];
            md.unshift(sweep.end, back);
            value = new double[y.length];
            for (int i = 0; i < y.length; i++) {
                value[i] = back[i] - y[i];
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
