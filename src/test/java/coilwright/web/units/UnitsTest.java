package coilwright.web.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;

class UnitsTest {
    @Test
    void query_parameter_wins_over_cookie_and_SI_is_the_default() {
        assertEquals(Units.SI, Units.choose(null, null));
        assertEquals(Units.IMPERIAL, Units.choose(null, "imperial"));
        assertEquals(Units.SI, Units.choose("si", "imperial"));
        assertEquals(Units.IMPERIAL, Units.choose("IMPERIAL", "si"));
        assertEquals(Units.SI, Units.choose("furlongs", null), "an unknown choice falls back");
    }

    @Test
    void SI_shows_and_enters_values_unchanged() {
        assertEquals(12.5, Units.SI.show(Quantity.SPEED, 12.5), 0.0);
        assertEquals(12.5, Units.SI.enter(Quantity.TEMPERATURE, 12.5), 0.0);
        assertEquals("m/s", Units.SI.symbol(Quantity.SPEED));
        assertEquals("mph", Units.IMPERIAL.symbol(Quantity.SPEED));
    }

    @Test
    void power_stays_in_watts() {
        assertEquals(1500.0, Units.IMPERIAL.show(Quantity.POWER, 1500.0), 0.0);
        assertEquals("W", Units.IMPERIAL.symbol(Quantity.POWER));
    }

    @Property
    void every_conversion_round_trips(@ForAll Quantity q, @ForAll @DoubleRange(min = -1e6, max = 1e6) double si) {
        assertEquals(si, Units.IMPERIAL.enter(q, Units.IMPERIAL.show(q, si)), 1e-9 * Math.max(1.0, Math.abs(si)));
    }
}
