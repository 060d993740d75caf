package coilwright.load;

/**
 * Periodic steady state of a diode bridge charging a battery from a sinusoidal source behind R and L.
 * <p>
 * Method: the circuit is piecewise linear; within each conduction state the branch currents are exact sums
 * of exponentials and sinusoids ({@link BridgeSegment}); switching events are located on these closed forms
 * ({@link BridgeSweep}). The waveform repeats every 60 electrical degrees with the phases rotated and negated
 * (three-phase) or every half period negated (single-phase), so the periodic state solves
 * Map(x0) = P x0 over one such interval. Discontinuous conduction is found directly (an interval with no
 * diode conducting fixes the state to zero); otherwise the equation is solved by Newton's method with a
 * finite-difference Jacobian, started from a few fixed-point sweeps and anchored inside an interval where
 * the most diodes conduct (where the map is smooth). Shooting for periodic solutions of switched circuits
 * follows Aprille and Trick (1972); the exact piecewise solution is the classical treatment of the bridge
 * in, e.g., Mohan, Undeland and Robbins, "Power Electronics", 2003, ch. 5.
 */
public final class BridgeSolver {
    private static final int FIXED_POINT_SWEEPS = 2;
    private static final int MAX_NEWTON = 60;
    private static final double NEWTON_TOLERANCE = 1e-13;
    private static final double ACCEPT_TOLERANCE = 1e-9;

    private BridgeSolver() {
    }

    /**
     * Solves one operating point.
     *
     * @param circuit the circuit (validated)
     * @return period averages; exactly zero currents when sqrt(2)*E_LL (three-phase) or sqrt(2)*E
     *         (single-phase) does not exceed Vb + 2 Vd, or exceeds it so little that the window where it does is
     *         narrower than {@link BridgeModel#MIN_WINDOW_RAD} on each side of the peak (a relative margin below
     *         5e-7, where the true DC current is below 1e-11 of the short-circuit current)
     * @throws IllegalStateException if the periodic solution cannot be found (not expected for valid input)
     */
    public static BridgeOperatingPoint solve(BridgeCircuit circuit) {
        return solve(circuit, null);
    }

    /**
     * The solver's own zero test, in closed form: false exactly when {@link #solve(BridgeCircuit)} returns zero
     * currents because the conduction window is narrower than {@link BridgeModel#MIN_WINDOW_RAD}.
     *
     * @param circuit the circuit (validated)
     * @return true when the bridge conducts
     */
    public static boolean conducts(BridgeCircuit circuit) {
        return BridgeModel.windowHalfRad(circuit.peakDrivingEmfV(), circuit.thresholdV()) >= BridgeModel.MIN_WINDOW_RAD;
    }

    /**
     * Solves one operating point starting from what a neighbouring point left in {@code warm} (null: a cold
     * start), and leaves this point's solution there for the next one. The answer is the same periodic solution
     * to the same tolerance; only the work to reach it changes.
     */
    static BridgeOperatingPoint solve(BridgeCircuit circuit, BridgeWarmStart warm) {
        if (!conducts(circuit)) {
            if (warm != null) {
                warm.forget();
            }
            return BridgeResults.belowCutIn(circuit);
        }
        BridgeModel md = new BridgeModel(circuit);
        return BridgeResults.assemble(circuit, md, periodic(md, warm));
    }

    static BridgeSweep periodic(BridgeModel md) {
        return periodic(md, null);
    }

    private static BridgeSweep periodic(BridgeModel md, BridgeWarmStart warm) {
        if (warm != null && warm.ready()) {
            BridgeSweep fast = warmNewton(md, warm);
            if (fast != null) {
                return fast;
            }
        }
        int m = md.m;
        BridgeSweep sw = new BridgeSweep(md, 0, new double[m]);
        for (int it = 0; it < FIXED_POINT_SWEEPS; it++) {
            int off = longestOff(sw);
            if (off >= 0) {
                BridgeSegment s = sw.segments.get(off);
                BridgeSweep fromZero = new BridgeSweep(md, s.t0 + sw.durations.get(off) / 2, new double[m]);
                if (endsOff(fromZero)) {
                    if (warm != null) {
                        warm.forget();
                    }
                    return fromZero;
                }
                sw = fromZero;
            }
            double[] next = new double[m];
            md.unshift(sw.end, next);
            sw = new BridgeSweep(md, sw.t0, next);
        }
        int best = busiest(sw);
        BridgeSegment anchor = sw.segments.get(best);
        double half = sw.durations.get(best) / 2;
        double[] xa = new double[md.m];
        anchor.currentsAt(half, xa);
        Newton nt = new Newton(md, anchor.t0 + half, java.util.Arrays.copyOf(xa, md.m - 1), null);
        BridgeSweep result = nt.solve();
        if (warm != null) {
            if (longestOff(result) < 0) {
                warm.remember(result, md.w, nt.jac);
            } else {
                warm.forget();
            }
        }
        return result;
    }

    /** Newton from the predicted state at the last solution's anchor angle; null when that does not work out. */
    private static BridgeSweep warmNewton(BridgeModel md, BridgeWarmStart warm) {
        double anchorRad = warm.anchorRad();
        double[] y = warm.predict(anchorRad, md.w, md.m - 1);
        if (y == null) {
            return null;
        }
        try {
            Newton nt = new Newton(md, anchorRad / md.w, y, warm.jacobian);
            BridgeSweep result = nt.solve();
            if (longestOff(result) >= 0) {
                return null;
            }
            warm.remember(result, md.w, nt.jac);
            return result;
        } catch (IllegalStateException e) {
            return null;
        }
    }

    /** Index of the segment with the most conducting diodes (the longest among equals): where the map is smooth. */
    static int busiest(BridgeSweep sw) {
        int best = 0;
        for (int i = 1; i < sw.segments.size(); i++) {
            int ci = sw.segments.get(i).conducting();
            int cb = sw.segments.get(best).conducting();
            if (ci > cb || ci == cb && sw.durations.get(i) > sw.durations.get(best)) {
                best = i;
            }
        }
        return best;
    }

    /** Newton's method on the residual at anchor time ta, with a chord Jacobian kept while it converges fast. */
    private static final class Newton {
        private final BridgeModel md;
        private final double ta;
        private final double[] y0;
        double[][] jac;

        Newton(BridgeModel md, double ta, double[] y0, double[][] jac) {
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
            for (int it = 0; it < MAX_NEWTON; it++) {
                double size = Math.max(norm(y), 1e-3 * scale);
                if (norm(r.value) <= NEWTON_TOLERANCE * size
                        || it >= MAX_NEWTON / 2 && norm(r.value) <= ACCEPT_TOLERANCE * size) {
                    return r.sweep;
                }
                if (jac == null) {
                    jac = jacobian(md, ta, y, r, size);
                }
                double[] step = solveSmall(jac, r.value);
                Residual next = null;
                for (double lambda = 1; lambda > 1e-3; lambda /= 2) {
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
                    if (norm(r.value) <= ACCEPT_TOLERANCE * size) {
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
            throw new IllegalStateException("bridge solver: no periodic solution after " + MAX_NEWTON
                    + " Newton steps (residual " + norm(r.value) + " A)");
        }
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

    private static double norm(double[] v) {
        double n = 0;
        for (double d : v) {
            n = Math.max(n, Math.abs(d));
        }
        return n;
    }

    private static int longestOff(BridgeSweep sw) {
        int idx = -1;
        for (int i = 0; i < sw.segments.size(); i++) {
            if (sw.segments.get(i).off() && sw.durations.get(i) > 0
                    && (idx < 0 || sw.durations.get(i) > sw.durations.get(idx))) {
                idx = i;
            }
        }
        return idx;
    }

    private static boolean endsOff(BridgeSweep sw) {
        return sw.segments.get(sw.segments.size() - 1).off();
    }
}
