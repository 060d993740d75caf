package coilwright.thermal;

import coilwright.validation.SolverFailedException;

import java.util.function.Function;

/**
 * Successive substitution of surface temperatures into the temperature-dependent coefficients (natural convection
 * grows as dT^(1/4), radiation as T^3), under-relaxed. Converges in a few tens of passes for these small networks.
 */
final class NetworkIteration {
    /** Largest change of any node between passes at convergence, K. */
    static final double TOLERANCE_K = 1e-4;
    static final int MAX_PASSES = 200;
    private static final double RELAXATION = 0.7;
    private static final double START_RISE_K = 10.0;

    record Result(ThermalNetwork network, double[] temperaturesC, int passes) {
    }

    private NetworkIteration() {
    }

    static Result solve(int nodes, Function<double[], ThermalNetwork> build, double[] heatW, double ambientC) {
        double[] guess = new double[nodes];
        java.util.Arrays.fill(guess, ambientC + START_RISE_K);
        for (int pass = 1; pass <= MAX_PASSES; pass++) {
            ThermalNetwork net = build.apply(guess);
            double[] t = net.solve(heatW, ambientC);
            double change = 0;
            for (int i = 0; i < nodes; i++) {
                change = Math.max(change, Math.abs(t[i] - guess[i]));
            }
            if (change < TOLERANCE_K) {
                return new Result(net, t, pass);
            }
            for (int i = 0; i < nodes; i++) {
                guess[i] += RELAXATION * (t[i] - guess[i]);
            }
        }
        throw new SolverFailedException("thermal network", "the surface-coefficient iteration did not settle within "
                + MAX_PASSES + " passes");
    }
}
