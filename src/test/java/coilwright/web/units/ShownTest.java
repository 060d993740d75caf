package coilwright.web.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class ShownTest {
    @Test
    void millimetres_enter_as_metres_and_inches_as_their_exact_metric_length() {
        assertEquals(0.0015, Shown.MM.toSi(1.5, Units.SI), 1e-18);
        // source: NIST SP 811 (2008) Appendix B: 1 in = 25.4 mm exactly
        assertEquals(0.0254, Shown.MM.toSi(1.0, Units.IMPERIAL), 1e-18);
        assertEquals("0.393701", Shown.MM.text(0.010, Units.IMPERIAL));
        assertEquals("10", Shown.MM.text(0.010, Units.SI));
    }

    @Test
    void cable_area_is_mm2_in_both_systems_and_inductance_is_mH() {
        assertEquals(6e-6, Shown.MM2.toSi(6, Units.IMPERIAL), 1e-20);
        assertEquals("mm²", Shown.MM2.symbol(Units.IMPERIAL));
        assertEquals("2.5", Shown.MILLIHENRY.text(0.0025, Units.SI));
    }

    @Test
    void temperatures_and_cable_lengths_convert_with_their_offsets_and_factors() {
        // source: NIST SP 811 (2008): t/°F = 1.8 t/°C + 32; 1 ft = 0.3048 m exactly
        assertEquals(60.0, Shown.CELSIUS.toSi(140.0, Units.IMPERIAL), 1e-12);
        assertEquals("212", Shown.CELSIUS.text(100.0, Units.IMPERIAL));
        assertEquals(30.48, Shown.METRE.toSi(100, Units.IMPERIAL), 1e-12);
        assertEquals("ft", Shown.METRE.symbol(Units.IMPERIAL));
    }

    @Test
    void shown_text_keeps_six_significant_digits_without_trailing_zeros() {
        assertEquals("1.62773", Fmt.plain(1.627726633791505, 6));
        assertEquals("0", Fmt.plain(0.0, 6));
        assertEquals("120", Fmt.plain(120.00000000000001, 6));
    }
}
