package coilwright.load;

/**
 * The bridge circuit reduced to m branches from a floating star point (m = 3 for the three-phase bridge;
 * m = 2 for the single-phase bridge, whose winding is split into two half-branches with EMFs +e/2 and -e/2).
 * Branch k carries EMF e_k(t) = a_k cos(wt) + b_k sin(wt), resistance R and inductance L; all two-diode-drop
 * losses and the battery are lumped into the threshold V0 = Vb + 2 Vd (exact: every current path passes one
 * upper and one lower diode, and the diodes on one rail share their rail's potential).
 */
final class BridgeModel {
    final int m;
    final double w;
    final double[] a;
    final double[] b;
    /** Branch resistance (winding part + cable part), Ohm. */
    final double r;
    final double rWinding;
    final double rCable;
    final double l;
    final double v0;
    final double rDc;
    final double emfPeakV;
    /** Amplitude of every pair EMF e_k - e_j (line-to-line for three-phase, the winding EMF for single-phase), V. */
    final double emfPeakPairV;
    /** Length of the symmetry interval: T/6 (three-phase) or T/2 (single-phase), s. */
    final double sweepS;
    /**
     * Ordered branch pairs (k up, j down) that can start conducting from the all-off state: pairK[p], pairJ[p],
     * the phase pairPhi[p] of e_k - e_j = A cos(wt - phi) and the half-width theta of the window where
     * e_k - e_j exceeds V0 (the same for every pair). Empty when theta is below {@link #MIN_WINDOW_RAD}.
     */
    final int[] pairK;
    final int[] pairJ;
    final double[] pairPhi;
    final double windowHalfRad;

    /**
     * Smallest half-width of a conduction window, electrical radians. In a narrower window the current pulse
     * (peak about I_sc * theta^3 with I_sc the short-circuit current) lies below the resolution of the
     * closed-form waveforms, so it is taken as no conduction: the DC current dropped is below 1e-11 I_sc.
     */
    static final double MIN_WINDOW_RAD = 1e-3;

    BridgeModel(BridgeCircuit c) {
        w = 2 * Math.PI * c.frequencyHz();
        double peak = Math.sqrt(2) * c.emfPhaseRmsV();
        v0 = c.thresholdV();
        rDc = c.dcResistanceOhm();
        if (c.type() == BridgeType.THREE_PHASE_BRIDGE) {
            m = 3;
            a = new double[3];
            b = new double[3];
            for (int k = 0; k < 3; k++) {
                double phi = 2 * Math.PI * k / 3;
                a[k] = -peak * Math.sin(phi);
                b[k] = peak * Math.cos(phi);
            }
            rWinding = c.windingResistanceOhm();
            rCable = c.acCableResistanceOhm();
            l = c.inductanceH();
            sweepS = Math.PI / (3 * w);
            emfPeakV = peak;
        } else {
            m = 2;
            a = new double[] {0, 0};
            b = new double[] {peak / 2, -peak / 2};
            rWinding = c.windingResistanceOhm() / 2;
            rCable = c.acCableResistanceOhm();
            l = c.inductanceH() / 2;
            sweepS = Math.PI / w;
            emfPeakV = peak / 2;
        }
        r = rWinding + rCable;
        emfPeakPairV = c.peakDrivingEmfV();
        windowHalfRad = windowHalfRad(emfPeakPairV, v0);
        int pairs = windowHalfRad >= MIN_WINDOW_RAD ? m * (m - 1) : 0;
        pairK = new int[pairs];
        pairJ = new int[pairs];
        pairPhi = new double[pairs];
        int p = 0;
        for (int k = 0; k < m && pairs > 0; k++) {
            for (int j = 0; j < m; j++) {
                if (j != k) {
                    pairK[p] = k;
                    pairJ[p] = j;
                    pairPhi[p++] = Math.atan2(b[k] - b[j], a[k] - a[j]);
                }
            }
        }
    }

    /**
     * Half-width of the interval around the peak where A cos(psi) exceeds v0, radians: acos(v0 / A), written as
     * 2 asin(sqrt((A - v0) / 2A)) so that it stays accurate when A barely exceeds v0; 0 when A <= v0.
     */
    static double windowHalfRad(double peakV, double v0) {
        return peakV > v0 ? 2 * Math.asin(Math.sqrt((peakV - v0) / (2 * peakV))) : 0;
    }

    /** True when a pair can conduct at all (its window is at least {@link #MIN_WINDOW_RAD} wide on each side). */
    boolean conducts() {
        return pairK.length > 0;
    }

    /**
     * The pair whose window contains the electrical angle wt with at least half the minimum window still ahead
     * (the most forward-biased one), or -1.
     */
    int pairInWindow(double t) {
        int best = -1;
        double bestCos = -2;
        for (int p = 0; p < pairK.length; p++) {
            double psi = Math.IEEEremainder(w * t - pairPhi[p], 2 * Math.PI);
            if (psi >= -windowHalfRad - ANGLE_TOL_RAD && psi <= windowHalfRad - MIN_WINDOW_RAD / 2
                    && Math.cos(psi) > bestCos) {
                best = p;
                bestCos = Math.cos(psi);
            }
        }
        return best;
    }

    /** Time from t to the next window start of pair p, s (0 when a window starts at t). */
    double timeToWindow(int p, double t) {
        double psi = Math.IEEEremainder(w * t - pairPhi[p], 2 * Math.PI);
        double ahead = -windowHalfRad - psi;
        if (ahead < -ANGLE_TOL_RAD) {
            ahead += 2 * Math.PI;
        }
        return Math.max(ahead, 0) / w;
    }

    /** Angle tolerance for window tests, radians (rounding of w t). */
    static final double ANGLE_TOL_RAD = 1e-12;

    /** Branch EMF at time t, V. */
    double emf(int k, double t) {
        return a[k] * Math.cos(w * t) + b[k] * Math.sin(w * t);
    }

    /** Start-of-next-interval state from the end state: the symmetry map's inverse (x0 = P^-1 x_end). */
    void unshift(double[] end, double[] out) {
        if (m == 3) {
            out[0] = -end[2];
            out[1] = -end[0];
            out[2] = -end[1];
        } else {
            out[0] = -end[0];
            out[1] = -end[1];
        }
    }

    /** The symmetry map itself: the state one interval later, x(t + sweepS) = S x(t) (inverse of unshift). */
    void shift(double[] x, double[] out) {
        if (m == 3) {
            out[0] = -x[1];
            out[1] = -x[2];
            out[2] = -x[0];
        } else {
            out[0] = -x[0];
            out[1] = -x[1];
        }
    }

    /** Scale of currents: the short-circuit branch current amplitude, A. */
    double currentScaleA() {
        return emfPeakV / Math.hypot(r, w * l);
    }
}
