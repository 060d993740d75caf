package coilwright.load;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;

import java.util.ArrayList;
import java.util.List;

/**
 * Follows the bridge circuit over one symmetry interval from a given state, switching conduction states
 * at diode events: a conducting diode's current reaching zero, or a blocked diode becoming forward-biased.
 * With no diode conducting the next start is known in closed form (the window where a line-to-line EMF exceeds
 * V0, see {@link BridgeModel#pairInWindow}). Otherwise events are bracketed by sampling the closed-form
 * waveforms every {@link #SAMPLE_RAD} of electrical angle and located with a Brent solver.
 * <p>
 * Each event function is evaluated as a sum of terms of size up to the sum of its coefficient magnitudes, so
 * its rounding noise is a fixed fraction of that sum. An event fires only when the function falls below minus
 * this noise level (a hysteresis): a branch that has just started from zero current, whose current rises from
 * a double root, cannot end again at the same instant on rounding noise.
 */
final class BridgeSweep {
    /** Sampling step for bracketing events, electrical radians (1.5 degrees). */
    static final double SAMPLE_RAD = Math.toRadians(1.5);
    /** Event-time accuracy, electrical radians. */
    static final double EVENT_ACCURACY_RAD = 1e-14;
    /** Noise level of an event function relative to the sum of its coefficient magnitudes. */
    static final double NOISE = 1e-13;
    private static final int MAX_EVENTS = 200;
    private static final int MAX_BRENT_EVALUATIONS = 200;

    private static final int CURRENT = 0;
    private static final int JOIN_UP = 1;
    private static final int JOIN_DOWN = 2;
    private static final int PAIR = 3;

    final List<BridgeSegment> segments = new ArrayList<>(8);
    final List<Double> durations = new ArrayList<>(8);
    /** The isolated pulse computed by series for each segment that is one, else null. */
    final List<BridgePulse> pulses = new ArrayList<>(8);
    final double[] end;
    final double t0;

    private final BridgeModel md;
    private final double tolV;
    private final double[][] fns;
    private final int[] fnType;
    private final int[] fnBranch;
    private final double[] fnTol;
    private final double[] prev;
    private final double[] bs = new double[BridgeSegment.NB];
    private double evTau;
    private int evType;
    private int evK;
    private int evJ;

    BridgeSweep(BridgeModel md, double t0, double[] x0) {
        this.md = md;
        this.t0 = t0;
        this.tolV = 1e-12 * (md.emfPeakV + md.v0);
        int nf = 2 * md.m;
        fns = new double[nf][BridgeSegment.NB];
        fnType = new int[nf];
        fnBranch = new int[nf];
        fnTol = new double[nf];
        prev = new double[nf];
        double tEnd = t0 + md.sweepS;
        double[] x = x0.clone();
        int[] sign = new int[md.m];
        int up = 0;
        int down = 0;
        for (int k = 0; k < md.m; k++) {
            sign[k] = x[k] > 0 ? 1 : x[k] < 0 ? -1 : 0;
            up += sign[k] > 0 ? 1 : 0;
            down += sign[k] < 0 ? 1 : 0;
        }
        if (up == 0 || down == 0) {
            java.util.Arrays.fill(sign, 0);
            java.util.Arrays.fill(x, 0);
        }
        double t = t0;
        BridgeSegment seg = settle(sign, t, x);
        for (int events = 0; ; events++) {
            if (events > MAX_EVENTS) {
                throw new IllegalStateException("bridge solver: more than " + MAX_EVENTS
                        + " switching events in one interval (w = " + md.w + " rad/s, V0 = " + md.v0 + " V)");
            }
            boolean found = seg.off() ? offEvent(t, tEnd - t) : findEvent(seg, tEnd - t);
            if (!found) {
                add(seg, tEnd - t, null);
                x = new double[md.m];
                seg.currentsAt(tEnd - t, x);
                break;
            }
            double tau = evTau;
            add(seg, tau, null);
            seg.currentsAt(tau, x);
            t += tau;
            seg = transition(seg, evType, evK, evJ, t, x);
            if (evType == PAIR && seg.conducting() == 2) {
                BridgePulse pulse = BridgePulse.of(md, evK, evJ, (tEnd - t) * md.w);
                if (pulse != null) {
                    double d = pulse.lengthRad / md.w;
                    add(seg, d, pulse);
                    t += d;
                    java.util.Arrays.fill(x, 0);
                    seg = settle(new int[md.m], t, x);
                }
            }
        }
        end = x;
    }

    /**
     * Branch currents at electrical angle theta = w t of this (periodic) solution, else null where only a pulse
     * segment covers it. Angles outside the sweep are brought into it with the symmetry x(t + T_s) = S x(t).
     */
    double[] stateAtAngle(double theta, double w) {
        double t = theta / w;
        double span = md.sweepS;
        int shifts = (int) Math.floor((t - t0) / span);
        t -= shifts * span;
        double[] x = null;
        for (int i = 0; i < segments.size() && x == null; i++) {
            BridgeSegment s = segments.get(i);
            double tau = Math.min(Math.max(t - s.t0, 0), durations.get(i));
            if (t >= s.t0 && (t <= s.t0 + durations.get(i) || i == segments.size() - 1)) {
                if (pulses.get(i) != null) {
                    return null;
                }
                x = new double[md.m];
                s.currentsAt(tau, x);
            }
        }
        if (x == null) {
            return null;
        }
        double[] tmp = new double[md.m];
        for (; shifts > 0; shifts--) {
            md.shift(x, tmp);
            System.arraycopy(tmp, 0, x, 0, md.m);
        }
        for (; shifts < 0; shifts++) {
            md.unshift(x, tmp);
            System.arraycopy(tmp, 0, x, 0, md.m);
        }
        return x;
    }

    private void add(BridgeSegment seg, double d, BridgePulse pulse) {
        segments.add(seg);
        durations.add(d);
        pulses.add(pulse);
    }

    private BridgeSegment transition(BridgeSegment seg, int type, int k, int j, double t, double[] x) {
        int[] sign = seg.sign.clone();
        switch (type) {
            case CURRENT -> {
                sign[k] = 0;
                x[k] = 0;
                int up = 0;
                int down = 0;
                for (int s : sign) {
                    up += s > 0 ? 1 : 0;
                    down += s < 0 ? 1 : 0;
                }
                if (up == 0 || down == 0) {
                    java.util.Arrays.fill(sign, 0);
                    java.util.Arrays.fill(x, 0);
                }
            }
            case JOIN_UP -> sign[k] = 1;
            case JOIN_DOWN -> sign[k] = -1;
            default -> {
                java.util.Arrays.fill(x, 0);
                java.util.Arrays.fill(sign, 0);
                sign[k] = 1;
                sign[j] = -1;
            }
        }
        return settle(sign, t, x);
    }

    /** Adds every blocked branch that is already forward-biased (most biased first). */
    private BridgeSegment settle(int[] sign, double t, double[] x) {
        for (int pass = 0; ; pass++) {
            BridgeSegment seg = new BridgeSegment(md, sign, t, x);
            if (pass > md.m) {
                return seg;
            }
            if (seg.off()) {
                int p = md.pairInWindow(t);
                if (p < 0) {
                    return seg;
                }
                sign[md.pairK[p]] = 1;
                sign[md.pairJ[p]] = -1;
                java.util.Arrays.fill(x, 0);
                continue;
            }
            double worst = -tolV;
            int worstK = -1;
            int worstSign = 0;
            seg.basis(0, bs);
            double uUp = BridgeSegment.dot(seg.uUp, bs);
            double uDown = BridgeSegment.dot(seg.uDown, bs);
            for (int k = 0; k < md.m; k++) {
                if (sign[k] == 0) {
                    double e = md.emf(k, t);
                    if (uUp - e < worst) {
                        worst = uUp - e;
                        worstK = k;
                        worstSign = 1;
                    }
                    if (e - uDown < worst) {
                        worst = e - uDown;
                        worstK = k;
                        worstSign = -1;
                    }
                }
            }
            if (worstK < 0) {
                return seg;
            }
            sign[worstK] = worstSign;
            x[worstK] = 0;
        }
    }

    /** With no diode conducting: the next window start within (0, remaining], from the closed form. */
    private boolean offEvent(double t, double remaining) {
        double best = Double.POSITIVE_INFINITY;
        int bestP = -1;
        for (int p = 0; p < md.pairK.length; p++) {
            double tau = md.timeToWindow(p, t);
            if (tau < best) {
                best = tau;
                bestP = p;
            }
        }
        if (bestP < 0 || best > remaining) {
            return false;
        }
        evTau = best;
        evType = PAIR;
        evK = md.pairK[bestP];
        evJ = md.pairJ[bestP];
        return true;
    }

    /** Finds the first event of a conducting segment within (0, remaining]; sets evTau, evType, evK, evJ. */
    private boolean findEvent(BridgeSegment seg, double remaining) {
        int nf = eventFunctions(seg);
        seg.basis(0, bs);
        for (int f = 0; f < nf; f++) {
            prev[f] = BridgeSegment.dot(fns[f], bs);
            if (prev[f] < -fnTol[f]) {
                return fire(0, f);
            }
        }
        double step = SAMPLE_RAD / md.w;
        // the basis is advanced by recurrence between samples (exact re-evaluation before any decision)
        double cStep = Math.cos(SAMPLE_RAD);
        double sStep = Math.sin(SAMPLE_RAD);
        double e1Step = Math.exp(seg.lambda1 * step);
        double e2Step = Math.exp(seg.lambda2 * step);
        double[] rb = bs.clone();
        double lo = 0;
        while (lo < remaining) {
            double hi = lo + step;
            if (hi >= remaining) {
                hi = remaining;
                seg.basis(hi, rb);
            } else {
                double c = rb[0] * cStep - rb[1] * sStep;
                rb[1] = rb[1] * cStep + rb[0] * sStep;
                rb[0] = c;
                rb[3] *= e1Step;
                rb[4] *= e2Step;
            }
            double best = Double.POSITIVE_INFINITY;
            int bestF = -1;
            boolean exact = hi == remaining;
            for (int f = 0; f < nf; f++) {
                double v = BridgeSegment.dot(fns[f], rb);
                if (v < -fnTol[f]) {
                    if (!exact) {
                        seg.basis(hi, rb);
                        exact = true;
                        v = BridgeSegment.dot(fns[f], rb);
                    }
                    if (v < -fnTol[f]) {
                        double root = locate(seg, f, lo, hi);
                        if (root < best) {
                            best = root;
                            bestF = f;
                        }
                    }
                }
                prev[f] = v;
            }
            if (bestF >= 0) {
                return fire(best, bestF);
            }
            if (exact && hi < remaining) {
                // keep the recurrence anchored on the exact values
                seg.basis(hi, rb);
            }
            lo = hi;
        }
        return false;
    }

    private boolean fire(double tau, int f) {
        evTau = tau;
        evType = fnType[f];
        evK = fnBranch[f];
        evJ = -1;
        return true;
    }

    /**
     * The crossing of function f in [lo, hi], given f(hi) below minus its noise level. From a clearly positive
     * start the zero crossing is located; from a start within the noise band (a branch that has just started)
     * the function's maximum in the step is found first, and if that too is within the noise band the event is
     * where the function leaves the band downwards.
     */
    private double locate(BridgeSegment seg, int f, double lo, double hi) {
        double[] fn = fns[f];
        double tol = fnTol[f];
        double[] b = new double[BridgeSegment.NB];
        double flo = value(seg, fn, lo, b);
        BrentSolver solver = new BrentSolver(1e-15, EVENT_ACCURACY_RAD / md.w);
        if (flo > tol) {
            return solver.solve(MAX_BRENT_EVALUATIONS, tau -> value(seg, fn, tau, b), lo, hi);
        }
        double peakTau = new BrentOptimizer(1e-10, EVENT_ACCURACY_RAD / md.w).optimize(new MaxEval(MAX_BRENT_EVALUATIONS),
                new UnivariateObjectiveFunction(tau -> value(seg, fn, tau, b)), GoalType.MAXIMIZE,
                new SearchInterval(lo, hi)).getPoint();
        if (value(seg, fn, peakTau, b) > tol) {
            return solver.solve(MAX_BRENT_EVALUATIONS, tau -> value(seg, fn, tau, b), peakTau, hi);
        }
        if (flo + tol <= 0) {
            return lo;
        }
        return solver.solve(MAX_BRENT_EVALUATIONS, tau -> value(seg, fn, tau, b) + tol, lo, hi);
    }

    private static double value(BridgeSegment seg, double[] fn, double tau, double[] b) {
        seg.basis(tau, b);
        return BridgeSegment.dot(fn, b);
    }

    /** Fills the event functions of a conducting segment, each >= 0 while the state is valid; returns their count. */
    private int eventFunctions(BridgeSegment seg) {
        int nf = 0;
        for (int k = 0; k < md.m; k++) {
            if (seg.sign[k] != 0) {
                for (int i = 0; i < BridgeSegment.NB; i++) {
                    fns[nf][i] = seg.current[k][i] * seg.sign[k];
                }
                tag(nf++, CURRENT, k);
            } else {
                for (int i = 0; i < BridgeSegment.NB; i++) {
                    double e = i == 0 ? md.a[k] : i == 1 ? md.b[k] : 0;
                    fns[nf][i] = seg.uUp[i] - e;
                    fns[nf + 1][i] = e - seg.uDown[i];
                }
                tag(nf++, JOIN_UP, k);
                tag(nf++, JOIN_DOWN, k);
            }
        }
        return nf;
    }

    private void tag(int f, int type, int k) {
        fnType[f] = type;
        fnBranch[f] = k;
        double sum = 0;
        for (double c : fns[f]) {
            sum += Math.abs(c);
        }
        fnTol[f] = NOISE * sum;
    }
}
