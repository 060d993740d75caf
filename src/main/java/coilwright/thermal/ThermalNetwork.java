package coilwright.thermal;

import java.util.ArrayList;
import java.util.List;

/**
 * A steady-state lumped thermal network: nodes joined by thermal conductances (W/K), some joined to the ambient
 * air, with heat injected at nodes. Solved as the linear system G (T - T_amb) = Q (the nodal method of lumped
 * thermal models, e.g. Mellor, Roberts &amp; Turner, IEE Proc. B 138(5), 1991). With every conductance &gt;= 0 and a
 * path to ambient from every node the matrix is an M-matrix, so each temperature rise grows with every heat input.
 */
public final class ThermalNetwork {
    /** A pivot below this conductance, W/K, makes the network singular (as Commons Math's LU threshold did). */
    private static final double SINGULAR_PIVOT = 1e-14;
    private final List<String> names = new ArrayList<>();
    private final List<double[]> links = new ArrayList<>(); // {i, j, G}; j = -1 means ambient

    /** Adds a node and returns its index. */
    public int node(String name) {
        names.add(name);
        return names.size() - 1;
    }

    /** Joins two nodes by a conductance, W/K (&gt;= 0; 0 adds nothing). */
    public ThermalNetwork link(int a, int b, double conductanceWPerK) {
        checkConductance(conductanceWPerK);
        links.add(new double[]{a, b, conductanceWPerK});
        return this;
    }

    /** Joins a node to the ambient air by a conductance, W/K (&gt;= 0). */
    public ThermalNetwork toAmbient(int a, double conductanceWPerK) {
        checkConductance(conductanceWPerK);
        links.add(new double[]{a, -1, conductanceWPerK});
        return this;
    }

    /** Node names in index order. */
    public List<String> names() {
        return List.copyOf(names);
    }

    /**
     * Node temperatures for heat inputs.
     *
     * @param heatW    heat injected per node, W, &gt;= 0 (length = number of nodes)
     * @param ambientC ambient air temperature, C
     * @return temperature per node, C
     * @throws IllegalStateException when some node has no path to ambient (singular network)
     */
    public double[] solve(double[] heatW, double ambientC) {
        int n = names.size();
        if (heatW.length != n) {
            throw new IllegalArgumentException("heatW has " + heatW.length + " entries for " + n + " nodes");
        }
        double[][] g = new double[n][n];
        for (double[] l : links) {
            int a = (int) l[0];
            int b = (int) l[1];
            g[a][a] += l[2];
            if (b >= 0) {
                g[b][b] += l[2];
                g[a][b] -= l[2];
                g[b][a] -= l[2];
            }
        }
        double[] rise = heatW.clone();
        if (!eliminate(g, rise)) {
            throw new IllegalStateException("thermal network " + names + " has a node with no path to ambient");
        }
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = ambientC + rise[i];
        }
        return t;
    }

    /**
     * Solves g x = b in place (b becomes x) by Gaussian elimination with partial pivoting, the LU decomposition
     * written out for the handful of nodes of these networks.
     *
     * @return false when a pivot falls below {@link #SINGULAR_PIVOT} (some node has no path to ambient)
     */
    private static boolean eliminate(double[][] g, double[] b) {
        int n = b.length;
        for (int col = 0; col < n; col++) {
            int pivot = col;
            for (int row = col + 1; row < n; row++) {
                if (Math.abs(g[row][col]) > Math.abs(g[pivot][col])) {
                    pivot = row;
                }
            }
            if (!(Math.abs(g[pivot][col]) >= SINGULAR_PIVOT)) {
                return false;
            }
            if (pivot != col) {
                double[] row = g[pivot];
                g[pivot] = g[col];
                g[col] = row;
                double v = b[pivot];
                b[pivot] = b[col];
                b[col] = v;
            }
            for (int row = col + 1; row < n; row++) {
                double factor = g[row][col] / g[col][col];
                if (factor != 0) {
                    for (int k = col; k < n; k++) {
                        g[row][k] -= factor * g[col][k];
                    }
                    b[row] -= factor * b[col];
                }
            }
        }
        for (int row = n - 1; row >= 0; row--) {
            double sum = b[row];
            for (int k = row + 1; k < n; k++) {
                sum -= g[row][k] * b[k];
            }
            b[row] = sum / g[row][row];
        }
        return true;
    }

    /** Heat leaving to ambient for a solution, W (equals the total heat input at steady state). */
    public double heatToAmbientW(double[] temperaturesC, double ambientC) {
        double sum = 0;
        for (double[] l : links) {
            if (l[1] < 0) {
                sum += l[2] * (temperaturesC[(int) l[0]] - ambientC);
            }
        }
        return sum;
    }

    private static void checkConductance(double g) {
        if (!(g >= 0) || !Double.isFinite(g)) {
            throw new IllegalArgumentException("conductance = " + g + " W/K: must be finite and >= 0");
        }
    }
}
