package coilwright.losses;

import coilwright.machine.Connection;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class DeltaCirculationTest {
    private final ZeroSequenceInductance distributed = ZeroSequenceInductance.distributed();

    @Test
    void star_has_no_circulating_current() {
        DeltaCirculation d = DeltaCirculation.at(Connection.STAR, 10, 0.11, 0.1, 1e-3, distributed, 12, 260);
        assertEquals(1.1, d.thirdHarmonicEmfRmsV(), 1e-12);
        assertEquals(0, d.currentRmsA());
        assertEquals(0, d.copperLossW());
        assertEquals(0, d.dragTorqueNm());
    }

    @Test
    void delta_current_by_hand() {
        // E3 = 0.11 x 10 V; f = 6 x 260 / 60 = 26 Hz; X0 = 3 x 2 pi x 26 x 0.2 x 1 mH = 0.09802 Ohm
        DeltaCirculation d = DeltaCirculation.at(Connection.DELTA, 10, 0.11, 0.1, 1e-3, distributed, 12, 260);
        double x0 = 3 * 2 * Math.PI * 26 * 0.2e-3;
        double i = 1.1 / Math.hypot(0.1, x0);
        assertEquals(i, d.currentRmsA(), 1e-9);
        assertEquals(3 * i * i * 0.1, d.copperLossW(), 1e-9);
        assertEquals(d.copperLossW() / (260 * Math.PI / 30), d.dragTorqueNm(), 1e-12);
        assertEquals(Math.hypot(0.1, x0), d.zeroSequenceImpedanceOhm(), 1e-12);
    }

    @Test
    void the_band_brackets_the_estimate() {
        DeltaCirculation d = DeltaCirculation.at(Connection.DELTA, 30, 0.05, 0.2, 3e-3, ZeroSequenceInductance.toothCoils(),
                20, 750);
        assertTrue(d.currentLowA() <= d.currentRmsA() && d.currentRmsA() <= d.currentHighA());
        assertTrue(d.copperLossHighW() >= d.copperLossW());
    }

    @Test
    void no_drag_at_standstill_and_inputs_are_checked() {
        assertEquals(0, DeltaCirculation.at(Connection.DELTA, 0, 0.1, 0.1, 1e-3, distributed, 12, 0).dragTorqueNm());
        assertThrows(InvalidInputException.class,
                () -> DeltaCirculation.at(Connection.DELTA, 10, 1.5, 0, 1e-3, distributed, 12, 100));
    }

    @Test
    void zero_sequence_estimates_follow_the_winding_type() {
        assertEquals(1.0, ZeroSequenceInductance.airCored().ratio());
        assertEquals(0.5, ZeroSequenceInductance.measured(0.5e-3, 1e-3).ratio(), 1e-12);
        assertThrows(InvalidInputException.class, () -> new ZeroSequenceInductance(0.5, 0.6, 0.9, "x"));
    }
}
