package coilwright.conductor;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class SlottedInductanceInputTest {

    @Test
    void effective_gap_adds_magnet_thickness_over_recoil_permeability() {
        assertEquals(1.05 * 0.001 + 0.005 / 1.05,
                SlottedInductanceInput.effectiveAirGapM(0.001, 1.05, 0.005, 1.05), 1e-15);
    }

    @Test
    void rejects_winding_factor_above_one_and_every_other_bad_field() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new SlottedInductanceInput(0, 0, 0, -1, 1.2, 0, 0, 0, 0, 0, -1, 0, -1, 3));
        assertEquals(14, e.errors().size());
        assertEquals("windingFactor = 1.2: must be > 0.0 and <= 1.0", e.errors().get(4).message());
    }

    @Test
    void rejects_a_carter_coefficient_below_one() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> SlottedInductanceInput.effectiveAirGapM(0.001, 0.9, 0.005, 1.05));
        assertEquals("carterCoefficient", e.errors().get(0).field());
    }
}
