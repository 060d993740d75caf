package coilwright.load;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The exact Jacobian of the periodic residual (segment state transitions and event saltations) against central
 * differences of the residual itself, near the periodic solution of circuits in each conduction regime.
 * <p>
 * Tolerance: a central difference with step h has truncation error h^2 |F'''| / 6 and rounding error
 * (residual noise) / h. With h = 1e-5 of the current scale, the noise at 1e-13 of the waveforms' coefficient sums
 * and curvature over the current scale, both stay below 1e-6 of the Jacobian's scale (its entries are of order 1);
 * a wrong saltation term or a missing projection changes entries by order 1e-2 or more.
 */
class BridgeNewtonTest {
    private static final double RELATIVE_STEP = 1e-5;
    private static final double AGREEMENT = 1e-6;

    private static BridgeCircuit circuit(boolean three, double e, double f, double r, double l, double vb, double vd,
                                         double rdc, double rcab, double rint) {
        return new BridgeCircuit(three ? BridgeType.THREE_PHASE_BRIDGE : BridgeType.SINGLE_PHASE_BRIDGE,
                e, f, r, rcab, l, vb, vd, rdc, rint);
    }

    @Test
    void the_exact_jacobian_agrees_with_central_differences_in_every_conduction_regime() {
        BridgeCircuit[] circuits = {
                circuit(true, 100, 50, 0.2, 0.002, 24, 0.8, 0.05, 0, 0),      // overlap, DC resistance
                circuit(true, 30, 80, 0.5, 0.004, 24, 0.8, 0.3, 0.1, 0.02),     // overlap, resistive DC side
                circuit(true, 400, 200, 0.05, 1e-3, 48, 1, 0, 0.01, 0),        // heavy overlap, ideal battery
                circuit(false, 40, 50, 0.3, 0.01, 24, 0.8, 0.1, 0.05, 0.01),   // single-phase, continuous
                circuit(false, 19, 50, 0.3, 0.002, 24, 0.8, 0, 0, 0)};         // single-phase, discontinuous
        for (BridgeCircuit c : circuits) {
            BridgeModel model = new BridgeModel(c);
            SymmetryIntervalTrace periodic = BridgeSolver.periodic(model);
            int n = model.branches - 1;
            double anchor = periodic.startTimeS;
            double[] y = java.util.Arrays.copyOf(periodic.stateAtAngle(model.omega * anchor, model.omega), n);
            double[][] exact = BridgeNewton.exactJacobian(model, anchor, y);
            double h = RELATIVE_STEP * model.currentScaleA();
            for (int j = 0; j < n; j++) {
                double[] plus = y.clone();
                double[] minus = y.clone();
                plus[j] += h;
                minus[j] -= h;
                double[] rPlus = new BridgeNewton.Residual(model, anchor, plus).value;
                double[] rMinus = new BridgeNewton.Residual(model, anchor, minus).value;
                for (int i = 0; i < n; i++) {
                    double difference = (rPlus[i] - rMinus[i]) / (2 * h);
                    int row = i;
                    int column = j;
                    assertEquals(difference, exact[i][j], AGREEMENT, () -> "d r" + row + " / d y" + column + " for " + c);
                }
            }
        }
    }

    @Test
    void in_discontinuous_conduction_the_map_forgets_its_start_so_the_jacobian_is_minus_the_identity() {
        BridgeModel model = new BridgeModel(circuit(false, 19, 50, 0.3, 0.002, 24, 0.8, 0, 0, 0));
        double[][] exact = BridgeNewton.exactJacobian(model, 0, new double[] {0.01});
        assertEquals(-1, exact[0][0], 0.0);
    }

    @Test
    void newton_with_the_exact_jacobian_converges_from_the_fixed_point_guess_within_a_few_steps() {
        BridgeModel model = new BridgeModel(circuit(true, 100, 50, 0.2, 0.002, 24, 0.8, 0.05, 0, 0));
        SymmetryIntervalTrace periodic = BridgeSolver.periodic(model);
        double[] y = java.util.Arrays.copyOf(periodic.stateAtAngle(model.omega * periodic.startTimeS, model.omega), 2);
        double[] start = {y[0] * 1.01, y[1] * 0.99};
        double[] residual = new BridgeNewton.Residual(model, periodic.startTimeS, start).value;
        double before = Math.max(Math.abs(residual[0]), Math.abs(residual[1]));
        double[][] jac = BridgeNewton.exactJacobian(model, periodic.startTimeS, start);
        double det = jac[0][0] * jac[1][1] - jac[0][1] * jac[1][0];
        double[] next = {start[0] - (residual[0] * jac[1][1] - jac[0][1] * residual[1]) / det,
                start[1] - (jac[0][0] * residual[1] - jac[1][0] * residual[0]) / det};
        double[] after = new BridgeNewton.Residual(model, periodic.startTimeS, next).value;
        // quadratic convergence: a 1 % error leaves a residual of order 1e-4 of the first, a chord far more
        assertTrue(Math.max(Math.abs(after[0]), Math.abs(after[1])) < 1e-3 * before,
                "one Newton step from 1 %: " + before + " -> " + java.util.Arrays.toString(after));
    }
}
