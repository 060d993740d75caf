package coilwright.winding;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class LayersTest {

    @Test
    void a_double_layer_has_a_coil_per_slot_and_a_single_layer_one_per_two_slots() {
        assertEquals(12, Layers.DOUBLE.coilCount(12));
        assertEquals(6, Layers.SINGLE.coilCount(12));
        assertEquals(2, Layers.DOUBLE.sidesPerSlot());
        assertEquals(1, Layers.SINGLE.sidesPerSlot());
    }
}
