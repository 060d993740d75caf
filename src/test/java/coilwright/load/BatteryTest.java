package coilwright.load;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class BatteryTest {
    @Test
    void bank_voltage_is_cells_times_cell_voltage_of_the_stage() {
        assertEquals(24.0, Battery.of(Chemistry.LEAD_ACID, 12, ChargeStage.NOMINAL).voltageV(), 1e-12);
        assertEquals(28.8, Battery.of(Chemistry.LEAD_ACID, 12, ChargeStage.ABSORB).voltageV(), 1e-12);
        assertEquals(27.0, Battery.of(Chemistry.LEAD_ACID, 12, ChargeStage.FLOAT).voltageV(), 1e-12);
        assertEquals(51.2, Battery.of(Chemistry.LIFEPO4, 16, ChargeStage.NOMINAL).voltageV(), 1e-12);
        assertEquals(56.8, Battery.of(Chemistry.LIFEPO4, 16, ChargeStage.ABSORB).voltageV(), 1e-12);
    }

    @Test
    void custom_bank_uses_the_stated_voltage() {
        assertEquals(37.5, Battery.custom(37.5).voltageV(), 0.0);
    }

    @Test
    void rejects_invalid_fields_with_ranges() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> new Battery(Chemistry.CUSTOM, 0, 0, ChargeStage.NOMINAL, -1));
        String msg = e.getMessage();
        assertTrue(msg.contains("cells = 0: must be between 1 and 400"), msg);
        assertTrue(msg.contains("customVoltageV = 0.0: must be > 0.0 and <= 2000.0"), msg);
        assertTrue(msg.contains("internalResistanceOhm = -1.0"), msg);
        assertThrows(InvalidInputException.class, () -> new Battery(null, 4, 0, null, 0));
    }
}
