package coilwright.conductor;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class ThermalClassTest {

    @Test
    @DisplayName("IEC 60085 classes: A 105, E 120, B 130, F 155, H 180 C")
    void class_limits_are_those_of_iec_60085() {
        assertEquals(105, ThermalClass.A.limitC(), 0.0);
        assertEquals(120, ThermalClass.E.limitC(), 0.0);
        assertEquals(130, ThermalClass.B.limitC(), 0.0);
        assertEquals(155, ThermalClass.F.limitC(), 0.0);
        assertEquals(180, ThermalClass.H.limitC(), 0.0);
    }

    @Test
    void allows_up_to_and_including_the_limit() {
        assertTrue(ThermalClass.F.allows(155.0));
        assertFalse(ThermalClass.F.allows(156.0));
        assertEquals(25.0, ThermalClass.B.marginK(105.0), 1e-12);
        assertEquals(-10.0, ThermalClass.A.marginK(115.0), 1e-12);
    }

    @Test
    void rejects_nan_temperature() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> ThermalClass.H.allows(Double.NaN));
        assertEquals("windingTemperatureC", e.errors().get(0).field());
    }
}
