package coilwright.load;

/**
 * Closed-form integrals over [0, d] of the five basis functions of a {@link BridgeSegment} and of their
 * pairwise products (a Gram matrix), so averages and rms values of the piecewise waveforms are exact.
 */
final class BasisIntegrals {
    final double[] single = new double[BridgeSegment.NB];
    final double[][] gram = new double[BridgeSegment.NB][BridgeSegment.NB];

    BasisIntegrals(BridgeSegment s, double d) {
        double w = s.md.w;
        double th0 = w * s.t0;
        double th1 = w * (s.t0 + d);
        double l1 = s.lambda1;
        double l2 = s.lambda2;
        double sin2 = Math.sin(2 * th1) - Math.sin(2 * th0);
        double s0 = Math.sin(th0);
        double s1 = Math.sin(th1);
        single[0] = (s1 - s0) / w;
        single[1] = (Math.cos(th0) - Math.cos(th1)) / w;
        single[2] = d;
        single[3] = expm1Over(l1, d);
        single[4] = expm1Over(l2, d);
        set(0, 0, d / 2 + sin2 / (4 * w));
        set(1, 1, d / 2 - sin2 / (4 * w));
        set(0, 1, (s1 * s1 - s0 * s0) / (2 * w));
        set(0, 2, single[0]);
        set(1, 2, single[1]);
        set(2, 2, d);
        set(2, 3, single[3]);
        set(2, 4, single[4]);
        set(3, 3, expm1Over(2 * l1, d));
        set(4, 4, expm1Over(2 * l2, d));
        set(3, 4, expm1Over(l1 + l2, d));
        double[] e1 = expTrig(l1, w, th0, d);
        set(0, 3, e1[0]);
        set(1, 3, e1[1]);
        double[] e2 = expTrig(l2, w, th0, d);
        set(0, 4, e2[0]);
        set(1, 4, e2[1]);
    }

    private void set(int i, int j, double v) {
        gram[i][j] = v;
        gram[j][i] = v;
    }

    /** Integral of p(tau) q(tau) for coefficient vectors p and q. */
    double product(double[] p, double[] q) {
        double sum = 0;
        for (int i = 0; i < BridgeSegment.NB; i++) {
            double row = 0;
            for (int j = 0; j < BridgeSegment.NB; j++) {
                row += gram[i][j] * q[j];
            }
            sum += p[i] * row;
        }
        return sum;
    }

    /** Integral of p(tau). */
    double integral(double[] p) {
        double sum = 0;
        for (int i = 0; i < BridgeSegment.NB; i++) {
            sum += p[i] * single[i];
        }
        return sum;
    }

    /** (exp(lambda d) - 1) / lambda without cancellation; lambda < 0. */
    private static double expm1Over(double lambda, double d) {
        return Math.expm1(lambda * d) / lambda;
    }

    /** Integral of exp(lambda tau) times cos and sin of (th0 + w tau) over [0, d]. */
    private static double[] expTrig(double lambda, double w, double th0, double d) {
        double cw = Math.cos(w * d);
        double sw = Math.sin(w * d);
        double sh = Math.sin(w * d / 2);
        double el = Math.exp(lambda * d);
        double nr = Math.expm1(lambda * d) * cw - 2 * sh * sh;
        double ni = el * sw;
        double den = lambda * lambda + w * w;
        double qr = (nr * lambda + ni * w) / den;
        double qi = (ni * lambda - nr * w) / den;
        double c0 = Math.cos(th0);
        double s0 = Math.sin(th0);
        return new double[] {qr * c0 - qi * s0, qr * s0 + qi * c0};
    }
}
