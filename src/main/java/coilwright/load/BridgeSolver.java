package coilwright.load;

import coilwright.validation.SolverFailedException;
import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.exception.MathIllegalStateException;

import java.util.Locale;

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
 * <p>
 * Safeguards, in order: the warm start (when a sweep gives one); the cold start above; then Newton with a fresh
 * finite-difference Jacobian at every step and a longer line search (damped Newton) after more fixed-point sweeps;
 * then the plain fixed-point sweeps themselves, which are the circuit's own transient and contract with the factor
 * q = exp(-R T_s / L) per interval (the branch energy L |i - i'|^2 / 2 of two solutions decays at least at the rate
 * 2R/L: resistors dissipate and ideal diodes and the battery are monotone), stopped when the contraction bound
 * q / (1 - q) |dx| on the remaining error is met. Every convergence test is relative to the current magnitudes
 * (the state, and the coefficient sums of the waveforms, whose rounding noise limits the residual). Only when all
 * of these give up does the solver report a {@link SolverFailedException} naming the circuit.
 */
public final class BridgeSolver {
    /** Smallest wL/(R + R_dc) and largest wL/R the solver takes (see checkResolvable). */
    public static final double MIN_REACTANCE_RATIO = 1e-8;
    public static final double MAX_REACTANCE_RATIO = 1e6;
    private static final int FIXED_POINT_SWEEPS = 2;
    private static final int MAX_NEWTON = 60;
    private static final double NEWTON_TOLERANCE = 1e-13;
    private static final double ACCEPT_TOLERANCE = 1e-9;
    /** Rounding noise of a residual relative to the coefficient sums of the sweep's waveforms. */
    private static final double NOISE_TOLERANCE = 1e-13;
    /** Fixed-point sweeps before the damped Newton fallback. */
    private static final int FALLBACK_SWEEPS = 12;
    private static final int MAX_DAMPED_NEWTON = 80;
    /** Most fixed-point sweeps of the last fallback. */
    private static final int MAX_TRANSIENT_SWEEPS = 20_000;
    /** Remaining-error bound at which the fixed-point sweeps stop, relative to the current scale. */
    private static final double TRANSIENT_TOLERANCE = 1e-11;

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
     * @throws SolverFailedException if no method finds the periodic solution (not expected for valid input); the
     *                               message names the circuit
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
        checkResolvable(circuit);
        BridgeModel md = new BridgeModel(circuit);
        try {
            return BridgeResults.assemble(circuit, md, periodic(md, warm));
        } catch (NoPeriodicSolution | MathIllegalStateException | MathIllegalArgumentException e) {
            if (warm != null) {
                warm.forget();
            }
            throw failure(circuit, e);
        }
    }

    /**
     * Refuses a circuit whose time constants the waveforms cannot carry in double precision: the reactance wL must
     * be at most {@link #MAX_REACTANCE_RATIO} times the AC-side resistance R (else the waveforms are differences of
     * terms up to that many times the currents they describe) and at least {@link #MIN_REACTANCE_RATIO} times the
     * loop resistance R + R_dc (else the DC mode decays that many times faster than the electrical period and its
     * events crowd within rounding). Real windings lie between about 0.01 and 100; an ideal bridge feeding a load
     * resistor (wL/(R + R_dc) near 1e-7) is still taken.
     */
    private static void checkResolvable(BridgeCircuit c) {
        double r = c.windingResistanceOhm() + c.acCableResistanceOhm();
        double x = 2 * Math.PI * c.frequencyHz() * c.inductanceH();
        double loop = r + c.dcResistanceOhm();
        if (!(x <= MAX_REACTANCE_RATIO * r && x >= MIN_REACTANCE_RATIO * loop)) {
            throw new SolverFailedException("phaseInductanceH", String.format(Locale.ROOT, "At %.6g Hz the winding's "
                            + "reactance (%.4g Ohm per phase) is %.3g times its resistance with the AC cable (%.4g Ohm) and "
                            + "%.3g times the loop resistance with the DC side (%.4g Ohm): the rectifier model resolves "
                            + "reactance from %.0e times the loop resistance to %.0e times the AC-side resistance. Check "
                            + "the phase inductance, the resistances and the speed range.", c.frequencyHz(), x, x / r, r,
                    x / loop, loop, MIN_REACTANCE_RATIO, MAX_REACTANCE_RATIO));
        }
    }

    /** The typed failure for a circuit, in words a user can act on. */
    private static SolverFailedException failure(BridgeCircuit c, RuntimeException cause) {
        return new SolverFailedException("", String.format(Locale.ROOT, "The rectifier's periodic steady state could "
                        + "not be found at %.6g Hz (phase EMF %.6g V rms, %.4g Ohm and %.4g H per phase, battery plus two "
                        + "diode drops %.4g V, %s): %s. A slightly different speed range, battery voltage or cable "
                        + "usually avoids it; please report the design if it does not.", c.frequencyHz(),
                c.emfPhaseRmsV(), c.windingResistanceOhm() + c.acCableResistanceOhm(), c.inductanceH(), c.thresholdV(),
                c.type() == BridgeType.THREE_PHASE_BRIDGE ? "three-phase bridge" : "single-phase bridge",
                cause.getMessage()), cause);
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
        RuntimeException first;
        try {
            return coldNewton(md, warm, FIXED_POINT_SWEEPS, false);
        } catch (NoPeriodicSolution | MathIllegalStateException | MathIllegalArgumentException e) {
            first = e;
        }
        if (warm != null) {
            warm.forget();
        }
        try {
            return coldNewton(md, null, FALLBACK_SWEEPS, true);
        } catch (NoPeriodicSolution | MathIllegalStateException | MathIllegalArgumentException e) {
            // the transient below needs neither a Jacobian nor a smooth map
        }
        try {
            return settledTransient(md);
        } catch (NoPeriodicSolution | MathIllegalStateException | MathIllegalArgumentException e) {
            throw new NoPeriodicSolution(first.getMessage() + "; damped Newton and " + e.getMessage());
        }
    }

    /**
     * Fixed-point sweeps from rest, then Newton anchored inside the busiest segment. With {@code damped}, the
     * Jacobian is recomputed at every step (no chord, no Broyden update) and the line search goes further.
     */
    private static BridgeSweep coldNewton(BridgeModel md, BridgeWarmStart warm, int sweeps, boolean damped) {
        int m = md.m;
        BridgeSweep sw = new BridgeSweep(md, 0, new double[m]);
        for (int it = 0; it < sweeps; it++) {
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
        nt.damped = damped;
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

    /**
     * The last fallback: the circuit's own transient, one symmetry interval after another from rest, until the
     * contraction bound q / (1 - q) |x_next - x| on the distance to the periodic state falls below
     * {@link #TRANSIENT_TOLERANCE} of the current scale.
     */
    private static BridgeSweep settledTransient(BridgeModel md) {
        double q = Math.exp(-md.r * md.sweepS / md.l);
        double factor = q / -Math.expm1(-md.r * md.sweepS / md.l);
        BridgeSweep sw = new BridgeSweep(md, 0, new double[md.m]);
        double[] x = new double[md.m];
        double[] next = new double[md.m];
        for (int it = 0; it < MAX_TRANSIENT_SWEEPS; it++) {
            md.unshift(sw.end, next);
            double step = 0;
            double size = 0;
            for (int k = 0; k < md.m; k++) {
                step += (next[k] - x[k]) * (next[k] - x[k]);
                size = Math.max(size, Math.abs(next[k]));
            }
            double tolerance = Math.max(TRANSIENT_TOLERANCE * Math.max(size, 1e-3 * md.currentScaleA()),
                    NOISE_TOLERANCE * sw.coefficientMagnitudeA);
            if (factor * Math.sqrt(step) <= tolerance) {
                return sw;
            }
            System.arraycopy(next, 0, x, 0, md.m);
            sw = new BridgeSweep(md, 0, x.clone());
        }
        throw new NoPeriodicSolution("the transient had not settled after " + MAX_TRANSIENT_SWEEPS
                + " intervals (contraction factor " + q + ")");
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
        } catch (NoPeriodicSolution | MathIllegalStateException | MathIllegalArgumentException e) {
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
        /** Fresh Jacobian at every step and a longer line search (the fallback). */
        boolean damped;

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
            int maxSteps = damped ? MAX_DAMPED_NEWTON : MAX_NEWTON;
            double minLambda = damped ? 1e-6 : 1e-3;
            for (int it = 0; it < maxSteps; it++) {
                double size = Math.max(norm(y), 1e-3 * scale);
                double noise = NOISE_TOLERANCE * r.sweep.coefficientMagnitudeA;
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
