package coilwright.machine;

import coilwright.magnet.MagnetGrades;
import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class MeasuredVoltageConstantTest {

    @Test
    void a_constant_measured_in_a_workshop_falls_when_the_magnets_are_hot() {
        // N42: alphaBr -0.12 %/K; from 25 C to 80 C: (1 - 0.0012 x 60) / (1 - 0.0012 x 5) = 0.93360
        MeasuredVoltageConstant ke = new MeasuredVoltageConstant(0.1, 25);
        assertEquals(0.1 * 0.93360, ke.at(MagnetGrades.byName("N42"), 80), 1e-6);
        assertEquals(0.1, ke.at(MagnetGrades.byName("N42"), 25), 1e-15);
    }

    @Test
    void ferrite_loses_flux_faster_with_heat() {
        MeasuredVoltageConstant ke = new MeasuredVoltageConstant(0.1, 20);
        assertTrue(ke.at(MagnetGrades.byName("Ferrite Y30"), 80) < ke.at(MagnetGrades.byName("N42"), 80));
    }

    @Test
    void inputs_are_checked() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new MeasuredVoltageConstant(0, 200));
        assertEquals(2, e.errors().size());
    }
}
