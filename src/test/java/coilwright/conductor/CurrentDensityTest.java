package coilwright.conductor;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class CurrentDensityTest {

    @Test
    void density_is_current_over_area_in_both_units() {
        CurrentDensity j = CurrentDensity.check(10.0, 2e-6, Cooling.OPEN_VENTILATED);
        assertEquals(5e6, j.densityAPerM2(), 1e-6);
        assertEquals(5.0, j.densityAPerMm2(), 1e-12);
        assertEquals(4.0, j.bandLowAPerMm2(), 0.0);
        assertEquals(6.0, j.bandHighAPerMm2(), 0.0);
        assertEquals(CurrentDensity.Status.OK, j.status());
    }

    @Test
    void above_the_band_of_an_enclosed_machine_is_flagged() {
        CurrentDensity j = CurrentDensity.check(10.0, 2e-6, Cooling.ENCLOSED_NATURAL);
        assertEquals(CurrentDensity.Status.ABOVE_BAND, j.status());
        assertEquals(Cooling.ENCLOSED_NATURAL, j.cooling());
    }

    @Test
    void every_cooling_band_is_ordered_and_better_cooling_allows_more() {
        for (Cooling c : Cooling.values()) {
            assertTrue(c.lowAPerMm2() > 0 && c.highAPerMm2() > c.lowAPerMm2(), c.name());
        }
        assertTrue(Cooling.LIQUID.highAPerMm2() > Cooling.FORCED_AIR.highAPerMm2());
        assertTrue(Cooling.FORCED_AIR.highAPerMm2() > Cooling.ENCLOSED_NATURAL.highAPerMm2());
    }

    @Test
    void rejects_negative_current_zero_area_and_missing_cooling() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> CurrentDensity.check(-1, 0, null));
        assertEquals(3, e.errors().size());
        assertEquals("currentRmsA = -1.0: must be >= 0", e.errors().get(0).message());
    }
}
