package coilwright.safety;

import coilwright.validation.InvalidInputException;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

class CautionsTest {

    static SafetyInputs inputs(double vocLineRms, boolean battery, boolean leadAcid, boolean delta, double third) {
        return new SafetyInputs(vocLineRms, 800, "maximum speed", battery, battery ? 24 : 0, leadAcid,
                1200, 45, 2.4, true, delta, third, false, false);
    }

    static Caution find(List<Caution> cs, String code) {
        return cs.stream().filter(c -> c.code().equals(code)).findFirst().orElseThrow(() -> new AssertionError("no " + code));
    }

    @Test
    void open_circuit_voltage_above_extra_low_voltage_is_a_danger() {
        List<Caution> cs = Cautions.assess(inputs(60, true, true, false, 0));
        Caution c = find(cs, "OPEN_CIRCUIT_VOLTAGE");
        assertEquals(Caution.Severity.DANGER, c.severity());
        assertTrue(c.message().contains("60.0 V AC rms"), c.message());
        assertEquals(Caution.Severity.DANGER, cs.get(0).severity(), "most serious first");
    }

    @Test
    void rectified_peak_above_120_volts_is_a_danger_even_below_50_volts_ac() {
        // 49 V rms is under the AC limit; sqrt(2)*49 = 69.3 V is under the DC limit: notice only
        assertEquals(Caution.Severity.NOTICE, find(Cautions.assess(inputs(49, true, false, false, 0)), "OPEN_CIRCUIT_VOLTAGE").severity());
        // exactly at the AC boundary the AC test governs
        assertEquals(Caution.Severity.DANGER, find(Cautions.assess(inputs(50.5, true, false, false, 0)), "OPEN_CIRCUIT_VOLTAGE").severity());
    }

    @Test
    void battery_systems_get_diversion_load_and_dc_fusing_with_their_figures() {
        List<Caution> cs = Cautions.assess(inputs(30, true, false, false, 0));
        assertTrue(find(cs, "DIVERSION_LOAD").message().contains("1200 W"));
        assertTrue(find(cs, "DC_FUSING").message().contains("45.0 A"));
        assertTrue(cs.stream().noneMatch(c -> c.code().equals("BATTERY_VENTILATION")));
    }

    @Test
    void resistive_load_gets_no_battery_cautions() {
        List<Caution> cs = Cautions.assess(inputs(30, false, false, false, 0));
        assertTrue(cs.stream().noneMatch(c -> c.code().equals("DIVERSION_LOAD") || c.code().equals("DC_FUSING")));
    }

    @Test
    void lead_acid_gets_ventilation() {
        assertNotNull(find(Cautions.assess(inputs(30, true, true, false, 0)), "BATTERY_VENTILATION"));
    }

    @Test
    void delta_with_third_harmonic_warns_of_circulating_current() {
        assertNotNull(find(Cautions.assess(inputs(30, true, false, true, 0.08)), "DELTA_CIRCULATING_CURRENT"));
        assertTrue(Cautions.assess(inputs(30, true, false, true, 0.0)).stream()
                .noneMatch(c -> c.code().equals("DELTA_CIRCULATING_CURRENT")));
        assertTrue(Cautions.assess(inputs(30, true, false, false, 0.08)).stream()
                .noneMatch(c -> c.code().equals("DELTA_CIRCULATING_CURRENT")));
    }

    @Test
    void heavy_rare_earth_rotor_asks_for_jigs() {
        assertTrue(find(Cautions.assess(inputs(30, true, false, false, 0)), "MAGNET_HANDLING").message().contains("jigs"));
    }

    @Test
    void every_result_defers_to_local_codes() {
        Caution c = find(Cautions.assess(inputs(30, true, false, false, 0)), "OPEN_CIRCUIT_VOLTAGE");
        assertTrue(c.message().contains("local electrical codes"));
    }

    @Test
    void rejects_negative_and_nan_inputs_naming_the_field() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new SafetyInputs(Double.NaN, 800, "x",
                true, 24, false, -1, 0, 0, false, false, 0, false, false));
        assertEquals(List.of("openCircuitLineRmsV", "maxOutputPowerW"), e.errors().stream().map(f -> f.field()).toList());
    }
}
