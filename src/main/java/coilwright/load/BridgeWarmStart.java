package coilwright.load;

/**
 * What one solved operating point tells the next one of a sweep over speed: the last continuous-conduction
 * periodic solutions (for a predicted start state at the same electrical angle, extrapolated linearly in
 * frequency) and the last Newton Jacobian (reused as a chord while it keeps converging). Only a starting guess:
 * the solver still converges to its own tolerance, and falls back to the cold start when the guess fails.
 * Mutable; one instance per sweep, not shared between threads.
 */
final class BridgeWarmStart {
    private static final double MAX_EXTRAPOLATION = 1.5;
    /** Nearest an anchor may come to either end of its segment, as a fraction of the segment. */
    private static final double ANCHOR_MARGIN = 0.2;
    private BridgeSweep last;
    private double lastW;
    private BridgeSweep before;
    private double beforeW;
    /** Newton Jacobian of the last solution (independent currents at the anchor), or null. */
    double[][] jacobian;

    /** Forgets everything (after a point with no or discontinuous conduction). */
    void forget() {
        last = null;
        before = null;
        jacobian = null;
    }

    boolean ready() {
        return last != null;
    }

    /** Records a continuous-conduction solution and its Newton Jacobian. */
    void remember(BridgeSweep sweep, double w, double[][] jac) {
        before = last;
        beforeW = lastW;
        last = sweep;
        lastW = w;
        jacobian = jac;
    }

    /**
     * Electrical angle of the anchor for the next solve. The last anchor is kept while it stays well inside the
     * last solution's busiest segment (so the chord Jacobian, which belongs to that anchor, stays apt and both
     * remembered solutions start there); otherwise the middle of that segment.
     */
    double anchorRad() {
        int best = BridgeSolver.busiest(last);
        double t0 = last.segments.get(best).t0;
        double d = last.durations.get(best);
        double keptT = last.t0;
        if (keptT >= t0 + ANCHOR_MARGIN * d && keptT <= t0 + (1 - ANCHOR_MARGIN) * d) {
            return lastW * keptT;
        }
        return lastW * (t0 + d / 2);
    }

    /**
     * Predicted independent currents at electrical angle {@code anchorRad} for angular frequency {@code w}, A;
     * null when the last solution does not cover that angle.
     */
    double[] predict(double anchorRad, double w, int n) {
        double[] y1 = last.stateAtAngle(anchorRad, lastW);
        if (y1 == null) {
            return null;
        }
        double s = before == null || beforeW == lastW ? Double.NaN : (w - lastW) / (lastW - beforeW);
        // extrapolate only over about one step of an even sweep; a far jump (the rated point) starts from y1
        double[] y0 = Math.abs(s) <= MAX_EXTRAPOLATION ? before.stateAtAngle(anchorRad, beforeW) : null;
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = y0 == null ? y1[i] : y1[i] + s * (y1[i] - y0[i]);
        }
        return y;
    }
}
