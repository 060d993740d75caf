package coilwright.cogging;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealVector;

/**
 * The no-load field of a surface-magnet array under a slotted stator by the subdomain method of Zhu, Wu, Xia &amp;
 * Howe ("An accurate subdomain model for magnetic field computation in slotted surface-mounted permanent-magnet
 * machines", IEEE Trans. Magn. 46(4), 2010), here in Cartesian form over one periodic section (curvature neglected,
 * as in the rest of the field model). Regions: the magnet layer on infinitely permeable rotor iron, the air gap, and
 * one rectangular region per slot opening with infinitely permeable sides and bottom. The vector potential is a
 * Fourier series in each region (period of the section in the magnets and gap, cosines of the opening width in a
 * slot); the magnet and gap coefficients are eliminated harmonic by harmonic, and continuity of A and H_x over the
 * openings (H_x = 0 on the tooth faces) leaves one linear system for the slot coefficients. Its matrix does not
 * depend on the rotor position, so it is factorised once (Commons Math LU) and solved for every position.
 * The tangential force on the stator follows from the Maxwell stress on the middle line of the gap,
 * F_x = (1/mu0) integral B_x B_y dx per unit depth.
 */
final class SubdomainField {
    private static final double MU0 = 4e-7 * Math.PI;
    /** Slot depth used, in opening widths: the slot field decays as exp(-m pi y / b), so deeper adds nothing. */
    static final double SLOT_DEPTH_IN_OPENINGS = 3.0;
    private static final int MAX_UNKNOWNS = 1600;
    private static final int MIN_SLOT_HARMONICS = 6;
    private static final int MAX_SLOT_HARMONICS = 30;
    private static final int MAX_GAP_HARMONICS = 3000;
    /** Gap harmonics per (section length / opening width): resolves the opening to a tenth; the cogging of the
     *  reference geometry changes by under 0.1 % between 7 and 28. */
    private static final double GAP_HARMONICS_PER_OPENING = 10;

    private final int slots;       // S, slots in the section
    private final int poles;       // poles in the section (even)
    private final double period;   // P, m
    private final double opening;  // b, m
    private final double gap;      // g, m
    private final int n;           // gap harmonics 1..n
    private final int m;           // slot harmonics 1..m
    private final double remanence;
    private final double magnetWidth;
    private final double[] k;      // k_n
    private final double[] alpha;  // A_n(Y) = alpha_n G_n + beta_n
    private final double[] sourceScale; // beta_n = i * sourceScale_n * Br M_n
    private final double[] edgeE;  // exp(-k g)
    private final double[] qDen;   // (c+1) - E^2 (c-1)
    private final double[] cMinus; // c - 1
    private final double[][] kRe;  // K(k_n, j) real and imaginary parts, j = 0..m
    private final double[][] kIm;
    private final double[] tau;    // (j pi / b) tanh(j pi d / b)
    private final double[][] cosX; // cos(k_n x_i), x_i the left edge of slot i
    private final double[][] sinX;
    private final double[][] pattern; // magnet pattern coefficient with the rotor at shift 0, {re, im}
    private final DecompositionSolver solver;
    private final boolean reduced;

    /**
     * @param slots          slots in the periodic section
     * @param poles          poles in the section (even)
     * @param periodM        section length along the gap, m
     * @param openingM       slot opening b, m (&gt; 0)
     * @param gapM           air gap g, m
     * @param magnetM        magnet thickness l_m, m
     * @param poleArcRatio   magnet width / pole pitch
     * @param remanenceT     Br, T
     * @param mu             recoil permeability
     */
    SubdomainField(int slots, int poles, double periodM, double openingM, double gapM, double magnetM,
                   double poleArcRatio, double remanenceT, double mu) {
        this.slots = slots;
        this.poles = poles;
        this.period = periodM;
        this.opening = openingM;
        this.gap = gapM;
        this.remanence = remanenceT;
        this.magnetWidth = poleArcRatio * periodM / poles;
        int gapHarmonics = (int) Math.min(MAX_GAP_HARMONICS,
                Math.max(16.0 * poles, Math.ceil(GAP_HARMONICS_PER_OPENING * periodM / openingM)));
        int slotHarmonics = (int) Math.max(MIN_SLOT_HARMONICS, Math.min(MAX_SLOT_HARMONICS,
                Math.ceil(2.0 * openingM * gapHarmonics / periodM)));
        boolean cut = slots * slotHarmonics > MAX_UNKNOWNS;
        if (cut) {
            slotHarmonics = Math.max(MIN_SLOT_HARMONICS, MAX_UNKNOWNS / slots);
        }
        this.reduced = cut;
        this.n = gapHarmonics;
        this.m = slotHarmonics;
        double depth = SLOT_DEPTH_IN_OPENINGS * openingM;
        k = new double[n + 1];
        alpha = new double[n + 1];
        sourceScale = new double[n + 1];
        edgeE = new double[n + 1];
        qDen = new double[n + 1];
        cMinus = new double[n + 1];
        kRe = new double[n + 1][m + 1];
        kIm = new double[n + 1][m + 1];
        for (int h = 1; h <= n; h++) {
            double kh = 2 * Math.PI * h / periodM;
            double e = Math.exp(-kh * gapM);
            double c = mu / Math.tanh(kh * magnetM);
            double den = (c + 1) - e * e * (c - 1);
            k[h] = kh;
            edgeE[h] = e;
            qDen[h] = den;
            cMinus[h] = c - 1;
            alpha[h] = (1 + 2 * e * e * (c - 1) / den) / kh;
            sourceScale[h] = 2 * e / (kh * den);
            for (int j = 0; j <= m; j++) {
                double[] kk = openingIntegral(kh, j, openingM);
                kRe[h][j] = kk[0];
                kIm[h][j] = kk[1];
            }
        }
        cosX = new double[n + 1][slots];
        sinX = new double[n + 1][slots];
        pattern = new double[n + 1][];
        for (int h = 1; h <= n; h++) {
            for (int i = 0; i < slots; i++) {
                cosX[h][i] = Math.cos(k[h] * slotLeft(i));
                sinX[h][i] = Math.sin(k[h] * slotLeft(i));
            }
            pattern[h] = magnetCoefficient(h, 0.0);
        }
        tau = new double[m + 1];
        for (int j = 1; j <= m; j++) {
            double a = j * Math.PI / openingM;
            tau[j] = a * Math.tanh(a * depth);
        }
        solver = new LUDecomposition(systemMatrix()).getSolver();
    }

    /** True when the slot harmonics had to be cut to keep the system small (many slots in the section). */
    boolean reduced() {
        return reduced;
    }

    int gapHarmonics() {
        return n;
    }

    int slotHarmonics() {
        return m;
    }

    /** K(k, j) = integral over [0, b] of cos(j pi u / b) exp(-i k u) du, as {re, im}. */
    static double[] openingIntegral(double kk, int j, double b) {
        double a = j * Math.PI / b;
        double sign = j % 2 == 0 ? 1 : -1;
        if (j == 0) {
            // (1 - exp(-i k b)) / (i k)
            return new double[]{Math.sin(kk * b) / kk, (Math.cos(kk * b) - 1) / kk};
        }
        double den = a * a - kk * kk;
        if (Math.abs(den) < 1e-9 * a * a) {
            return new double[]{b / 2, 0};
        }
        // i k (1 - sign exp(-i k b)) / den
        double re = 1 - sign * Math.cos(kk * b);
        double im = sign * Math.sin(kk * b);
        return new double[]{-kk * im / den, kk * re / den};
    }

    private double slotLeft(int i) {
        return i * period / slots - opening / 2;
    }

    /** Matrix of (I + coupling) for the unknowns c_{i,j}, i = slot, j = 1..m. */
    private Array2DRowRealMatrix systemMatrix() {
        int size = slots * m;
        double[][] a = new double[size][size];
        // coupling depends on the slot offset only: precompute per offset d = i - j (mod slots)
        double[][][] byOffset = new double[slots][m + 1][m + 1];
        for (int d = 0; d < slots; d++) {
            double delta = d * period / slots;
            for (int h = 1; h <= n; h++) {
                double cr = Math.cos(k[h] * delta);
                double ci = Math.sin(k[h] * delta);
                for (int j = 1; j <= m; j++) {
                    // e^{ik delta} * conj(K(k, j))
                    double pr = cr * kRe[h][j] + ci * kIm[h][j];
                    double pi = ci * kRe[h][j] - cr * kIm[h][j];
                    for (int jj = 1; jj <= m; jj++) {
                        byOffset[d][j][jj] += alpha[h] * (pr * kRe[h][jj] - pi * kIm[h][jj]);
                    }
                }
            }
        }
        for (int i = 0; i < slots; i++) {
            for (int j = 1; j <= m; j++) {
                int row = i * m + j - 1;
                a[row][row] += 1;
                for (int s = 0; s < slots; s++) {
                    double[][] c = byOffset[Math.floorMod(i - s, slots)];
                    for (int jj = 1; jj <= m; jj++) {
                        a[row][s * m + jj - 1] += 2 * 2 / (opening * period) * tau[jj] * c[j][jj];
                    }
                }
            }
        }
        return new Array2DRowRealMatrix(a, false);
    }

    /** Magnet pattern coefficient M_n (exponential Fourier) with the rotor shifted by {@code shiftM}, as {re, im}. */
    private double[] magnetCoefficient(int h, double shiftM) {
        double kh = k[h];
        double pitch = period / poles;
        double re = 0;
        double im = 0;
        double width = 2 * Math.sin(kh * magnetWidth / 2) / kh;
        for (int p = 0; p < poles; p++) {
            double centre = p * pitch + shiftM;
            double sign = p % 2 == 0 ? 1 : -1;
            re += sign * Math.cos(kh * centre) * width;
            im -= sign * Math.sin(kh * centre) * width;
        }
        return new double[]{re / period, im / period};
    }

    /**
     * Tangential force per unit depth on the stator section with the rotor shifted by {@code shiftM}, N/m.
     */
    double forcePerDepth(double shiftM) {
        double[][] beta = new double[n + 1][];
        double[][] source = new double[n + 1][];
        for (int h = 1; h <= n; h++) {
            double cs = Math.cos(k[h] * shiftM);
            double sn = -Math.sin(k[h] * shiftM);
            double[] mm = {pattern[h][0] * cs - pattern[h][1] * sn, pattern[h][0] * sn + pattern[h][1] * cs};
            double s = sourceScale[h] * remanence;
            beta[h] = new double[]{-s * mm[1], s * mm[0]}; // i * s * M
            double t = remanence / k[h];
            source[h] = new double[]{-t * mm[1], t * mm[0]}; // S = i Br M / k
        }
        RealVector rhs = new ArrayRealVector(slots * m);
        for (int i = 0; i < slots; i++) {
            for (int j = 1; j <= m; j++) {
                double sum = 0;
                for (int h = 1; h <= n; h++) {
                    double cr = cosX[h][i];
                    double ci = sinX[h][i];
                    double br = beta[h][0] * cr - beta[h][1] * ci;
                    double bi = beta[h][0] * ci + beta[h][1] * cr;
                    sum += br * kRe[h][j] + bi * kIm[h][j]; // Re(beta e^{ikx} conj K)
                }
                rhs.setEntry(i * m + j - 1, 2 * 2 / opening * sum);
            }
        }
        RealVector c = solver.solve(rhs);
        double force = 0;
        for (int h = 1; h <= n; h++) {
            // G_n = (1/P) sum_{i,j} (-c_ij tau_j) e^{-ik x_i} K(k, j)
            double gr = 0;
            double gi = 0;
            for (int i = 0; i < slots; i++) {
                double cr = cosX[h][i];
                double ci = -sinX[h][i];
                for (int j = 1; j <= m; j++) {
                    double w = -c.getEntry(i * m + j - 1) * tau[j];
                    gr += w * (cr * kRe[h][j] - ci * kIm[h][j]);
                    gi += w * (cr * kIm[h][j] + ci * kRe[h][j]);
                }
            }
            gr /= period;
            gi /= period;
            // gap: A = P e^{-k u} + Q e^{-k w}; Q = [S + E (c-1) G/k] / den, P = G/k + Q E
            double e = edgeE[h];
            double sr = source[h][0];
            double si = source[h][1];
            double qr = (sr + e * cMinus[h] * gr / k[h]) / qDen[h];
            double qi = (si + e * cMinus[h] * gi / k[h]) / qDen[h];
            double pr = gr / k[h] + qr * e;
            double pi = gi / k[h] + qi * e;
            double half = Math.exp(-k[h] * gap / 2);
            double ar = (pr + qr) * half;          // A at mid-gap
            double ai = (pi + qi) * half;
            double bxr = k[h] * (pr - qr) * half;  // B_x = dA/dy
            double bxi = k[h] * (pi - qi) * half;
            double byr = k[h] * ai;                // B_y = -i k A
            double byi = -k[h] * ar;
            force += bxr * byr + bxi * byi;        // Re(Bx conj(By))
        }
        return 2 * period * force / MU0;
    }
}
