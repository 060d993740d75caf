package coilwright.load;

/**
 * The exact solution of the bridge circuit in one conduction state, from time t0 on.
 * Every waveform in the state is a combination of five functions of tau = t - t0:
 * cos(wt), sin(wt), 1, exp(lambda1 tau), exp(lambda2 tau). The branch ODE is
 * L di/dt = f(t) - R i - Rdc g (h^T i), where h marks the branches on the upper rail and g distributes the DC
 * drop; its modes are lambda1 = -R/L (currents swapping between branches of one rail) and
 * lambda2 = -(R + Rdc h^T g)/L (the DC current), and the particular solution follows from the
 * Sherman-Morrison formula for (z I + Rdc g h^T)^-1.
 */
final class BridgeSegment {
    static final int NB = 5;

    final BridgeModel model;
    final int[] sign;
    final double t0;
    final int nUp;
    final int nDown;
    final double lambda1;
    final double lambda2;
    /** Branch current coefficients [k][basis]. */
    final double[][] current;
    /** Upper and lower rail potentials (plus/minus the diode drop) relative to the star point; null when off. */
    final double[] uUp;
    final double[] uDown;

    BridgeSegment(BridgeModel model, int[] sign, double t0, double[] x0) {
        this.model = model;
        this.sign = sign.clone();
        this.t0 = t0;
        int m = model.branches;
        int up = 0;
        int down = 0;
        for (int s : sign) {
            up += s > 0 ? 1 : 0;
            down += s < 0 ? 1 : 0;
        }
        nUp = up;
        nDown = down;
        current = new double[m][NB];
        int n = up + down;
        if (n == 0) {
            lambda1 = -model.resistanceOhm / model.inductanceH;
            lambda2 = lambda1;
            uUp = null;
            uDown = null;
            return;
        }
        double ac = 0;
        double bc = 0;
        double mean = 0;
        for (int k = 0; k < m; k++) {
            if (sign[k] != 0) {
                ac += model.emfCosV[k];
                bc += model.emfSinV[k];
                mean += x0[k];
            }
        }
        mean /= n;
        double[] g = new double[m];
        for (int k = 0; k < m; k++) {
            g[k] = sign[k] > 0 ? (double) down / n : sign[k] < 0 ? -(double) up / n : 0;
        }
        double hg = (double) up * down / n;
        double wl = model.omega * model.inductanceH;
        double rDc = model.dcResistanceOhm;
        // forcing phasor F_k = fa_k - j fb_k for f_k = fa_k cos + fb_k sin
        double hFr = 0;
        double hFi = 0;
        for (int k = 0; k < m; k++) {
            if (sign[k] > 0) {
                hFr += model.emfCosV[k] - ac / n;
                hFi -= model.emfSinV[k] - bc / n;
            }
        }
        double dr = model.resistanceOhm + rDc * hg;
        double den = dr * dr + wl * wl;
        double qr = (hFr * dr + hFi * wl) / den;
        double qi = (hFi * dr - hFr * wl) / den;
        double zden = model.resistanceOhm * model.resistanceOhm + wl * wl;
        double c0 = Math.cos(model.omega * t0);
        double s0 = Math.sin(model.omega * t0);
        double[] delta = new double[m];
        double hDelta = 0;
        for (int k = 0; k < m; k++) {
            if (sign[k] == 0) {
                continue;
            }
            double nr = (model.emfCosV[k] - ac / n) - rDc * g[k] * qr;
            double ni = -(model.emfSinV[k] - bc / n) - rDc * g[k] * qi;
            double ir = (nr * model.resistanceOhm + ni * wl) / zden;
            double ii = (ni * model.resistanceOhm - nr * wl) / zden;
            current[k][0] = ir;
            current[k][1] = -ii;
            current[k][2] = -g[k] * model.thresholdV / dr;
            delta[k] = (x0[k] - mean) - (current[k][0] * c0 + current[k][1] * s0 + current[k][2]);
            hDelta += sign[k] > 0 ? delta[k] : 0;
        }
        double alpha = hDelta / hg;
        for (int k = 0; k < m; k++) {
            if (sign[k] != 0) {
                current[k][3] = delta[k] - alpha * g[k];
                current[k][4] = alpha * g[k];
            }
        }
        lambda1 = -model.resistanceOhm / model.inductanceH;
        lambda2 = -dr / model.inductanceH;
        double[] idc = dcCurrent();
        uUp = new double[NB];
        uDown = new double[NB];
        double kUp = (double) down / n;
        for (int j = 0; j < NB; j++) {
            uUp[j] = rDc * kUp * idc[j];
            uDown[j] = uUp[j] - rDc * idc[j];
        }
        uUp[0] += ac / n;
        uUp[1] += bc / n;
        uUp[2] += down * model.thresholdV / n;
        uDown[0] += ac / n;
        uDown[1] += bc / n;
        uDown[2] += down * model.thresholdV / n - model.thresholdV;
    }

    boolean off() {
        return nUp + nDown == 0;
    }

    int conducting() {
        return nUp + nDown;
    }

    void basis(double tau, double[] out) {
        double th = model.omega * (t0 + tau);
        out[0] = Math.cos(th);
        out[1] = Math.sin(th);
        out[2] = 1;
        out[3] = Math.exp(lambda1 * tau);
        out[4] = Math.exp(lambda2 * tau);
    }

    static double dot(double[] c, double[] basis) {
        return c[0] * basis[0] + c[1] * basis[1] + c[2] * basis[2] + c[3] * basis[3] + c[4] * basis[4];
    }

    void currentsAt(double tau, double[] out) {
        double[] bs = new double[NB];
        basis(tau, bs);
        for (int k = 0; k < model.branches; k++) {
            out[k] = sign[k] == 0 ? 0 : dot(current[k], bs);
        }
    }

    /**
     * The branch currents' sensitivity at tau to the state at the segment's start: {@code out = A(tau) in} for a
     * matrix {@code in} of m rows (one column per direction). The homogeneous part of the solution is
     * A(tau) = exp(lambda1 tau) P + (exp(lambda2 tau) - exp(lambda1 tau)) g h^T P / (h^T g), P the projection
     * onto the conducting branches with zero sum (the mean removed), g the DC drop's distribution and h the
     * upper rail (see the class comment); it is exact, since the particular solution does not depend on the state.
     * Zero when no branch conducts. {@code out} must not be {@code in}.
     */
    void propagate(double tau, double[][] in, double[][] out) {
        int m = model.branches;
        int n = nUp + nDown;
        int directions = in[0].length;
        if (n == 0) {
            for (double[] row : out) {
                java.util.Arrays.fill(row, 0);
            }
            return;
        }
        double e1 = Math.exp(lambda1 * tau);
        double e2 = Math.exp(lambda2 * tau);
        double upperShare = (double) nDown / n;
        double lowerShare = -(double) nUp / n;
        double railProduct = (double) nUp * nDown / n;
        for (int c = 0; c < directions; c++) {
            double mean = 0;
            for (int k = 0; k < m; k++) {
                mean += sign[k] != 0 ? in[k][c] : 0;
            }
            mean /= n;
            double upper = 0;
            for (int k = 0; k < m; k++) {
                upper += sign[k] > 0 ? in[k][c] - mean : 0;
            }
            double dcMode = (e2 - e1) * upper / railProduct;
            for (int k = 0; k < m; k++) {
                out[k][c] = sign[k] == 0 ? 0
                        : e1 * (in[k][c] - mean) + dcMode * (sign[k] > 0 ? upperShare : lowerShare);
            }
        }
    }

    /** Time derivative of every branch current at tau, A/s (zero for a blocked branch). */
    void currentSlopesAt(double tau, double[] out) {
        double[] bs = new double[NB];
        basis(tau, bs);
        double w = model.omega;
        for (int k = 0; k < model.branches; k++) {
            double[] c = current[k];
            out[k] = sign[k] == 0 ? 0
                    : w * (c[1] * bs[0] - c[0] * bs[1]) + lambda1 * c[3] * bs[3] + lambda2 * c[4] * bs[4];
        }
    }

    /** Coefficients of the EMF of branch k. */
    double[] emf(int k) {
        return new double[] {model.emfCosV[k], model.emfSinV[k], 0, 0, 0};
    }

    /** Coefficients of the DC current (sum of the upper-rail branch currents). */
    double[] dcCurrent() {
        double[] c = new double[NB];
        for (int k = 0; k < model.branches; k++) {
            if (sign[k] > 0) {
                for (int j = 0; j < NB; j++) {
                    c[j] += current[k][j];
                }
            }
        }
        return c;
    }

    /** Coefficients of the alternator terminal potential of branch k against the star point. */
    double[] terminal(int k) {
        if (sign[k] == 0) {
            return emf(k);
        }
        double[] u = (sign[k] > 0 ? uUp : uDown).clone();
        for (int j = 0; j < NB; j++) {
            u[j] += model.cableResistanceOhm * current[k][j];
        }
        return u;
    }
}
