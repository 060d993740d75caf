package coilwright.system;

import coilwright.turbine.ParametricCp;
import coilwright.turbine.WindRotor;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** The matching rule checked against a textbook closed form. */
class TorqueMatchReferenceTest {

    @Test
    @DisplayName("A load torque K w^2 with K = 0.5 rho pi R^5 Cpmax / lambda_opt^3 holds a rotor at its optimum tip-speed "
            + "ratio at every wind speed (source: Burton, Jenkins, Sharpe & Bossanyi, Wind Energy Handbook, 2nd ed. 2011, "
            + "variable-speed optimal torque control, from memory)")
    void optimal_torque_law_holds_the_optimum_tip_speed_ratio() {
        double rho = 1.225;
        WindRotor rotor = new WindRotor(4.0, 3, new ParametricCp(0.45, 7.0), 0);
        double r = rotor.radiusM();
        double k = 0.5 * rho * Math.PI * Math.pow(r, 5) * 0.45 / Math.pow(7.0, 3); // N m s^2
        double[] grid = TorqueMatch.grid(rotor.freeSpinSpeedRpm(25), 240);
        for (double v = 3; v <= 25; v += 2.5) {
            double wind = v;
            double n = TorqueMatch.firstStableCrossingRpm(x -> rotor.torqueNm(wind, x, rho)
                    - k * Math.pow(x * Math.PI / 30, 2), grid, rotor.freeSpinSpeedRpm(wind));
            assertEquals(7.0, rotor.tipSpeedRatio(wind, n), 1e-7, "v = " + v);
            assertEquals(0.45, rotor.curve().cp(rotor.tipSpeedRatio(wind, n)), 1e-12);
        }
    }
}
