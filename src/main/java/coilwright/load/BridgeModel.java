package coilwright.load;

/**
 * The bridge circuit reduced to m branches from a floating star point (m = 3 for the three-phase bridge;
 * m = 2 for the single-phase bridge, whose winding is split into two half-branches with EMFs +e/2 and -e/2).
 * Branch k carries EMF e_k(t) = a_k cos(wt) + b_k sin(wt), resistance R and inductance L; all two-diode-drop
 * losses and the battery are lumped into the threshold V0 = Vb + 2 Vd (exact: every current path passes one
 * upper and one lower diode, and the diodes on one rail share their rail's potential).
 */
final class BridgeModel {
    /** Number of branches m: 3 (three-phase) or 2 (single-phase). */
    final int branches;
    /** Electrical angular frequency w, rad/s. */
    final double omega;
    /** Branch EMF e_k(t) = emfCosV[k] cos(wt) + emfSinV[k] sin(wt), V. */
    final double[] emfCosV;
    final double[] emfSinV;
    /** Branch resistance (winding part + cable part), Ohm. */
    final double resistanceOhm;
    final double windingResistanceOhm;
    final double cableResistanceOhm;
    /** Branch inductance L, H. */
    final double inductanceH;
    /** Battery voltage plus two diode drops, V0, V. */
    final double thresholdV;
    /** DC-side resistance (cable and battery), Ohm. */
    final double dcResistanceOhm;
    final double emfPeakV;
    /** Amplitude of every pair EMF e_k - e_j (line-to-line for three-phase, the winding EMF for single-phase), V. */
    final double emfPeakPairV;
    /** Length of the symmetry interval: T/6 (three-phase) or T/2 (single-phase), s. */
    final double intervalS;
    /**
     * Ordered branch pairs (k up, j down) that can start conducting from the all-off state: pairUpper[p], pairLower[p],
     * the phase pairPhaseRad[p] of e_k - e_j = A cos(wt - phi) and the half-width theta of the window where
     * e_k - e_j exceeds V0 (the same for every pair). Empty when theta is below {@link #MIN_WINDOW_RAD}.
     */
    final int[] pairUpper;
    final int[] pairLower;
    final double[] pairPhaseRad;
    final double windowHalfRad;

    /**
     * Smallest half-width of a conduction window, electrical radians. In a narrower window the current pulse
     * (peak about I_sc * theta^3 with I_sc the short-circuit current) lies below the resolution of the
     * closed-form waveforms, so it is taken as no conduction: the DC current dropped is below 1e-11 I_sc.
     */
    static final double MIN_WINDOW_RAD = 1e-3;

    BridgeModel(BridgeCircuit c) {
        omega = 2 * Math.PI * c.frequencyHz();
        double peak = Math.sqrt(2) * c.emfPhaseRmsV();
        thresholdV = c.thresholdV();
        dcResistanceOhm = c.dcResistanceOhm();
        if (c.type() == BridgeType.THREE_PHASE_BRIDGE) {
            branches = 3;
            emfCosV = new double[3];
            emfSinV = new double[3];
            for (int k = 0; k < 3; k++) {
                double phi = 2 * Math.PI * k / 3;
                emfCosV[k] = -peak * Math.sin(phi);
                emfSinV[k] = peak * Math.cos(phi);
            }
            windingResistanceOhm = c.windingResistanceOhm();
            cableResistanceOhm = c.acCableResistanceOhm();
            inductanceH = c.inductanceH();
            intervalS = Math.PI / (3 * omega);
            emfPeakV = peak;
        } else {
            branches = 2;
            emfCosV = new double[] {0, 0};
            emfSinV = new double[] {peak / 2, -peak / 2};
            windingResistanceOhm = c.windingResistanceOhm() / 2;
            cableResistanceOhm = c.acCableResistanceOhm();
            inductanceH = c.inductanceH() / 2;
            intervalS = Math.PI / omega;
            emfPeakV = peak / 2;
        }
        resistanceOhm = windingResistanceOhm + cableResistanceOhm;
        emfPeakPairV = c.peakDrivingEmfV();
        windowHalfRad = windowHalfRad(emfPeakPairV, thresholdV);
        int pairs = windowHalfRad >= MIN_WINDOW_RAD ? branches * (branches - 1) : 0;
        pairUpper = new int[pairs];
        pairLower = new int[pairs];
        pairPhaseRad = new double[pairs];
        int p = 0;
        for (int k = 0; k < branches && pairs > 0; k++) {
            for (int j = 0; j < branches; j++) {
                if (j != k) {
                    pairUpper[p] = k;
                    pairLower[p] = j;
                    pairPhaseRad[p++] = Math.atan2(emfSinV[k] - emfSinV[j], emfCosV[k] - emfCosV[j]);
                }
            }
        }
    }

    /**
     * Half-width of the interval around the peak where A cos(psi) exceeds v0, radians: acos(v0 / A), written as
     * 2 asin(sqrt((A - v0) / 2A)) so that it stays accurate when A barely exceeds v0; 0 when A <= v0.
     */
    static double windowHalfRad(double peakV, double thresholdV) {
        return peakV > thresholdV ? 2 * Math.asin(Math.sqrt((peakV - thresholdV) / (2 * peakV))) : 0;
    }

    /** True when a pair can conduct at all (its window is at least {@link #MIN_WINDOW_RAD} wide on each side). */
    boolean conducts() {
        return pairUpper.length > 0;
    }

    /**
     * The pair whose window contains the electrical angle wt with at least half the minimum window still ahead
     * (the most forward-biased one), or -1.
     */
    int pairInWindow(double t) {
        int best = -1;
        double bestCos = -2;
        for (int p = 0; p < pairUpper.length; p++) {
            double psi = Math.IEEEremainder(omega * t - pairPhaseRad[p], 2 * Math.PI);
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
        double psi = Math.IEEEremainder(omega * t - pairPhaseRad[p], 2 * Math.PI);
        double ahead = -windowHalfRad - psi;
        if (ahead < -ANGLE_TOL_RAD) {
            ahead += 2 * Math.PI;
        }
        return Math.max(ahead, 0) / omega;
    }

    /** Angle tolerance for window tests, radians (rounding of w t). */
    static final double ANGLE_TOL_RAD = 1e-12;

    /** Branch EMF at time t, V. */
    double emf(int k, double t) {
        return emfCosV[k] * Math.cos(omega * t) + emfSinV[k] * Math.sin(omega * t);
    }

    /** Start-of-next-interval state from the end state: the symmetry map's inverse (x0 = P^-1 x_end). */
    void unshift(double[] end, double[] out) {
        if (branches == 3) {
            out[0] = -end[2];
            out[1] = -end[0];
            out[2] = -end[1];
        } else {
            out[0] = -end[0];
            out[1] = -end[1];
        }
    }

    /** The symmetry map itself: the state one interval later, x(t + intervalS) = S x(t) (inverse of unshift). */
    void shift(double[] x, double[] out) {
        if (branches == 3) {
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
        return emfPeakV / Math.hypot(resistanceOhm, omega * inductanceH);
    }
}
