package coilwright.turbine;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class StartingTorqueReferenceTest {

    @Test
    @DisplayName("Wood (2001): Q = rho U^2 B integral c r sin(theta) cos(theta) dr; a flat blade of constant chord and pitch by hand")
    void wood_chord_pitch_integral_by_hand() {
        // source: Wood, Wind Engineering 25(2), 2001; three blades, c = 0.1 m, theta = 20 deg, from r = 0.1 to 1 m:
        // integral = 0.1 sin20 cos20 (1 - 0.01) / 2 = 0.0159; Q at 5 m/s, 1.225 kg/m3 = 1.225 x 25 x 3 x 0.0159 = 1.462 N m
        double integral = 0.1 * Math.sin(Math.toRadians(20)) * Math.cos(Math.toRadians(20)) * (1 - 0.01) / 2;
        double cq0 = StartingTorque.fromChordPitchIntegral(3, 1.0, integral);
        WindRotor rotor = new WindRotor(2.0, 3, new ParametricCp(0.4, 6), 0);
        assertEquals(1.225 * 25 * 3 * integral, rotor.standstillTorqueNm(5, 1.225, cq0), 1e-9);
        assertEquals(1.462, rotor.standstillTorqueNm(5, 1.225, cq0), 0.001);
    }

    @Test
    @DisplayName("Glauert optimum blade (Manwell et al. 2009, 3.8): chord c = 8 pi r (1 - cos phi)/(B C_L), phi = (2/3) atan(1/lambda_r)")
    void optimum_blade_integrand_by_midpoint_rule() {
        // source: Manwell, McGowan & Rogers, Wind Energy Explained, 2nd ed., section 3.8 (from memory); an independent
        // midpoint-rule integration of the same chord and pitch agrees with the Gauss integral within 0.1 %
        int b = 3;
        double tsr = 6;
        double cl = 1.0;
        double alpha = Math.toRadians(5);
        int n = 20_000;
        double sum = 0;
        for (int i = 0; i < n; i++) {
            double x = 0.1 + (i + 0.5) * 0.9 / n;
            double phi = 2.0 / 3 * Math.atan(1 / (tsr * x));
            double c = 8 * Math.PI * x * (1 - Math.cos(phi)) / (b * cl);
            double theta = phi - alpha;
            sum += c * x * Math.sin(theta) * Math.cos(theta) * 0.9 / n;
        }
        double expected = 2 * b * sum / Math.PI;
        assertEquals(expected, StartingTorque.optimumBlade(b, tsr), 0.001 * expected);
    }

    @Test
    @DisplayName("Slender high-speed blades start far worse than the low end of a parametric Cp curve suggests (Wright & Wood 2004)")
    void high_speed_blades_have_little_starting_torque() {
        // source: Wright & Wood, J. Wind Eng. Ind. Aerodyn. 92, 2004: starting torque comes mostly from the root and is
        // small for blades designed for high tip-speed ratios
        double blade = StartingTorque.optimumBlade(3, 7);
        double curve = StartingTorque.fromCurve(new ParametricCp(0.42, 7));
        assertTrue(blade < curve / 4, blade + " vs " + curve);
        assertTrue(StartingTorque.optimumBlade(3, 4) > 3 * blade, "lower design tip-speed ratio: wider, steeper root");
    }
}
