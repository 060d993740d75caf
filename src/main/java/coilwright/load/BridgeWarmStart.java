package coilwright.load;

/**
 * What solved operating points tell the next one of a sweep over speed: the last few continuous-conduction
 * periodic solutions (for a predicted start state at one electrical angle, extrapolated in frequency by the
 * Lagrange polynomial through them).
 * Only a starting guess: the solver still converges to its own tolerance, and falls back to the cold start when
 * the guess fails. Mutable; one instance per sweep, not shared between threads.
 */
final class BridgeWarmStart {
    /** Extrapolate only this many steps of the sweep beyond the last point; a far jump starts from the last state. */
    private static final double MAX_EXTRAPOLATION = 1.5;
    /** Nearest an anchor may come to either end of its segment, as a fraction of the segment. */
    private static final double ANCHOR_MARGIN = 0.2;
    /** Solutions kept for the predictor (3: quadratic). */
    private static final int HISTORY = 3;

    /** Most recent first. */
    private final SymmetryIntervalTrace[] traces = new SymmetryIntervalTrace[HISTORY];
    private final double[] omegas = new double[HISTORY];
    private int count;

    /** Forgets everything (after a point with no or discontinuous conduction). */
    void forget() {
        java.util.Arrays.fill(traces, null);
        count = 0;
    }

    boolean ready() {
        return count > 0;
    }

    /** Records a continuous-conduction solution. */
    void remember(SymmetryIntervalTrace trace, double w) {
        for (int i = HISTORY - 1; i > 0; i--) {
            traces[i] = traces[i - 1];
            omegas[i] = omegas[i - 1];
        }
        traces[0] = trace;
        omegas[0] = w;
        count = Math.min(count + 1, HISTORY);
    }

    /**
     * Electrical angle of the anchor for the next solve. The last anchor is kept while it stays well inside the
     * last solution's busiest segment; otherwise the middle of that segment.
     */
    double anchorRad() {
        SymmetryIntervalTrace last = traces[0];
        int best = BridgeSolver.busiest(last);
        double t0 = last.segments.get(best).t0;
        double d = last.durations.get(best);
        double keptT = last.startTimeS;
        if (keptT >= t0 + ANCHOR_MARGIN * d && keptT <= t0 + (1 - ANCHOR_MARGIN) * d) {
            return omegas[0] * keptT;
        }
        return omegas[0] * (t0 + d / 2);
    }

    /**
     * Predicted independent currents at electrical angle {@code anchorRad} for angular frequency {@code w}, A;
     * null when the last solution has only a pulse there.
     */
    /** The last solution's independent currents at the anchor angle (its first n states), or null. */
    private double[] latest(double anchorRad, int n) {
        double[] y = traces[0].stateAtAngle(anchorRad, omegas[0]);
        return y == null ? null : java.util.Arrays.copyOf(y, n);
    }

    double[] predict(double anchorRad, double w, int n) {
        int use = 1;
        if (count >= 2 && omegas[0] != omegas[1] && Math.abs((w - omegas[0]) / (omegas[0] - omegas[1])) <= MAX_EXTRAPOLATION) {
            use = count;
        }
        double[] y = new double[n];
        for (int i = 0; i < use; i++) {
            double[] yi = traces[i].stateAtAngle(anchorRad, omegas[i]);
            if (yi == null) {
                return i == 0 ? null : latest(anchorRad, n);
            }
            double weight = 1;
            for (int j = 0; j < use; j++) {
                if (j != i) {
                    double den = omegas[i] - omegas[j];
                    if (den == 0) {
                        return latest(anchorRad, n); // the same speed twice: no extrapolation
                    }
                    weight *= (w - omegas[j]) / den;
                }
            }
            for (int k = 0; k < n; k++) {
                y[k] += weight * yi[k];
            }
        }
        return y;
    }
}
