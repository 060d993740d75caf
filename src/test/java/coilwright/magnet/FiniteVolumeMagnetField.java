package coilwright.magnet;

import java.util.ArrayList;
import java.util.List;

/**
 * Test-only reference solver: 2-D linear magnetostatics of an alternating magnet array between infinitely
 * permeable iron surfaces, solved on a square finite-volume grid for the magnetic scalar potential
 * (B = mu H + Br, H = -grad phi, div B = 0; units with mu0 = 1) by successive over-relaxation.
 * Domain: x from the pole centre (symmetry, d phi/dx = 0) to the interpolar line (phi = 0 by antisymmetry),
 * y between two iron surfaces (phi = 0). Magnets are magnetised in +y.
 */
final class FiniteVolumeMagnetField {
    private final double hM;
    private final int nx;
    private final int ny;
    private final double[][] phi; // [i][j], i = 0..nx (phi = 0 at nx), j = 0..ny (phi = 0 at 0 and ny)
    private final double[][] muY; // y-face (i, j+1/2): permeability
    private final double[][] brY; // y-face (i, j+1/2): remanence times magnet overlap length / face width
    private final double[][] muX; // x-face (i+1/2, j)

    private FiniteVolumeMagnetField(double hM, int nx, int ny) {
        this.hM = hM;
        this.nx = nx;
        this.ny = ny;
        phi = new double[nx + 1][ny + 1];
        muY = new double[nx + 1][ny];
        brY = new double[nx + 1][ny];
        muX = new double[nx][ny + 1];
    }

    /** Magnet on iron (y from 0 to lm) facing iron across the gap g. */
    static FiniteVolumeMagnetField singleSided(double brT, double mu, double alpha, double tauM, double lmM,
                                               double gM, double hM, boolean recoilMaterialBetweenMagnets) {
        FiniteVolumeMagnetField f = new FiniteVolumeMagnetField(hM, cells(tauM / 2, hM), cells(lmM + gM, hM));
        f.fill(List.of(new double[] {0, lmM}), brT, mu, alpha * tauM / 2, recoilMaterialBetweenMagnets);
        f.solve();
        return f;
    }

    /** Two magnet discs on iron, magnetised the same way (N facing S), with a total gap between the faces. */
    static FiniteVolumeMagnetField dual(double brT, double mu, double alpha, double tauM, double lmM, double gapM,
                                       double hM) {
        FiniteVolumeMagnetField f = new FiniteVolumeMagnetField(hM, cells(tauM / 2, hM), cells(2 * lmM + gapM, hM));
        f.fill(List.of(new double[] {0, lmM}, new double[] {lmM + gapM, 2 * lmM + gapM}), brT, mu,
                alpha * tauM / 2, true);
        f.solve();
        return f;
    }

    private static int cells(double lengthM, double hM) {
        int n = (int) Math.round(lengthM / hM);
        if (Math.abs(n * hM - lengthM) > 1e-9 * lengthM) {
            throw new IllegalArgumentException("grid step must divide " + lengthM);
        }
        return n;
    }

    private void fill(List<double[]> magnetBands, double brT, double mu, double magnetHalfWidthM,
                      boolean recoilBetween) {
        List<double[]> bands = new ArrayList<>(magnetBands);
        for (int j = 0; j < ny; j++) {
            double yMid = (j + 0.5) * hM;
            boolean magnetBand = bands.stream().anyMatch(b -> yMid > b[0] && yMid < b[1]);
            for (int i = 0; i <= nx; i++) {
                double lo = Math.max(0, (i - 0.5) * hM);
                double hi = Math.min(nx * hM, (i + 0.5) * hM);
                double overlap = Math.max(0, Math.min(hi, magnetHalfWidthM) - lo);
                double fraction = overlap / (hi - lo);
                muY[i][j] = !magnetBand ? 1.0 : recoilBetween ? mu : 1.0 + (mu - 1.0) * fraction;
                brY[i][j] = magnetBand ? brT * fraction : 0.0;
            }
        }
        for (int i = 0; i < nx; i++) {
            double xFace = (i + 0.5) * hM;
            for (int j = 0; j <= ny; j++) {
                double below = j > 0 ? bandMu(bands, (j - 0.5) * hM, xFace, mu, magnetHalfWidthM, recoilBetween) : 1;
                double above = j < ny ? bandMu(bands, (j + 0.5) * hM, xFace, mu, magnetHalfWidthM, recoilBetween) : 1;
                muX[i][j] = 0.5 * (below + above);
            }
        }
    }

    private static double bandMu(List<double[]> bands, double y, double x, double mu, double halfWidthM,
                                 boolean recoilBetween) {
        boolean magnetBand = bands.stream().anyMatch(b -> y > b[0] && y < b[1]);
        return magnetBand && (recoilBetween || x < halfWidthM) ? mu : 1.0;
    }

    private void solve() {
        double omega = 2.0 / (1.0 + Math.sin(Math.PI / Math.max(2 * nx, ny)));
        for (int sweep = 0; sweep < 200_000; sweep++) {
            double maxChange = 0;
            for (int i = 0; i < nx; i++) {
                double w = i == 0 ? 0.5 : 1.0; // width of the control volume in x, in grid steps
                for (int j = 1; j < ny; j++) {
                    double aE = muX[i][j];
                    double aW = i == 0 ? 0.0 : muX[i - 1][j];
                    double aN = muY[i][j] * w;
                    double aS = muY[i][j - 1] * w;
                    double source = (brY[i][j - 1] - brY[i][j]) * w * hM;
                    double west = i == 0 ? 0.0 : phi[i - 1][j];
                    double target = (aE * phi[i + 1][j] + aW * west + aN * phi[i][j + 1] + aS * phi[i][j - 1] + source)
                            / (aE + aW + aN + aS);
                    double change = omega * (target - phi[i][j]);
                    phi[i][j] += change;
                    maxChange = Math.max(maxChange, Math.abs(change));
                }
            }
            if (maxChange < 1e-13) {
                return;
            }
        }
        throw new IllegalStateException("SOR did not converge");
    }

    /** B_y on the y-face row between nodes j and j+1 at node column i, T. */
    private double by(int i, int j) {
        return -muY[i][j] * (phi[i][j + 1] - phi[i][j]) / hM + brY[i][j];
    }

    /** Quarter-wave Fourier fundamental of B_y along a face row: (4/tau) * integral over half a pole pitch. */
    private double fundamentalOfRow(int j) {
        double tauM = 2 * nx * hM;
        double sum = 0;
        for (int i = 0; i <= nx; i++) {
            double weight = i == 0 || i == nx ? 0.5 : 1.0;
            sum += weight * by(i, j) * Math.cos(Math.PI * i * hM / tauM);
        }
        return 4.0 / tauM * sum * hM;
    }

    /** Fundamental at the top iron surface, taken on the last face row (half a step below it). */
    double fundamentalAtTopIronT() {
        return fundamentalOfRow(ny - 1);
    }

    double poleCentreAtTopIronT() {
        return by(0, ny - 1);
    }

    /** Fundamental on the face row nearest to height {@code yM} above the bottom iron. */
    double fundamentalAtHeightT(double yM) {
        int j = (int) Math.floor(yM / hM - 0.5 + 1e-9);
        double y0 = (j + 0.5) * hM;
        double f0 = fundamentalOfRow(j);
        double f1 = fundamentalOfRow(j + 1);
        return f0 + (f1 - f0) * (yM - y0) / hM;
    }

    /** Fundamental averaged over the face rows whose centres lie between two heights (midpoint rule). */
    double fundamentalAveragedT(double fromM, double toM) {
        double sum = 0;
        int count = 0;
        for (int j = 0; j < ny; j++) {
            double y = (j + 0.5) * hM;
            if (y > fromM && y < toM) {
                sum += fundamentalOfRow(j);
                count++;
            }
        }
        return sum / count;
    }
}
