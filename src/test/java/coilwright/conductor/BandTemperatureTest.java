package coilwright.conductor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.validation.InvalidInputException;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

import static org.junit.jupiter.api.Assertions.assertThrows;

class BandTemperatureTest {
    @Test
    void the_top_of_the_band_in_a_40_c_coolant_gives_the_class_b_rise_of_iec_60034_1() {
        // source: IEC 60034-1, class 130 (B) rise of an indirectly air-cooled winding by resistance, 80 K over a 40 C
        // coolant (value from memory of the standard's table); the calibration point, so exact to rounding
        for (Cooling c : Cooling.values()) {
            assertEquals(120.0, BandTemperature.windingC(c.highAPerMm2(), c, 40).orElseThrow(), 1e-9, c.name());
        }
    }

    @Test
    void the_temperature_is_the_fixed_point_of_a_rise_proportional_to_the_copper_loss_per_volume() {
        // source: Newton's law of cooling with a fixed conductance (Incropera & DeWitt, eq. 1.3a) and copper's
        // resistivity rho(T) = rho20 (1 + 0.00393 (T - 20)) (IEC 60028): (T - Ta) / rho(T) J^2 is one constant
        double k = 80.0 / (Copper.resistanceRatio(120) * 36); // open ventilated: top of band 6 A/mm^2
        for (double j : new double[]{1, 3, 6, 8}) {
            double t = BandTemperature.windingC(j, Cooling.OPEN_VENTILATED, 25).orElseThrow();
            assertEquals(k, (t - 25) / (Copper.resistanceRatio(t) * j * j), 1e-12 * k, () -> j + " A/mm^2: " + t);
        }
        assertEquals(25.0, BandTemperature.windingC(0, Cooling.OPEN_VENTILATED, 25).orElseThrow(), 0);
    }

    @Test
    void far_above_the_band_the_copper_outruns_the_cooling_and_no_steady_temperature_is_given() {
        // the car-alternator rewind of the issue: about 16 A/mm^2 in an open frame (band top 6)
        OptionalDouble t = BandTemperature.windingC(16, Cooling.OPEN_VENTILATED, 25);
        assertTrue(t.isEmpty() || t.getAsDouble() > 250, () -> "16 A/mm^2: " + t);
        double hotter = BandTemperature.windingC(7, Cooling.OPEN_VENTILATED, 25).orElseThrow();
        double cooler = BandTemperature.windingC(5, Cooling.OPEN_VENTILATED, 25).orElseThrow();
        assertTrue(hotter > cooler, "more current density, hotter");
    }

    @Test
    void inputs_out_of_range_name_their_field() {
        Executable bad = () -> BandTemperature.windingC(-1, Cooling.OPEN_VENTILATED, 70);
        InvalidInputException e = assertThrows(InvalidInputException.class, bad);
        assertEquals(2, e.errors().size());
        assertEquals("currentDensityAPerMm2", e.errors().get(0).field());
        assertEquals("ambientC", e.errors().get(1).field());
    }
}
