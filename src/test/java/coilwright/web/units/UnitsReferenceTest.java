package coilwright.web.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** Conversion factors against their exact definitions. source: NIST SP 811 (2008 ed.), Appendix B.8 and B.9. */
class UnitsReferenceTest {
    private static final double EXACT = 1e-12;

    @Test
    @DisplayName("1 ft = 0.3048 m exactly (NIST SP 811 B.8)")
    void foot() {
        assertEquals(0.3048, Quantity.LENGTH.fromImperial(1.0), EXACT);
        assertEquals(1.0, Quantity.LENGTH.toImperial(0.3048), EXACT);
    }

    @Test
    @DisplayName("1 in = 25.4 mm exactly (NIST SP 811 B.8)")
    void inch() {
        assertEquals(25.4, Quantity.SMALL_LENGTH.fromImperial(1.0), EXACT);
    }

    @Test
    @DisplayName("1 mi/h = 0.44704 m/s exactly (NIST SP 811 B.8: mile = 1609.344 m)")
    void milePerHour() {
        assertEquals(1609.344 / 3600.0, Quantity.SPEED.fromImperial(1.0), EXACT);
        assertEquals(0.44704, Quantity.SPEED.fromImperial(1.0), EXACT);
    }

    @Test
    @DisplayName("1 lb = 0.45359237 kg exactly (NIST SP 811 B.8)")
    void pound() {
        assertEquals(0.45359237, Quantity.MASS.fromImperial(1.0), EXACT);
        assertEquals(2.2046226218487757, Quantity.MASS.toImperial(1.0), 1e-12);
    }

    @Test
    @DisplayName("1 US gal = 3.785411784 L exactly, so 1 US gpm = 6.30901964e-5 m^3/s (NIST SP 811 B.8)")
    void gallonPerMinute() {
        assertEquals(6.30901964e-5, Quantity.FLOW.fromImperial(1.0), 1e-17);
        assertEquals(1.0, Quantity.FLOW.toImperial(3.785411784e-3 / 60.0), EXACT);
    }

    @Test
    @DisplayName("1 US gpm = 0.0630901964 L/s (NIST SP 811 B.8: US gal = 3.785411784 L); a stream of 12 L/s is 190.204 gpm")
    void litresPerSecondAndGallonsPerMinute() {
        assertEquals(0.0630901964, Quantity.SMALL_FLOW.fromImperial(1.0), 1e-12);
        assertEquals(0.012, Shown.LITRE_PER_SECOND.toSi(190.20388, Units.IMPERIAL), 1e-9);
        assertEquals(12.0, Shown.LITRE_PER_SECOND.fromSi(0.012, Units.SI), EXACT);
        assertEquals("L/s", Shown.LITRE_PER_SECOND.symbol(Units.SI));
        assertEquals("US gpm", Shown.LITRE_PER_SECOND.symbol(Units.IMPERIAL));
    }

    @Test
    @DisplayName("1 lbf·ft = 1.355818 N·m (NIST SP 811 B.8, lbf = 4.4482216152605 N)")
    void poundForceFoot() {
        assertEquals(1.355818, Quantity.TORQUE.fromImperial(1.0), 1e-6);
        assertEquals(0.45359237 * 9.80665 * 0.3048, Quantity.TORQUE.fromImperial(1.0), 1e-12);
    }

    @Test
    @DisplayName("t/°F = 1.8 t/°C + 32 (NIST SP 811 B.9): 100 °C = 212 °F, -40 °C = -40 °F")
    void temperature() {
        assertEquals(212.0, Quantity.TEMPERATURE.toImperial(100.0), EXACT);
        assertEquals(-40.0, Quantity.TEMPERATURE.toImperial(-40.0), EXACT);
        assertEquals(0.0, Quantity.TEMPERATURE.fromImperial(32.0), EXACT);
    }
}
