package coilwright.winding;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class CoilTest {

    @Test
    void a_reversed_coil_is_labelled_with_a_minus_sign() {
        assertEquals("-B", new Coil(3, 3, 4, 1, -1).label());
        assertEquals("A", new Coil(1, 1, 2, 0, 1).label());
        assertEquals("C", new Coil(5, 5, 6, 2, 1).phaseName());
    }

    @Test
    void a_coil_with_a_polarity_other_than_plus_or_minus_one_is_refused() {
        assertThrows(IllegalArgumentException.class, () -> new Coil(1, 1, 2, 0, 0));
        assertThrows(IllegalArgumentException.class, () -> new Coil(0, 1, 2, 0, 1));
    }
}
