package coilwright.conductor;

import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class FillCheckTest {
    private final WireSpec wire = WireSpec.metric(1.0e-3, 2); // overall 1.094 mm

    @Test
    void fills_are_the_turn_areas_over_the_window() {
        CoilWindow window = CoilWindow.airCored(0.02, 0.01);
        FillCheck f = FillCheck.of(100, wire, window);
        assertEquals(100 * Math.PI / 4 * 1e-6 / 2e-4, f.copperFill(), 1e-12);
        assertEquals(100 * Math.PI / 4 * 1.094e-3 * 1.094e-3 / 2e-4, f.wireFill(), 1e-9);
        assertEquals(FillCheck.Level.OK, f.level());
        assertEquals(FillCheck.Basis.WIRE_FILL, f.basis());
    }

    @Test
    void air_cored_coil_above_sixty_percent_wire_fill_is_high() {
        CoilWindow window = CoilWindow.airCored(0.02, 0.01);
        FillCheck f = FillCheck.of(140, wire, window);
        assertTrue(f.wireFill() > 0.6 && f.wireFill() < Math.PI / 4);
        assertEquals(FillCheck.Level.HIGH, f.level());
    }

    @Test
    void slotted_window_is_judged_on_copper_fill() {
        CoilWindow window = CoilWindow.slottedSingleLayer(100e-6, 0);
        FillCheck ok = FillCheck.of(50, wire, window);
        FillCheck high = FillCheck.of(60, wire, window);
        assertEquals(FillCheck.Basis.COPPER_FILL, ok.basis());
        assertEquals(FillCheck.Level.OK, ok.level());
        assertEquals(FillCheck.Level.HIGH, high.level());
        assertEquals(0.45, high.practicalLimit(), 0.0);
    }

    @Test
    void more_wire_than_square_packing_allows_cannot_fit_and_is_refused() {
        CoilWindow window = CoilWindow.airCored(0.01, 0.01);
        FillCheck f = FillCheck.of(90, wire, window);
        assertEquals(FillCheck.Level.CANNOT_FIT, f.level());
        InfeasibleDesignException e = assertThrows(InfeasibleDesignException.class, f::requireFits);
        assertEquals("wire", e.field());
        assertTrue(e.getMessage().contains("do not fit"));
        FillCheck fits = FillCheck.of(80, wire, window);
        assertSame(fits, fits.requireFits());
    }

    @Test
    void strands_in_hand_count_in_the_fill() {
        CoilWindow window = CoilWindow.airCored(0.02, 0.01);
        assertEquals(3 * FillCheck.of(20, wire, window).copperFill(),
                FillCheck.of(20, wire.withStrands(3), window).copperFill(), 1e-12);
    }

    @Test
    void max_turns_is_the_largest_count_within_the_packing_limit() {
        CoilWindow window = CoilWindow.airCored(0.02, 0.01);
        int n = FillCheck.maxTurnsThatFit(window, wire, 0.55);
        assertTrue(FillCheck.of(n, wire, window).wireFill() <= 0.55);
        assertTrue(FillCheck.of(n + 1, wire, window).wireFill() > 0.55);
    }

    @Test
    void rejects_packing_limit_above_square_packing_and_zero_turns() {
        CoilWindow window = CoilWindow.airCored(0.02, 0.01);
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> FillCheck.maxTurnsThatFit(window, wire, 0.9));
        assertEquals("packingLimit", e.errors().get(0).field());
        assertThrows(InvalidInputException.class, () -> FillCheck.of(0, wire, window));
        assertThrows(InvalidInputException.class, () -> FillCheck.of(10, null, window));
    }
}
