package coilwright.load;

import static coilwright.load.SwitchingEvent.CURRENT_ENDS;
import static coilwright.load.SwitchingEvent.JOINS_LOWER_RAIL;
import static coilwright.load.SwitchingEvent.JOINS_UPPER_RAIL;
import static coilwright.load.SwitchingEvent.PAIR_STARTS;

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
 * waveforms every {@link #SAMPLE_RAD} of electrical angle and located by a safeguarded Newton iteration
 * ({@link #root}). The trace is the map whose fixed point, after the symmetry, is the periodic state.
 * <p>
 * Each event function is evaluated as a sum of terms of size up to the sum of its coefficient magnitudes, so
 * its rounding noise is a fixed fraction of that sum. An event fires only when the function falls below minus
 * this noise level (a hysteresis): a branch that has just started from zero current, whose current rises from
 * a double root, cannot end again at the same instant on rounding noise.
 */
final class SymmetryIntervalTrace {
    /** Sampling step for bracketing events, electrical radians (1.5 degrees). */
    static final double SAMPLE_RAD = Math.toRadians(1.5);
    /** Event-time accuracy, electrical radians. */
    static final double EVENT_ACCURACY_RAD = 1e-14;
    /** Noise level of an event function relative to the sum of its coefficient magnitudes. */
    static final double NOISE = 1e-13;
    /** First sampling step of a segment with fast exponential modes, in time constants of the fastest one. */
    static final double FAST_STEP_TIME_CONSTANTS = 0.5;
    private static final int MAX_EVENTS = 200;
    private static final int MAX_BRENT_EVALUATIONS = 200;
    private static final int MAX_ROOT_ITERATIONS = 200;


    final List<BridgeSegment> segments = new ArrayList<>(8);
    final List<Double> durations = new ArrayList<>(8);
    /** The isolated pulse computed by series for each segment that is one, else null. */
    final List<BridgePulse> pulses = new ArrayList<>(8);
    final double[] endCurrentsA;
    final double startTimeS;
    /**
     * Largest sum of coefficient magnitudes of a branch current over the segments, A: the rounding noise of every
     * current in this trace is a small multiple of 1e-16 of it (the terms of a waveform can cancel to far less).
     */
    double coefficientMagnitudeA;
    /**
     * Derivative of {@link #endCurrentsA} with respect to the first m - 1 start currents (m rows, m - 1 columns), exact for
     * the piecewise-linear circuit: each segment's state transition, and at each event the saltation term
     * (the slope before minus the slope after, times the event time's gradient); null unless asked for.
     */
    final double[][] endSensitivity;

    private final BridgeModel model;
    private final double biasToleranceV;
    private final double[][] eventFunctionCoefficients;
    private final SwitchingEvent[] eventKinds;
    private final int[] eventBranches;
    private final double[] eventNoise;
    private final double[] previousValues;
    private final double[][] eventSlopes;
    private final double[] slopeNoise;
    private final double[] previousSlopes;
    private final double[] basisScratch = new double[BridgeSegment.NB];
    private double eventTau;
    private SwitchingEvent eventKind;
    private int eventBranch;
    private int eventPartner;
    private int eventFunction;
    /** Set by a transition that sets every current to zero (the state no longer depends on the start). */
    private boolean stateReset;

    SymmetryIntervalTrace(BridgeModel model, double startTimeS, double[] x0) {
        this(model, startTimeS, x0, false);
    }

    /**
     * Traces the interval from state x0 at startTimeS; with {@code sensitivity}, also the end state's derivative with
     * respect to the first m - 1 start currents (the last one is minus their sum), see {@link #endSensitivity}.
     */
    SymmetryIntervalTrace(BridgeModel model, double startTimeS, double[] x0, boolean sensitivity) {
        this.model = model;
        this.startTimeS = startTimeS;
        this.biasToleranceV = 1e-12 * (model.emfPeakV + model.thresholdV);
        int nf = 2 * model.branches;
        eventFunctionCoefficients = new double[nf][BridgeSegment.NB];
        eventKinds = new SwitchingEvent[nf];
        eventBranches = new int[nf];
        eventNoise = new double[nf];
        previousValues = new double[nf];
        eventSlopes = new double[nf][BridgeSegment.NB];
        slopeNoise = new double[nf];
        previousSlopes = new double[nf];
        double tEnd = startTimeS + model.intervalS;
        double[] x = x0.clone();
        int[] sign = new int[model.branches];
        int up = 0;
        int down = 0;
        for (int k = 0; k < model.branches; k++) {
            sign[k] = x[k] > 0 ? 1 : x[k] < 0 ? -1 : 0;
            up += sign[k] > 0 ? 1 : 0;
            down += sign[k] < 0 ? 1 : 0;
        }
        double[][] sens = sensitivity ? initialSensitivity(model.branches) : null;
        double[][] next = sensitivity ? new double[model.branches][model.branches - 1] : null;
        if (up == 0 || down == 0) {
            java.util.Arrays.fill(sign, 0);
            java.util.Arrays.fill(x, 0);
            clear(sens);
        }
        double t = startTimeS;
        BridgeSegment seg = settle(sign, t, x);
        double[] slopeBefore = new double[model.branches];
        double[] slopeAfter = new double[model.branches];
        double[] tauGradient = new double[model.branches - 1];
        for (int events = 0; ; events++) {
            if (events > MAX_EVENTS) {
                throw new NoPeriodicSolution("more than " + MAX_EVENTS
                        + " switching events in one interval (w = " + model.omega + " rad/s, V0 = " + model.thresholdV + " V)");
            }
            boolean found = seg.off() ? offEvent(t, tEnd - t) : findEvent(seg, tEnd - t);
            if (!found) {
                add(seg, tEnd - t, null);
                x = new double[model.branches];
                seg.currentsAt(tEnd - t, x);
                if (sens != null) {
                    seg.propagate(tEnd - t, sens, next);
                    sens = next;
                }
                break;
            }
            double tau = eventTau;
            add(seg, tau, null);
            seg.currentsAt(tau, x);
            if (sens != null) {
                seg.propagate(tau, sens, next);
                if (eventKind != PAIR_STARTS) {
                    eventTimeGradient(seg, tau, next, tauGradient);
                    seg.currentSlopesAt(tau, slopeBefore);
                }
            }
            t += tau;
            stateReset = false;
            seg = transition(seg, eventKind, eventBranch, eventPartner, t, x);
            if (sens != null) {
                if (eventKind == PAIR_STARTS) {
                    clear(next); // from rest at a window start fixed by the EMFs alone
                } else {
                    // saltation: the state reaches the event with the old slope and the new segment starts when the
                    // event does; after a reset the start state is zero whatever the event time
                    seg.currentSlopesAt(0, slopeAfter);
                    for (int k = 0; k < model.branches; k++) {
                        for (int c = 0; c < tauGradient.length; c++) {
                            next[k][c] = (stateReset ? 0 : next[k][c] + slopeBefore[k] * tauGradient[c])
                                    - slopeAfter[k] * tauGradient[c];
                        }
                    }
                }
                double[][] swap = sens;
                sens = next;
                next = swap;
            }
            if (eventKind == PAIR_STARTS && seg.conducting() == 2) {
                BridgePulse pulse = BridgePulse.of(model, eventBranch, eventPartner, (tEnd - t) * model.omega);
                if (pulse != null) {
                    double d = pulse.lengthRad / model.omega;
                    add(seg, d, pulse);
                    t += d;
                    java.util.Arrays.fill(x, 0);
                    seg = settle(new int[model.branches], t, x);
                    clear(sens);
                }
            }
        }
        endSensitivity = sens;
        endCurrentsA = x;
    }

    /** The derivative of the start state x0 = (y, -sum y) with respect to y: the identity over minus ones. */
    private static double[][] initialSensitivity(int m) {
        double[][] d = new double[m][m - 1];
        for (int c = 0; c < m - 1; c++) {
            d[c][c] = 1;
            d[m - 1][c] = -1;
        }
        return d;
    }

    private static void clear(double[][] d) {
        if (d != null) {
            for (double[] row : d) {
                java.util.Arrays.fill(row, 0);
            }
        }
    }

    /**
     * Gradient of the event time with respect to the start currents, from the implicit function theorem on the event
     * function F(tau, x0) = 0: dtau = -dF / F'(tau), where dF is F's derivative along the state's sensitivity
     * {@code sens} at tau. A branch current depends on the state directly; a blocked branch's bias through the DC
     * current (the rail potentials move with the DC drop). Zero for an event already due at the segment's start
     * or met without a falling slope (the time does not move with the state there).
     */
    private void eventTimeGradient(BridgeSegment seg, double tau, double[][] sens, double[] out) {
        java.util.Arrays.fill(out, 0);
        double slope = value(seg, eventSlopes[eventFunction], tau, new double[BridgeSegment.NB]);
        if (tau == 0 || !(slope < 0)) {
            return;
        }
        int k = eventBranch;
        for (int c = 0; c < out.length; c++) {
            double dF;
            if (eventKind == CURRENT_ENDS) {
                dF = seg.sign[k] * sens[k][c];
            } else {
                double dcCurrent = 0;
                for (int i = 0; i < model.branches; i++) {
                    dcCurrent += seg.sign[i] > 0 ? sens[i][c] : 0;
                }
                double upperShare = (double) seg.nDown / seg.conducting();
                dF = model.dcResistanceOhm * (eventKind == JOINS_UPPER_RAIL ? upperShare : 1 - upperShare) * dcCurrent;
            }
            out[c] = -dF / slope;
        }
    }


    /**
     * Branch currents at electrical angle theta = w t of this (periodic) solution, else null where only a pulse
     * segment covers it. Angles outside the trace are brought into it with the symmetry x(t + T_s) = S x(t).
     */
    double[] stateAtAngle(double theta, double w) {
        double t = theta / w;
        double span = model.intervalS;
        int shifts = (int) Math.floor((t - startTimeS) / span);
        t -= shifts * span;
        double[] x = null;
        for (int i = 0; i < segments.size() && x == null; i++) {
            BridgeSegment s = segments.get(i);
            double tau = Math.min(Math.max(t - s.t0, 0), durations.get(i));
            if (t >= s.t0 && (t <= s.t0 + durations.get(i) || i == segments.size() - 1)) {
                if (pulses.get(i) != null) {
                    return null;
                }
                x = new double[model.branches];
                s.currentsAt(tau, x);
            }
        }
        if (x == null) {
            return null;
        }
        double[] tmp = new double[model.branches];
        for (; shifts > 0; shifts--) {
            model.shift(x, tmp);
            System.arraycopy(tmp, 0, x, 0, model.branches);
        }
        for (; shifts < 0; shifts++) {
            model.unshift(x, tmp);
            System.arraycopy(tmp, 0, x, 0, model.branches);
        }
        return x;
    }

    private void add(BridgeSegment seg, double d, BridgePulse pulse) {
        for (double[] current : seg.current) {
            double sum = 0;
            for (double c : current) {
                sum += Math.abs(c);
            }
            coefficientMagnitudeA = Math.max(coefficientMagnitudeA, sum);
        }
        segments.add(seg);
        durations.add(d);
        pulses.add(pulse);
    }

    private BridgeSegment transition(BridgeSegment seg, SwitchingEvent type, int k, int j, double t, double[] x) {
        int[] sign = seg.sign.clone();
        switch (type) {
            case CURRENT_ENDS -> {
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
                    stateReset = true;
                }
            }
            case JOINS_UPPER_RAIL -> sign[k] = 1;
            case JOINS_LOWER_RAIL -> sign[k] = -1;
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
            BridgeSegment seg = new BridgeSegment(model, sign, t, x);
            if (pass > model.branches) {
                return seg;
            }
            if (seg.off()) {
                int p = model.pairInWindow(t);
                if (p < 0) {
                    return seg;
                }
                sign[model.pairUpper[p]] = 1;
                sign[model.pairLower[p]] = -1;
                java.util.Arrays.fill(x, 0);
                stateReset = true;
                continue;
            }
            double worst = -biasToleranceV;
            int worstK = -1;
            int worstSign = 0;
            seg.basis(0, basisScratch);
            double uUp = BridgeSegment.dot(seg.uUp, basisScratch);
            double uDown = BridgeSegment.dot(seg.uDown, basisScratch);
            for (int k = 0; k < model.branches; k++) {
                if (sign[k] == 0) {
                    double e = model.emf(k, t);
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
        for (int p = 0; p < model.pairUpper.length; p++) {
            double tau = model.timeToWindow(p, t);
            if (tau < best) {
                best = tau;
                bestP = p;
            }
        }
        if (bestP < 0 || best > remaining) {
            return false;
        }
        eventTau = best;
        eventKind = PAIR_STARTS;
        eventBranch = model.pairUpper[bestP];
        eventPartner = model.pairLower[bestP];
        return true;
    }

    /**
     * Finds the first event of a conducting segment within (0, remaining]; sets eventTau, eventKind, eventBranch, eventPartner.
     * <p>
     * Sampling alone misses an event function that dips below zero and recovers between two samples (a diode
     * current touching zero near the instant its pair's window opens): both samples are positive. So each step
     * is also checked for an interior minimum: where the function's slope turns from negative to positive within
     * the step and the bound on its curvature leaves room for a dip below the noise level, the minimum is located
     * and, when it lies below minus the noise level, the crossing before it is the event. The first steps of a
     * segment whose exponential modes are fast against the sampling step are shorter (doubling from half a time
     * constant) so that no transient turns round twice within one step.
     */
    private boolean findEvent(BridgeSegment seg, double remaining) {
        int nf = eventFunctions(seg);
        seg.basis(0, basisScratch);
        for (int f = 0; f < nf; f++) {
            previousValues[f] = BridgeSegment.dot(eventFunctionCoefficients[f], basisScratch);
            previousSlopes[f] = BridgeSegment.dot(eventSlopes[f], basisScratch);
            if (previousValues[f] < -eventNoise[f]) {
                return fire(0, f);
            }
        }
        double fullStep = SAMPLE_RAD / model.omega;
        double step = Math.min(fullStep, FAST_STEP_TIME_CONSTANTS / -seg.lambda2);
        // the basis is advanced by recurrence between full steps (exact re-evaluation before any decision)
        double cStep = Math.cos(SAMPLE_RAD);
        double sStep = Math.sin(SAMPLE_RAD);
        double e1Step = Math.exp(seg.lambda1 * fullStep);
        double e2Step = Math.exp(seg.lambda2 * fullStep);
        double[] rb = basisScratch.clone();
        double lo = 0;
        while (lo < remaining) {
            double hi = lo + step;
            double e1Lo = rb[3];
            double e2Lo = rb[4];
            boolean exact;
            if (hi >= remaining || step < fullStep) {
                hi = Math.min(hi, remaining);
                seg.basis(hi, rb);
                exact = true;
            } else {
                double c = rb[0] * cStep - rb[1] * sStep;
                rb[1] = rb[1] * cStep + rb[0] * sStep;
                rb[0] = c;
                rb[3] *= e1Step;
                rb[4] *= e2Step;
                exact = false;
            }
            double h = hi - lo;
            double best = Double.POSITIVE_INFINITY;
            int bestF = -1;
            for (int f = 0; f < nf; f++) {
                double v = BridgeSegment.dot(eventFunctionCoefficients[f], rb);
                if (!exact && v < -eventNoise[f]) {
                    seg.basis(hi, rb);
                    exact = true;
                    v = BridgeSegment.dot(eventFunctionCoefficients[f], rb);
                }
                double slope = BridgeSegment.dot(eventSlopes[f], rb);
                double root = Double.NaN;
                if (v < -eventNoise[f]) {
                    root = locate(seg, f, lo, hi);
                } else if (previousSlopes[f] < -slopeNoise[f] && slope > slopeNoise[f]
                        && Math.min(previousValues[f], v) - curvatureBound(seg, f, e1Lo, e2Lo) * h * h / 8 < -eventNoise[f]) {
                    root = dip(seg, f, lo, hi);
                }
                if (root < best) {
                    best = root;
                    bestF = f;
                }
                previousValues[f] = v;
                previousSlopes[f] = slope;
            }
            if (bestF >= 0) {
                return fire(best, bestF);
            }
            if (exact && hi < remaining) {
                // keep the recurrence anchored on the exact values
                seg.basis(hi, rb);
            }
            lo = hi;
            step = Math.min(2 * step, fullStep);
        }
        return false;
    }

    /**
     * Bound on |f''| of event function f over a step starting at lo, from the basis values there (the
     * exponential modes decay, so their share is largest at the start of the step).
     */
    private double curvatureBound(BridgeSegment seg, int f, double e1Lo, double e2Lo) {
        double[] c = eventFunctionCoefficients[f];
        double w = model.omega;
        return w * w * (Math.abs(c[0]) + Math.abs(c[1])) + seg.lambda1 * seg.lambda1 * Math.abs(c[3] * e1Lo)
                + seg.lambda2 * seg.lambda2 * Math.abs(c[4] * e2Lo);
    }

    /**
     * The event within a step where function f is valid at both ends but its slope turns from negative to
     * positive: the crossing before the interior minimum when that minimum lies below minus the noise level,
     * else NaN (no event).
     */
    private double dip(BridgeSegment seg, int f, double lo, double hi) {
        double[] b = new double[BridgeSegment.NB];
        double[] sl = eventSlopes[f];
        // decided again on exact values (the samples may come from the recurrence)
        if (value(seg, eventFunctionCoefficients[f], hi, b) < -eventNoise[f]) {
            return locate(seg, f, lo, hi);
        }
        if (!(value(seg, sl, lo, b) < 0 && value(seg, sl, hi, b) > 0)) {
            return Double.NaN;
        }
        double tauMin = root(seg, sl, 0, lo, hi, b);
        if (value(seg, eventFunctionCoefficients[f], tauMin, b) >= -eventNoise[f]) {
            return Double.NaN;
        }
        return locate(seg, f, lo, tauMin);
    }

    private boolean fire(double tau, int f) {
        eventTau = tau;
        eventKind = eventKinds[f];
        eventBranch = eventBranches[f];
        eventFunction = f;
        eventPartner = -1;
        return true;
    }

    /**
     * The crossing of function f in [lo, hi], given f(hi) below minus its noise level. From a clearly positive
     * start the zero crossing is located; from a start within the noise band (a branch that has just started)
     * the function's maximum in the step is found first, and if that too is within the noise band the event is
     * where the function leaves the band downwards.
     */
    private double locate(BridgeSegment seg, int f, double lo, double hi) {
        double[] fn = eventFunctionCoefficients[f];
        double tol = eventNoise[f];
        double[] b = new double[BridgeSegment.NB];
        double flo = value(seg, fn, lo, b);
        if (flo > tol) {
            return root(seg, fn, 0, lo, hi, b);
        }
        double peakTau = new BrentOptimizer(1e-10, EVENT_ACCURACY_RAD / model.omega).optimize(new MaxEval(MAX_BRENT_EVALUATIONS),
                new UnivariateObjectiveFunction(tau -> value(seg, fn, tau, b)), GoalType.MAXIMIZE,
                new SearchInterval(lo, hi)).getPoint();
        if (value(seg, fn, peakTau, b) > tol) {
            return root(seg, fn, 0, peakTau, hi, b);
        }
        if (flo + tol <= 0) {
            return lo;
        }
        return root(seg, fn, tol, lo, hi, b);
    }

    /**
     * The root of fn(tau) + shift in [lo, hi], where it changes sign, to {@link #EVENT_ACCURACY_RAD} (and 1e-15
     * relative): Newton's method on the closed form, with the derivative's own closed form, kept inside the
     * shrinking bracket (a bisection whenever a step would leave it or fails to halve the step before last), as in
     * "rtsafe" of Press, Teukolsky, Vetterling and Flannery, "Numerical Recipes", 3rd ed., 2007, sec. 9.4. It
     * converges quadratically where Brent's method on values alone takes several times as many evaluations.
     *
     * @throws NoPeriodicSolution when fn + shift has the same sign at both ends
     */
    private double root(BridgeSegment seg, double[] fn, double shift, double lo, double hi, double[] b) {
        double fLo = value(seg, fn, lo, b) + shift;
        double fHi = value(seg, fn, hi, b) + shift;
        if (fLo == 0) {
            return lo;
        }
        if (fHi == 0) {
            return hi;
        }
        if (fLo > 0 == fHi > 0) {
            throw new NoPeriodicSolution("an event function has the same sign at both ends of its bracket");
        }
        double[] slope = {model.omega * fn[1], -model.omega * fn[0], 0, seg.lambda1 * fn[3], seg.lambda2 * fn[4]};
        double absolute = EVENT_ACCURACY_RAD / model.omega;
        // below: where fn + shift is negative; above: where it is positive
        double below = fLo < 0 ? lo : hi;
        double above = fLo < 0 ? hi : lo;
        double tau = 0.5 * (lo + hi);
        double stepBeforeLast = Math.abs(hi - lo);
        double lastStep = stepBeforeLast;
        for (int i = 0; i < MAX_ROOT_ITERATIONS; i++) {
            seg.basis(tau, b);
            double f = BridgeSegment.dot(fn, b) + shift;
            double d = BridgeSegment.dot(slope, b);
            if (f == 0) {
                return tau;
            }
            if (f < 0) {
                below = tau;
            } else {
                above = tau;
            }
            double newton = tau - f / d;
            stepBeforeLast = lastStep;
            if (newton > Math.min(below, above) && newton < Math.max(below, above)
                    && Math.abs(f / d) < 0.5 * stepBeforeLast) {
                lastStep = Math.abs(f / d);
                tau = newton;
            } else {
                lastStep = 0.5 * Math.abs(above - below);
                tau = 0.5 * (above + below);
            }
            if (lastStep <= absolute + 1e-15 * Math.abs(tau)) {
                return tau;
            }
        }
        return tau;
    }

    private static double value(BridgeSegment seg, double[] fn, double tau, double[] b) {
        seg.basis(tau, b);
        return BridgeSegment.dot(fn, b);
    }

    /** Fills the event functions of a conducting segment, each >= 0 while the state is valid; returns their count. */
    private int eventFunctions(BridgeSegment seg) {
        int nf = 0;
        for (int k = 0; k < model.branches; k++) {
            if (seg.sign[k] != 0) {
                for (int i = 0; i < BridgeSegment.NB; i++) {
                    eventFunctionCoefficients[nf][i] = seg.current[k][i] * seg.sign[k];
                }
                tag(seg, nf++, CURRENT_ENDS, k);
            } else {
                for (int i = 0; i < BridgeSegment.NB; i++) {
                    double e = i == 0 ? model.emfCosV[k] : i == 1 ? model.emfSinV[k] : 0;
                    eventFunctionCoefficients[nf][i] = seg.uUp[i] - e;
                    eventFunctionCoefficients[nf + 1][i] = e - seg.uDown[i];
                }
                tag(seg, nf++, JOINS_UPPER_RAIL, k);
                tag(seg, nf++, JOINS_LOWER_RAIL, k);
            }
        }
        return nf;
    }

    private void tag(BridgeSegment seg, int f, SwitchingEvent type, int k) {
        eventKinds[f] = type;
        eventBranches[f] = k;
        double[] c = eventFunctionCoefficients[f];
        double[] d = eventSlopes[f];
        d[0] = model.omega * c[1];
        d[1] = -model.omega * c[0];
        d[2] = 0;
        d[3] = seg.lambda1 * c[3];
        d[4] = seg.lambda2 * c[4];
        double sum = 0;
        double slopeSum = 0;
        for (int i = 0; i < BridgeSegment.NB; i++) {
            sum += Math.abs(c[i]);
            slopeSum += Math.abs(d[i]);
        }
        eventNoise[f] = NOISE * sum;
        slopeNoise[f] = NOISE * slopeSum;
    }
}
