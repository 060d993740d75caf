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
    /** Length of the symmetry interval: T/6 (three-phase) or T/2 (single-phase), s. */
    final double sweepS;

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
    }

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

    /** Scale of currents: the short-circuit branch current amplitude, A. */
    double currentScaleA() {
        return emfPeakV / Math.hypot(r, w * l);
    }
}
