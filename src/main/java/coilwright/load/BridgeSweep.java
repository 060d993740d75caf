package coilwright.load;

import org.apache.commons.math3.analysis.solvers.BrentSolver;

import java.util.ArrayList;
import java.util.List;

/**
 * Follows the bridge circuit over one symmetry interval from a given state, switching conduction states
 * at diode events: a conducting diode's current reaching zero, or a blocked diode becoming forward-biased.
 * Events are bracketed by sampling the closed-form waveforms every {@link #SAMPLE_RAD} of electrical angle
 * and located with a Brent solver.
 */
final class BridgeSweep {
    /** Sampling step for bracketing events, electrical radians (1.5 degrees). */
    static final double SAMPLE_RAD = Math.toRadians(1.5);
    /** Event-time accuracy, electrical radians. */
    static final double EVENT_ACCURACY_RAD = 1e-14;
    private static final int MAX_EVENTS = 200;
    private static final int MAX_BRENT_EVALUATIONS = 200;

    private static final int CURRENT = 0;
    private static final int JOIN_UP = 1;
    private static final int JOIN_DOWN = 2;
    private static final int PAIR = 3;

    final List<BridgeSegment> segments = new ArrayList<>();
    final List<Double> durations = new ArrayList<>();
    final double[] end;
    final double t0;

    private final BridgeModel md;
    private final double tolV;

    BridgeSweep(BridgeModel md, double t0, double[] x0) {
        this.md = md;
        this.t0 = t0;
        this.tolV = 1e-12 * (md.emfPeakV + md.v0);
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
            double[] ev = findEvent(seg, tEnd - t);
            if (ev == null) {
                segments.add(seg);
                durations.add(tEnd - t);
                x = new double[md.m];
                seg.currentsAt(tEnd - t, x);
                break;
            }
            double tau = ev[0];
            segments.add(seg);
            durations.add(tau);
            seg.currentsAt(tau, x);
            t += tau;
            seg = transition(seg, (int) ev[1], (int) ev[2], (int) ev[3], t, x);
        }
        end = x;
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
            double worst = -tolV;
            int worstK = -1;
            int worstJ = -1;
            int worstSign = 0;
            if (seg.off()) {
                for (int k = 0; k < md.m; k++) {
                    for (int i = 0; i < md.m; i++) {
                        double margin = md.v0 - (md.emf(k, t) - md.emf(i, t));
                        if (i != k && margin < worst) {
                            worst = margin;
                            worstK = k;
                            worstJ = i;
                        }
                    }
                }
                if (worstK < 0) {
                    return seg;
                }
                sign[worstK] = 1;
                sign[worstJ] = -1;
                java.util.Arrays.fill(x, 0);
                continue;
            }
            double[] bs = new double[BridgeSegment.NB];
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

    /** Returns {tau, type, k, j} of the first event within (0, remaining], or null. */
    private double[] findEvent(BridgeSegment seg, double remaining) {
        List<double[]> fns = new ArrayList<>();
        List<int[]> tags = new ArrayList<>();
        eventFunctions(seg, fns, tags);
        int nf = fns.size();
        double[] prev = new double[nf];
        double[] bs = new double[BridgeSegment.NB];
        seg.basis(0, bs);
        for (int f = 0; f < nf; f++) {
            prev[f] = BridgeSegment.dot(fns.get(f), bs);
        }
        double step = SAMPLE_RAD / md.w;
        double lo = 0;
        while (lo < remaining) {
            double hi = Math.min(lo + step, remaining);
            seg.basis(hi, bs);
            double best = Double.POSITIVE_INFINITY;
            int bestF = -1;
            for (int f = 0; f < nf; f++) {
                double v = BridgeSegment.dot(fns.get(f), bs);
                if (v < 0) {
                    double root = prev[f] >= 0 ? locate(seg, fns.get(f), lo, hi) : lo;
                    if (root < best) {
                        best = root;
                        bestF = f;
                    }
                }
                prev[f] = v;
            }
            if (bestF >= 0) {
                int[] tag = tags.get(bestF);
                return new double[] {best, tag[0], tag[1], tag[2]};
            }
            lo = hi;
        }
        return null;
    }

    private double locate(BridgeSegment seg, double[] fn, double lo, double hi) {
        double[] bs = new double[BridgeSegment.NB];
        BrentSolver solver = new BrentSolver(1e-15, EVENT_ACCURACY_RAD / md.w);
        return solver.solve(MAX_BRENT_EVALUATIONS, tau -> {
            seg.basis(tau, bs);
            return BridgeSegment.dot(fn, bs);
        }, lo, hi);
    }

    /** Event functions, each >= 0 while the segment's state is valid. */
    private void eventFunctions(BridgeSegment seg, List<double[]> fns, List<int[]> tags) {
        if (seg.off()) {
            for (int k = 0; k < md.m; k++) {
                for (int j = 0; j < md.m; j++) {
                    if (j != k) {
                        fns.add(new double[] {-(md.a[k] - md.a[j]), -(md.b[k] - md.b[j]), md.v0, 0, 0});
                        tags.add(new int[] {PAIR, k, j});
                    }
                }
            }
            return;
        }
        for (int k = 0; k < md.m; k++) {
            if (seg.sign[k] != 0) {
                double[] f = seg.current[k].clone();
                for (int i = 0; i < BridgeSegment.NB; i++) {
                    f[i] *= seg.sign[k];
                }
                fns.add(f);
                tags.add(new int[] {CURRENT, k, -1});
            } else {
                double[] e = seg.emf(k);
                double[] fu = new double[BridgeSegment.NB];
                double[] fd = new double[BridgeSegment.NB];
                for (int i = 0; i < BridgeSegment.NB; i++) {
                    fu[i] = seg.uUp[i] - e[i];
                    fd[i] = e[i] - seg.uDown[i];
                }
                fns.add(fu);
                tags.add(new int[] {JOIN_UP, k, -1});
                fns.add(fd);
                tags.add(new int[] {JOIN_DOWN, k, -1});
            }
        }
    }
}
