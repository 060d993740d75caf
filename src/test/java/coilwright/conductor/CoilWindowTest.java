package coilwright.conductor;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class CoilWindowTest {

    @Test
    void double_layer_side_gets_half_the_slot_inside_the_liner() {
        CoilWindow w = CoilWindow.slottedDoubleLayer(100e-6, 10e-6);
        assertEquals(45e-6, w.areaM2(), 1e-15);
        assertEquals(CoilWindow.Kind.SLOTTED, w.kind());
    }

    @Test
    void single_layer_side_gets_the_whole_slot_inside_the_liner() {
        assertEquals(90e-6, CoilWindow.slottedSingleLayer(100e-6, 10e-6).areaM2(), 1e-15);
    }

    @Test
    void air_cored_leg_is_width_times_thickness() {
        CoilWindow w = CoilWindow.airCored(0.02, 0.012);
        assertEquals(2.4e-4, w.areaM2(), 1e-15);
        assertEquals(CoilWindow.Kind.AIR_CORED, w.kind());
    }

    @Test
    void rejects_a_liner_as_large_as_the_slot() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> CoilWindow.slottedDoubleLayer(50e-6, 50e-6));
        assertEquals("linerAreaM2", e.errors().get(0).field());
    }

    @Test
    void rejects_non_positive_sizes() {
        assertThrows(InvalidInputException.class, () -> CoilWindow.airCored(0, 0.01));
        assertThrows(InvalidInputException.class, () -> new CoilWindow(-1, CoilWindow.Kind.SLOTTED));
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new CoilWindow(1e-4, null));
        assertEquals("kind", e.errors().get(0).field());
    }
}
