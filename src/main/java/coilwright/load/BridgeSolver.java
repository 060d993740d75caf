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
 * ({@link SymmetryIntervalTrace}). The waveform repeats every 60 electrical degrees with the phases rotated and negated
 * (three-phase) or every half period negated (single-phase), so the periodic state solves
 * Map(x0) = P x0 over one such interval. Discontinuous conduction is found directly (an interval with no
 * diode conducting fixes the state to zero); otherwise the equation is solved by Newton's method with the
 * exact Jacobian of the map (each segment's state transition in closed form and the saltation at each event:
 * the event time moves with the state by the implicit function theorem on the event condition), started from a
 * few fixed-point sweeps and anchored inside an interval where the most diodes conduct (where the map is smooth). Shooting for periodic solutions of switched circuits
 * follows Aprille and Trick (1972); the exact piecewise solution is the classical treatment of the bridge
 * in, e.g., Mohan, Undeland and Robbins, "Power Electronics", 2003, ch. 5.
 * <p>
 * Safeguards, in order: the warm start (when a sweep gives one); the cold start above; then Newton with a longer
 * line search (damped Newton) after more fixed-point sweeps;
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
    /** Rounding noise of a residual relative to the coefficient sums of the sweep's waveforms. */
    static final double NOISE_TOLERANCE = 1e-13;
    /** Fixed-point sweeps before the damped Newton fallback. */
    private static final int FALLBACK_SWEEPS = 12;
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
        BridgeModel model = new BridgeModel(circuit);
        try {
            return BridgeResults.assemble(circuit, model, periodic(model, warm));
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

    static SymmetryIntervalTrace periodic(BridgeModel model) {
        return periodic(model, null);
    }

    private static SymmetryIntervalTrace periodic(BridgeModel model, BridgeWarmStart warm) {
        if (warm != null && warm.ready()) {
            SymmetryIntervalTrace fast = warmNewton(model, warm);
            if (fast != null) {
                return fast;
            }
        }
        RuntimeException first;
        try {
            return coldNewton(model, warm, FIXED_POINT_SWEEPS, false);
        } catch (NoPeriodicSolution | MathIllegalStateException | MathIllegalArgumentException e) {
            first = e;
        }
        if (warm != null) {
            warm.forget();
        }
        try {
            return coldNewton(model, null, FALLBACK_SWEEPS, true);
        } catch (NoPeriodicSolution | MathIllegalStateException | MathIllegalArgumentException e) {
            // the transient below needs neither a Jacobian nor a smooth map
        }
        try {
            return settledTransient(model);
        } catch (NoPeriodicSolution | MathIllegalStateException | MathIllegalArgumentException e) {
            throw new NoPeriodicSolution(first.getMessage() + "; damped Newton and " + e.getMessage());
        }
    }

    /**
     * Fixed-point sweeps from rest, then Newton anchored inside the busiest segment. With {@code damped}, the
     * line search goes further and Newton may take more steps.
     */
    private static SymmetryIntervalTrace coldNewton(BridgeModel model, BridgeWarmStart warm, int sweeps, boolean damped) {
        int m = model.branches;
        SymmetryIntervalTrace trace = new SymmetryIntervalTrace(model, 0, new double[m]);
        for (int it = 0; it < sweeps; it++) {
            int off = longestOff(trace);
            if (off >= 0) {
                BridgeSegment s = trace.segments.get(off);
                SymmetryIntervalTrace fromZero = new SymmetryIntervalTrace(model, s.t0 + trace.durations.get(off) / 2, new double[m]);
                if (endsOff(fromZero)) {
                    if (warm != null) {
                        warm.forget();
                    }
                    return fromZero;
                }
                trace = fromZero;
            }
            double[] next = new double[m];
            model.unshift(trace.endCurrentsA, next);
            trace = new SymmetryIntervalTrace(model, trace.startTimeS, next);
        }
        int best = busiest(trace);
        BridgeSegment anchor = trace.segments.get(best);
        double half = trace.durations.get(best) / 2;
        double[] xa = new double[model.branches];
        anchor.currentsAt(half, xa);
        BridgeNewton newton = new BridgeNewton(model, anchor.t0 + half, java.util.Arrays.copyOf(xa, model.branches - 1));
        newton.damped = damped;
        SymmetryIntervalTrace result = newton.solve();
        if (warm != null) {
            if (longestOff(result) < 0) {
                warm.remember(result, model.omega);
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
    private static SymmetryIntervalTrace settledTransient(BridgeModel model) {
        double q = Math.exp(-model.resistanceOhm * model.intervalS / model.inductanceH);
        double factor = q / -Math.expm1(-model.resistanceOhm * model.intervalS / model.inductanceH);
        SymmetryIntervalTrace trace = new SymmetryIntervalTrace(model, 0, new double[model.branches]);
        double[] x = new double[model.branches];
        double[] next = new double[model.branches];
        for (int it = 0; it < MAX_TRANSIENT_SWEEPS; it++) {
            model.unshift(trace.endCurrentsA, next);
            double step = 0;
            double size = 0;
            for (int k = 0; k < model.branches; k++) {
                step += (next[k] - x[k]) * (next[k] - x[k]);
                size = Math.max(size, Math.abs(next[k]));
            }
            double tolerance = Math.max(TRANSIENT_TOLERANCE * Math.max(size, 1e-3 * model.currentScaleA()),
                    NOISE_TOLERANCE * trace.coefficientMagnitudeA);
            if (factor * Math.sqrt(step) <= tolerance) {
                return trace;
            }
            System.arraycopy(next, 0, x, 0, model.branches);
            trace = new SymmetryIntervalTrace(model, 0, x.clone());
        }
        throw new NoPeriodicSolution("the transient had not settled after " + MAX_TRANSIENT_SWEEPS
                + " intervals (contraction factor " + q + ")");
    }

    /** Newton from the predicted state at the last solution's anchor angle; null when that does not work out. */
    private static SymmetryIntervalTrace warmNewton(BridgeModel model, BridgeWarmStart warm) {
        double anchorRad = warm.anchorRad();
        double[] y = warm.predict(anchorRad, model.omega, model.branches - 1);
        if (y == null) {
            return null;
        }
        try {
            BridgeNewton newton = new BridgeNewton(model, anchorRad / model.omega, y);
            SymmetryIntervalTrace result = newton.solve();
            if (longestOff(result) >= 0) {
                return null;
            }
            warm.remember(result, model.omega);
            return result;
        } catch (NoPeriodicSolution | MathIllegalStateException | MathIllegalArgumentException e) {
            return null;
        }
    }

    /** Index of the segment with the most conducting diodes (the longest among equals): where the map is smooth. */
    static int busiest(SymmetryIntervalTrace trace) {
        int best = 0;
        for (int i = 1; i < trace.segments.size(); i++) {
            int ci = trace.segments.get(i).conducting();
            int cb = trace.segments.get(best).conducting();
            if (ci > cb || ci == cb && trace.durations.get(i) > trace.durations.get(best)) {
                best = i;
            }
        }
        return best;
    }


    private static int longestOff(SymmetryIntervalTrace trace) {
        int idx = -1;
        for (int i = 0; i < trace.segments.size(); i++) {
            if (trace.segments.get(i).off() && trace.durations.get(i) > 0
                    && (idx < 0 || trace.durations.get(i) > trace.durations.get(idx))) {
                idx = i;
            }
        }
        return idx;
    }

    private static boolean endsOff(SymmetryIntervalTrace trace) {
        return trace.segments.get(trace.segments.size() - 1).off();
    }
}
