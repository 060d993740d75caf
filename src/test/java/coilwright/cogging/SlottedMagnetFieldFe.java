package coilwright.cogging;

/**
 * Test-only reference: 2-D linear magnetostatics of a magnet array on infinitely permeable iron moving under an
 * infinitely permeable slotted stator, unrolled into a periodic strip (curvature ignored). Bilinear finite elements on
 * square cells for the magnetic scalar potential (B = mu0 mu_r H + Br, H = -grad phi; phi = 0 on all iron, which is
 * allowed because the section holds whole pole pairs), solved by successive over-relaxation. The field minimises
 * J(phi) = integral of (mu0 mu_r |grad phi|^2 / 2 - Br . grad phi); at the solution J = -f.phi / 2, and the
 * tangential force on the rotor per unit depth is dJ/dx (virtual work), from which the cogging force follows.
 * All lengths are whole numbers of cells.
 */
final class SlottedMagnetFieldFe {
    private static final double MU0 = 4e-7 * Math.PI;
    private final int nx; // nodes per period in x (periodic)
    private final int ny; // node rows 0..ny
    private final double h;
    private final int magnetCells;
    private final int gapCells;
    private final int slotPitchCells;
    private final int openingCells;
    private final int slotDepthCells;
    private final int polePitchCells;
    private final int magnetWidthCells;
    private final double br;
    private final double mu;
    private final double[][] phi;

    /**
     * @param slotsPerPeriod  slots in the periodic section
     * @param polesPerPeriod  poles in the section (even)
     */
    SlottedMagnetFieldFe(double cellM, int slotsPerPeriod, int slotPitchCells, int openingCells, int slotDepthCells,
                         int polesPerPeriod, int magnetWidthCells, int magnetCells, int gapCells, double brT,
                         double mu) {
        this.h = cellM;
        this.slotPitchCells = slotPitchCells;
        this.openingCells = openingCells;
        this.slotDepthCells = slotDepthCells;
        this.magnetCells = magnetCells;
        this.gapCells = gapCells;
        this.magnetWidthCells = magnetWidthCells;
        this.nx = slotsPerPeriod * slotPitchCells;
        if (nx % polesPerPeriod != 0 || polesPerPeriod % 2 != 0) {
            throw new IllegalArgumentException("the period must hold an even number of whole poles");
        }
        this.polePitchCells = nx / polesPerPeriod;
        this.ny = magnetCells + gapCells + slotDepthCells;
        this.br = brT;
        this.mu = mu;
        this.phi = new double[nx][ny + 1];
    }

    int cellsPerSlotPitch() {
        return slotPitchCells;
    }

    int periodCells() {
        return nx;
    }

    /** Air cell (i, j) of the stator region? Slot openings are centred at x = k * slotPitch. */
    private boolean iron(int i, int j) {
        if (j < magnetCells + gapCells) {
            return false;
        }
        int within = Math.floorMod(i + openingCells / 2, slotPitchCells);
        return within >= openingCells; // cells 0..opening-1 (shifted) are the opening
    }

    /** Remanence (+-Br or 0) of cell (i, j) with the magnet pattern shifted by {@code shift} cells. */
    private double remanence(int i, int j, int shift) {
        if (j >= magnetCells) {
            return 0;
        }
        int x = Math.floorMod(i - shift + magnetWidthCells / 2, 2 * polePitchCells);
        if (x < magnetWidthCells) {
            return br;
        }
        int y = x - polePitchCells;
        return y >= 0 && y < magnetWidthCells ? -br : 0;
    }

    private boolean fixedNode(int i, int j) {
        if (j == 0 || j == ny) {
            return true;
        }
        for (int di = -1; di <= 0; di++) {
            for (int dj = -1; dj <= 0; dj++) {
                int ci = Math.floorMod(i + di, nx);
                int cj = j + dj;
                if (cj >= 0 && cj < ny && iron(ci, cj)) {
                    return true;
                }
            }
        }
        return false;
    }

    /** Solves for one rotor shift and returns J per unit depth, J/m. */
    double energy(int shift, double tolerance) {
        double[][] f = new double[nx][ny + 1];
        double[][] coeff = new double[nx][ny]; // mu0 mu_r per cell (air 1, magnet mu)
        for (int i = 0; i < nx; i++) {
            for (int j = 0; j < ny; j++) {
                double b = remanence(i, j, shift);
                coeff[i][j] = MU0 * (j < magnetCells ? mu : 1.0);
                if (b != 0) {
                    int i1 = (i + 1) % nx;
                    f[i][j] -= b * h / 2;
                    f[i1][j] -= b * h / 2;
                    f[i1][j + 1] += b * h / 2;
                    f[i][j + 1] += b * h / 2;
                }
            }
        }
        boolean[][] fixed = new boolean[nx][ny + 1];
        for (int i = 0; i < nx; i++) {
            for (int j = 0; j <= ny; j++) {
                fixed[i][j] = fixedNode(i, j);
                if (fixed[i][j]) {
                    phi[i][j] = 0;
                }
            }
        }
        double omega = 1.9;
        for (int sweep = 0; sweep < 200_000; sweep++) {
            double maxChange = 0;
            double maxPhi = 1e-30;
            for (int i = 0; i < nx; i++) {
                int im = Math.floorMod(i - 1, nx);
                int ip = (i + 1) % nx;
                for (int j = 1; j < ny; j++) {
                    if (fixed[i][j]) {
                        continue;
                    }
                    // cells around node (i,j): (im,j-1) (i,j-1) (im,j) (i,j)
                    double a1 = coeff[im][j - 1];
                    double a2 = coeff[i][j - 1];
                    double a3 = coeff[im][j];
                    double a4 = coeff[i][j];
                    double diag = 4 * (a1 + a2 + a3 + a4) / 6;
                    double off = -(a1 * (phi[im][j] + phi[i][j - 1] + 2 * phi[im][j - 1])
                            + a2 * (phi[ip][j] + phi[i][j - 1] + 2 * phi[ip][j - 1])
                            + a3 * (phi[im][j] + phi[i][j + 1] + 2 * phi[im][j + 1])
                            + a4 * (phi[ip][j] + phi[i][j + 1] + 2 * phi[ip][j + 1])) / 6;
                    double target = (f[i][j] - off) / diag;
                    double change = omega * (target - phi[i][j]);
                    phi[i][j] += change;
                    maxChange = Math.max(maxChange, Math.abs(change));
                    maxPhi = Math.max(maxPhi, Math.abs(phi[i][j]));
                }
            }
            if (maxChange < tolerance * maxPhi) {
                break;
            }
        }
        double fphi = 0;
        for (int i = 0; i < nx; i++) {
            for (int j = 0; j <= ny; j++) {
                fphi += f[i][j] * phi[i][j];
            }
        }
        return -0.5 * fphi;
    }
}
