package coilwright.conductor;

import coilwright.validation.InvalidInputException;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class CopperTest {

    @Test
    void resistance_is_resistivity_times_length_over_area() {
        assertEquals(Copper.RESISTIVITY_20C_OHM_M * 2.0 / 1e-6, Copper.resistanceOhm(2.0, 1e-6, 20.0), 1e-15);
    }

    @Test
    void mass_uses_the_iec_density() {
        assertEquals(8.89, Copper.massKg(1e-3), 1e-12);
    }

    @Property
    void resistance_is_positive_and_rises_with_temperature(
            @ForAll @DoubleRange(min = -50, max = 249) double t,
            @ForAll @DoubleRange(min = 0.01, max = 100) double lengthM) {
        double r1 = Copper.resistanceOhm(lengthM, 1e-6, t);
        double r2 = Copper.resistanceOhm(lengthM, 1e-6, t + 1.0);
        assertTrue(r1 > 0 && r2 > r1);
    }

    @Test
    void rejects_nan_temperature_naming_the_field() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> Copper.resistanceRatio(Double.NaN));
        assertEquals("temperatureC", e.errors().get(0).field());
        assertEquals("-50.0 to 250.0", e.errors().get(0).allowed());
    }

    @Test
    void rejects_temperature_outside_minus_50_to_250() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> Copper.resistivityOhmM(300.0));
        assertEquals("temperatureC = 300.0: must be between -50.0 and 250.0", e.getMessage());
        assertThrows(InvalidInputException.class, () -> Copper.resistivityOhmM(-60.0));
    }

    @Test
    void rejects_non_positive_length_and_area_together() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> Copper.resistanceOhm(0, -1, 20));
        assertEquals(2, e.errors().size());
    }
}
