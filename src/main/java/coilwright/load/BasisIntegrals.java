package coilwright.load;

/**
 * Closed-form integrals over [0, d] of the five basis functions of a {@link BridgeSegment} and of their
 * pairwise products (a Gram matrix), so averages and rms values of the piecewise waveforms are exact.
 * <p>
 * The exponentials enter as phi(tau) = exp(lambda tau) - 1, with the constant term taking their values at tau = 0:
 * in a reactance-limited circuit the constant and exponential coefficients of a current are both near V0 / R
 * and cancel to a current thousands of times smaller over a segment much shorter than L / R, so squares formed
 * from them would lose six or more digits, while in this basis the terms that remain are of the current's own
 * size. Integrals of phi that would themselves cancel are summed as power series in lambda d.
 */
final class BasisIntegrals {
    /** Below this |lambda d| the integrals of phi are summed as series. */
    private static final double SERIES_LIMIT = 0.5;
    private static final int SERIES_TERMS = 24;

    /** Integrals of cos, sin, 1, phi1, phi2. */
    final double[] single = new double[BridgeSegment.NB];
    /** Gram matrix of cos, sin, 1, phi1, phi2. */
    final double[][] gram = new double[BridgeSegment.NB][BridgeSegment.NB];

    BasisIntegrals(BridgeSegment s, double d) {
        double w = s.model.omega;
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
        single[3] = phiIntegral(l1, d);
        single[4] = phiIntegral(l2, d);
        set(0, 0, d / 2 + sin2 / (4 * w));
        set(1, 1, d / 2 - sin2 / (4 * w));
        set(0, 1, (s1 * s1 - s0 * s0) / (2 * w));
        set(0, 2, single[0]);
        set(1, 2, single[1]);
        set(2, 2, d);
        set(2, 3, single[3]);
        set(2, 4, single[4]);
        set(3, 3, phiProduct(l1, l1, d));
        set(4, 4, phiProduct(l2, l2, d));
        set(3, 4, phiProduct(l1, l2, d));
        double[] e1 = expTrig(l1, w, th0, d);
        set(0, 3, e1[0] - single[0]);
        set(1, 3, e1[1] - single[1]);
        double[] e2 = expTrig(l2, w, th0, d);
        set(0, 4, e2[0] - single[0]);
        set(1, 4, e2[1] - single[1]);
    }

    private void set(int i, int j, double v) {
        gram[i][j] = v;
        gram[j][i] = v;
    }

    /** Coefficients on cos, sin, 1, exp1, exp2 rewritten on cos, sin, 1, phi1, phi2. */
    private static double[] toPhi(double[] p) {
        return new double[] {p[0], p[1], p[2] + p[3] + p[4], p[3], p[4]};
    }

    /** Integral of p(tau) q(tau) for coefficient vectors p and q (on cos, sin, 1, exp1, exp2). */
    double product(double[] p, double[] q) {
        double[] a = toPhi(p);
        double[] b = toPhi(q);
        double sum = 0;
        for (int i = 0; i < BridgeSegment.NB; i++) {
            double row = 0;
            for (int j = 0; j < BridgeSegment.NB; j++) {
                row += gram[i][j] * b[j];
            }
            sum += a[i] * row;
        }
        return sum;
    }

    /** Integral of p(tau) (coefficients on cos, sin, 1, exp1, exp2). */
    double integral(double[] p) {
        double[] a = toPhi(p);
        double sum = 0;
        for (int i = 0; i < BridgeSegment.NB; i++) {
            sum += a[i] * single[i];
        }
        return sum;
    }

    /** Integral of exp(c tau) - 1 - c tau over [0, d], divided by c: (expm1(c d) - c d) / c; 0 for c = 0. */
    private static double phiIntegral(double c, double d) {
        double x = c * d;
        if (Math.abs(x) > SERIES_LIMIT) {
            return (Math.expm1(x) - x) / c;
        }
        // d * sum_{n>=2} x^(n-1) / n!
        double term = 0.5 * x;
        double sum = term;
        for (int n = 3; n <= SERIES_TERMS && Math.abs(term) > 1e-18 * Math.abs(sum); n++) {
            term *= x / n;
            sum += term;
        }
        return d * sum;
    }

    /** Integral of (exp(a tau) - 1)(exp(b tau) - 1) over [0, d]. */
    private static double phiProduct(double a, double b, double d) {
        if (Math.max(Math.abs(a), Math.abs(b)) * d > SERIES_LIMIT) {
            return phiIntegral(a + b, d) - phiIntegral(a, d) - phiIntegral(b, d);
        }
        // sum_{n>=2} d^(n+1) ((a+b)^n - a^n - b^n) / (n+1)!
        double x = a * d;
        double y = b * d;
        double pxy = (x + y) * (x + y);
        double px = x * x;
        double py = y * y;
        double fact = 6;
        double sum = 0;
        for (int n = 2; n <= SERIES_TERMS; n++) {
            double term = (pxy - px - py) / fact;
            sum += term;
            if (Math.abs(term) <= 1e-18 * Math.abs(sum)) {
                break;
            }
            pxy *= x + y;
            px *= x;
            py *= y;
            fact *= n + 2;
        }
        return d * sum;
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
