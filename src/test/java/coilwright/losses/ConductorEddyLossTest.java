package coilwright.losses;

import coilwright.magnet.AxialDualRotor;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class ConductorEddyLossTest {
    static final AxialDualRotor ROTOR = new AxialDualRotor("N42", 0.04, 0.05, 0.16, 0.01, 0.018, 0.0015);
    static final double AWG14_M = 1.628e-3;

    private static double loss(int strands, double diameter, double rpm) {
        return ConductorEddyLoss.airCored(ROTOR, 16, 40, 12, 48, strands, diameter, rpm, 60).totalW();
    }

    @Test
    void strands_in_hand_of_the_same_copper_divide_the_loss_by_their_number() {
        double one = loss(1, AWG14_M, 300);
        assertEquals(one / 4, loss(4, AWG14_M / 2, 300), 1e-9 * one);
    }

    @Test
    void loss_grows_with_frequency_squared() {
        assertEquals(4 * loss(2, AWG14_M, 200), loss(2, AWG14_M, 400), 1e-9 * loss(2, AWG14_M, 400));
    }

    @Test
    void loss_per_copper_volume_grows_with_diameter_squared() {
        // same number of conductors: loss ~ d^4, copper ~ d^2
        double ratio = loss(1, 2e-3, 300) / loss(1, 1e-3, 300);
        assertEquals(16, ratio, 1e-9);
    }

    @Test
    void no_loss_at_standstill_and_the_fundamental_share_is_a_fraction() {
        assertEquals(0, loss(2, AWG14_M, 0));
        ConductorEddyLoss.AirCoredEddyLoss l = ConductorEddyLoss.airCored(ROTOR, 16, 40, 12, 48, 2, AWG14_M, 300, 60);
        assertTrue(l.fundamentalShare() > 0.3 && l.fundamentalShare() <= 1.0, "share " + l.fundamentalShare());
        assertTrue(l.thinAgainstSkinDepth());
    }

    @Test
    void hotter_copper_has_less_eddy_loss() {
        double cold = ConductorEddyLoss.airCored(ROTOR, 16, 40, 12, 48, 2, AWG14_M, 300, 20).totalW();
        double hot = ConductorEddyLoss.airCored(ROTOR, 16, 40, 12, 48, 2, AWG14_M, 300, 120).totalW();
        assertEquals(1 / (1 + 0.00393 * 100), hot / cold, 1e-9);
    }
}
