package coilwright.cogging;

import coilwright.magnet.RotorSide;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

class CoggingMemoTest {
    private static CoggingInput machine(double openingM) {
        return new CoggingInput(24, 20, RotorSide.INNER, 0.14, 0.08, 0.001, 0.004, 0.8, openingM, 1.25, 1.05, 0);
    }

    @Test
    void the_same_machine_is_answered_from_memory_and_another_machine_is_not() {
        CoggingTorque first = CoggingCalculator.radial(machine(0.0025));
        assertSame(first, CoggingCalculator.radial(machine(0.0025)));
        CoggingTorque other = CoggingCalculator.radial(machine(0.003));
        assertEquals(false, other.peakToPeakNm() == first.peakToPeakNm(), "a different opening is not a memory hit");
    }
}
